import type { Arg, BinaryOp, DeclarationKeyword, Expr, Program, Statement } from './ast';
import { DECLARATION_KEYWORDS, KEYWORDS } from './ast';
import type { Diagnostic } from './diagnostic';
import { errorAt, joinSpans } from './diagnostic';
import type { Token } from './lexer';
import { tokenize } from './lexer';

/** Deeper nesting than this is refused, which keeps every later pass's recursion bounded. */
const MAX_DEPTH = 120;

class ParseError extends Error {}

const COMPARISONS = new Set(['<', '<=', '>', '>=', '==', '!=']);

/**
 * Parses a script into statements. On an error the rest of that statement is skipped and parsing
 * resumes on the next line, so one pass reports every broken line.
 */
export function parse(source: string): { program: Program; diagnostics: Diagnostic[] } {
  const { tokens, diagnostics } = tokenize(source);
  const statements: Statement[] = [];
  const brokenDeclarations: string[] = [];
  let pos = 0;
  let depth = 0;

  const peek = (offset = 0): Token => tokens[Math.max(0, Math.min(pos + offset, tokens.length - 1))];
  const next = (): Token => tokens[pos < tokens.length - 1 ? pos++ : pos];
  const isOp = (t: Token, text: string): boolean => t.kind === 'op' && t.text === text;
  const isWord = (t: Token, text: string): boolean => t.kind === 'ident' && t.text === text;
  const describe = (t: Token): string =>
    t.kind === 'eof' ? 'the end of the script' : t.kind === 'newline' ? 'the end of the line' : `"${t.text}"`;
  const fail = (t: Token, message: string, hint?: string): never => {
    diagnostics.push(errorAt(t.span, message, hint));
    throw new ParseError(message);
  };
  const expectClose = (open: Token, context: string): Token => {
    const t = peek();
    if (t.kind === 'newline' || t.kind === 'eof') fail(open, `this "(" is never closed`, `add ")" ${context}`);
    if (!isOp(t, ')')) fail(t, `expected ")" ${context}, found ${describe(t)}`, isOp(peek(-1), ')') || t.kind !== 'ident' ? undefined : 'separate arguments with commas');
    return next();
  };
  const nested = <T>(t: Token, f: () => T): T => {
    if (++depth > MAX_DEPTH) fail(t, `expression nested more than ${MAX_DEPTH} levels deep`, 'split it into named bindings');
    try {
      return f();
    } finally {
      depth--;
    }
  };

  function expression(): Expr {
    const t = peek();
    return nested(t, () => {
      if (isWord(t, 'if')) {
        next();
        const condition = expression();
        if (!isWord(peek(), 'then')) fail(peek(), `expected "then" after the condition, found ${describe(peek())}`);
        next();
        const then = expression();
        if (!isWord(peek(), 'else')) fail(peek(), `expected "else" after the "then" branch, found ${describe(peek())}`, 'every if needs both branches: if c then a else b');
        next();
        const otherwise = expression();
        return { kind: 'if', condition, then, otherwise, span: joinSpans(t.span, otherwise.span) };
      }
      return logical('or', () => logical('and', negation));
    });
  }

  function logical(op: 'or' | 'and', operand: () => Expr): Expr {
    let left = operand();
    while (isWord(peek(), op)) {
      next();
      const right = operand();
      left = { kind: 'binary', op, left, right, span: joinSpans(left.span, right.span) };
    }
    return left;
  }

  function negation(): Expr {
    const t = peek();
    if (isWord(t, 'not')) {
      next();
      const operand = nested(t, negation);
      return { kind: 'unary', op: 'not', operand, span: joinSpans(t.span, operand.span) };
    }
    return comparison();
  }

  function comparison(): Expr {
    const left = additive();
    const t = peek();
    if (t.kind === 'op' && COMPARISONS.has(t.text)) {
      next();
      const right = additive();
      const after = peek();
      if (after.kind === 'op' && COMPARISONS.has(after.text)) {
        fail(after, 'comparisons cannot be chained', 'combine them with and: a < b and b < c');
      }
      return { kind: 'binary', op: t.text as BinaryOp, left, right, span: joinSpans(left.span, right.span) };
    }
    return left;
  }

  function additive(): Expr {
    let left = multiplicative();
    while (isOp(peek(), '+') || isOp(peek(), '-')) {
      const op = next().text as BinaryOp;
      const right = multiplicative();
      left = { kind: 'binary', op, left, right, span: joinSpans(left.span, right.span) };
    }
    return left;
  }

  function multiplicative(): Expr {
    let left = unary();
    while (isOp(peek(), '*') || isOp(peek(), '/')) {
      const op = next().text as BinaryOp;
      const right = unary();
      left = { kind: 'binary', op, left, right, span: joinSpans(left.span, right.span) };
    }
    return left;
  }

  function unary(): Expr {
    const t = peek();
    if (isOp(t, '-')) {
      next();
      const operand = nested(t, unary);
      return { kind: 'unary', op: '-', operand, span: joinSpans(t.span, operand.span) };
    }
    return power();
  }

  function power(): Expr {
    const base = primary();
    const t = peek();
    if (isOp(t, '^')) {
      next();
      const exponent = nested(t, unary);
      return { kind: 'binary', op: '^', left: base, right: exponent, span: joinSpans(base.span, exponent.span) };
    }
    return base;
  }

  function primary(): Expr {
    const t = peek();
    if (t.kind === 'number') {
      next();
      const u = peek();
      if (u.kind === 'ident' && !KEYWORDS.has(u.text)) {
        next();
        return { kind: 'number', value: t.value, unit: u.text, span: joinSpans(t.span, u.span), unitSpan: u.span };
      }
      return { kind: 'number', value: t.value, unit: null, span: t.span, unitSpan: null };
    }
    if (t.kind === 'string') {
      next();
      return { kind: 'text', value: t.text, span: t.span };
    }
    if (t.kind === 'ident') {
      if (KEYWORDS.has(t.text) && t.text !== 'wavelength') {
        fail(t, `"${t.text}" is a keyword and cannot start an expression here`);
      }
      next();
      if (isOp(peek(), '(')) return call(t);
      return { kind: 'name', name: t.text, span: t.span };
    }
    if (isOp(t, '(')) {
      next();
      return nested(t, () => {
        const items: Expr[] = [expression()];
        while (isOp(peek(), ',')) {
          next();
          items.push(expression());
        }
        const close = expectClose(t, 'to close the parenthesis');
        if (items.length === 1) return items[0];
        return { kind: 'tuple', items, span: joinSpans(t.span, close.span) };
      });
    }
    return fail(t, `expected a value, found ${describe(t)}`);
  }

  function call(callee: Token): Expr {
    const open = next();
    return nested(open, () => {
      const args: Arg[] = [];
      if (!isOp(peek(), ')')) {
        for (;;) {
          const t = peek();
          if (t.kind === 'ident' && isOp(peek(1), ':')) {
            next();
            next();
            args.push({ name: t.text, nameSpan: t.span, value: expression() });
          } else {
            args.push({ name: null, nameSpan: null, value: expression() });
          }
          if (!isOp(peek(), ',')) break;
          next();
        }
      }
      const close = expectClose(open, `to close the arguments of ${callee.text}(`);
      return { kind: 'call', callee: callee.text, calleeSpan: callee.span, args, span: joinSpans(callee.span, close.span) } as Expr;
    });
  }

  function statement(): Statement {
    const t = peek();
    if (t.kind === 'ident' && (DECLARATION_KEYWORDS as readonly string[]).includes(t.text) && !isOp(peek(1), '=')) {
      next();
      const value = expression();
      return { kind: 'declare', keyword: t.text as DeclarationKeyword, keywordSpan: t.span, value, span: joinSpans(t.span, value.span) };
    }
    if (t.kind === 'ident' && isOp(peek(1), '=')) {
      if (KEYWORDS.has(t.text)) {
        fail(t, `"${t.text}" is a keyword and cannot be redefined`, (DECLARATION_KEYWORDS as readonly string[]).includes(t.text) ? `declare it without "=": ${t.text} …` : undefined);
      }
      next();
      next();
      const value = expression();
      return { kind: 'bind', name: t.text, nameSpan: t.span, value, span: joinSpans(t.span, value.span) };
    }
    return fail(
      t,
      `expected a binding (name = value) or a declaration, found ${describe(t)}`,
      `declarations: ${DECLARATION_KEYWORDS.join(', ')}`,
    );
  }

  while (peek().kind !== 'eof') {
    if (peek().kind === 'newline') {
      next();
      continue;
    }
    const first = peek();
    try {
      const s = statement();
      const end = peek();
      if (end.kind !== 'newline' && end.kind !== 'eof') {
        fail(end, `unexpected ${describe(end)} after the end of the statement`, isOp(end, '(') ? undefined : 'one statement per line');
      }
      statements.push(s);
    } catch (error) {
      if (!(error instanceof ParseError)) throw error;
      if (first.kind === 'ident' && (DECLARATION_KEYWORDS as readonly string[]).includes(first.text)) brokenDeclarations.push(first.text);
      depth = 0;
      while (peek().kind !== 'newline' && peek().kind !== 'eof') next();
    }
  }
  return { program: { statements, brokenDeclarations }, diagnostics };
}
