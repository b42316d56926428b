import type { Diagnostic, Position, Span } from './diagnostic';
import { errorAt } from './diagnostic';

export type TokenKind = 'number' | 'ident' | 'string' | 'op' | 'newline' | 'eof';

export interface Token {
  kind: TokenKind;
  /** the source text; for strings the unquoted value */
  text: string;
  /** numeric value of a number token */
  value: number;
  span: Span;
}

const STATEMENT_START = /^(?:(?:wavelength|aperture|profile|quantize|label)\b|[A-Za-z_]\w*[ \t]*=(?!=))/;

const TWO_CHAR_OPS = new Set(['==', '!=', '<=', '>=']);
const ONE_CHAR_OPS = new Set(['+', '-', '*', '/', '^', '(', ')', ',', ':', '=', '<', '>']);

function isIdentStart(ch: string): boolean {
  return /[A-Za-z_\u00b5\u03bc]/.test(ch);
}
function isIdentPart(ch: string): boolean {
  return /[A-Za-z0-9_\u00b5\u03bc]/.test(ch);
}
function isDigit(ch: string | undefined): boolean {
  return ch !== undefined && ch >= '0' && ch <= '9';
}

/**
 * Splits a script into tokens. Comments run from `#` to the end of the line. Newlines end
 * statements, except inside parentheses, so long calls may span several lines.
 * Never throws: unknown characters become diagnostics and are skipped.
 */
export function tokenize(source: string): { tokens: Token[]; diagnostics: Diagnostic[] } {
  const tokens: Token[] = [];
  const diagnostics: Diagnostic[] = [];
  let i = 0;
  let line = 1;
  let column = 1;
  let depth = 0;
  const here = (): Position => ({ line, column });
  const advance = (n: number): void => {
    i += n;
    column += n;
  };
  const push = (kind: TokenKind, text: string, start: Position, value = 0): void => {
    tokens.push({ kind, text, value, span: { start, end: here() } });
  };

  while (i < source.length) {
    const ch = source[i];
    if (ch === '\n') {
      const start = here();
      // An unclosed parenthesis must not swallow the rest of the script: a new statement
      // starting in column 1 ends it.
      if (depth > 0 && STATEMENT_START.test(source.slice(i + 1, i + 41))) depth = 0;
      if (depth === 0 && tokens.length > 0 && tokens[tokens.length - 1].kind !== 'newline') {
        tokens.push({ kind: 'newline', text: '\n', value: 0, span: { start, end: { line, column: column + 1 } } });
      }
      i += 1;
      line += 1;
      column = 1;
      continue;
    }
    if (ch === ' ' || ch === '\t' || ch === '\r') {
      advance(1);
      continue;
    }
    if (ch === '#') {
      while (i < source.length && source[i] !== '\n') advance(1);
      continue;
    }
    const start = here();
    if (isDigit(ch) || (ch === '.' && isDigit(source[i + 1]))) {
      let j = i;
      while (isDigit(source[j])) j++;
      if (source[j] === '.') {
        j++;
        while (isDigit(source[j])) j++;
      }
      if ((source[j] === 'e' || source[j] === 'E') && (isDigit(source[j + 1]) || ((source[j + 1] === '+' || source[j + 1] === '-') && isDigit(source[j + 2])))) {
        j += 2;
        while (isDigit(source[j])) j++;
      }
      const text = source.slice(i, j);
      advance(j - i);
      push('number', text, start, Number(text));
      continue;
    }
    if (isIdentStart(ch)) {
      let j = i + 1;
      while (j < source.length && isIdentPart(source[j])) j++;
      const text = source.slice(i, j);
      advance(j - i);
      push('ident', text, start);
      continue;
    }
    if (ch === '"') {
      let j = i + 1;
      let value = '';
      while (j < source.length && source[j] !== '"' && source[j] !== '\n') {
        if (source[j] === '\\' && (source[j + 1] === '"' || source[j + 1] === '\\')) j++;
        value += source[j];
        j++;
      }
      const closed = source[j] === '"';
      advance((closed ? j + 1 : j) - i);
      if (!closed) diagnostics.push(errorAt({ start, end: here() }, 'text is missing its closing quote "'));
      push('string', value, start);
      continue;
    }
    const two = source.slice(i, i + 2);
    if (TWO_CHAR_OPS.has(two)) {
      advance(2);
      push('op', two, start);
      continue;
    }
    if (ONE_CHAR_OPS.has(ch)) {
      advance(1);
      if (ch === '(') depth++;
      if (ch === ')') depth = Math.max(0, depth - 1);
      push('op', ch, start);
      continue;
    }
    const code = source.codePointAt(i) ?? 0;
    const width = code > 0xffff ? 2 : 1;
    advance(width);
    diagnostics.push(
      errorAt(
        { start, end: here() },
        `unexpected character "${source.slice(i - width, i)}"`,
        ch === '*' || ch === '%' ? undefined : 'comments start with #; text goes in double quotes',
      ),
    );
  }
  const end = here();
  if (tokens.length > 0 && tokens[tokens.length - 1].kind !== 'newline') {
    tokens.push({ kind: 'newline', text: '\n', value: 0, span: { start: end, end } });
  }
  tokens.push({ kind: 'eof', text: '', value: 0, span: { start: end, end } });
  return { tokens, diagnostics };
}
