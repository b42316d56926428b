/**
 * Editor assistance computed from the built-in table: completion entries with signatures and
 * units, and hover text. Pure functions of the script text, shared by any editor front end.
 */
import { KEYWORDS } from './ast';
import type { Builtin, BuiltinParam, ParamType } from './builtins';
import { BUILTINS, DECLARATIONS, findBuiltin } from './builtins';
import type { TypeNote } from './checker';
import type { Position, Span } from './diagnostic';
import { tokenize } from './lexer';
import { parse } from './parser';
import { UNITS, findUnit } from './units';

const UNIT_HINTS: Partial<Record<ParamType, string>> = {
  length: 'nm, um, mm, m',
  angle: 'deg, rad, mrad',
  phase: 'rad, waves',
  point: '(x, y) in nm, um, mm',
  point3: '(x, y, z) in nm, um, mm',
};

/** A parameter as the user reads it: `focal: length [nm, um, mm, m]` or `duty: plain number = 0.5`. */
export function describeParameter(p: BuiltinParam): string {
  const type = p.type === 'word' ? (p.options ?? []).join(' | ') : p.type === 'dimensionless' ? 'plain number' : p.type === 'count' ? 'whole number' : p.type;
  const units = UNIT_HINTS[p.type] ? ` [${UNIT_HINTS[p.type]}]` : '';
  const tail = p.default !== undefined ? ` = ${p.default}` : p.optional ? ' (optional)' : '';
  return `${p.name}: ${type}${units}${tail}`;
}

/** The call signature, e.g. `lens(focal: length [nm, um, mm, m], centre: point … = (0 um, 0 um)) → phase field`. */
export function signatureOf(b: Builtin): string {
  if (b.category === 'coordinate' || b.category === 'constant') return `${b.name}: ${b.returns}`;
  const params = b.params.map(describeParameter);
  if (b.variadic) params.unshift(`…${b.variadic.name}: ${b.variadic.type}`);
  const alternatives = b.oneOf?.length ? ` (give one of ${b.oneOf.map((g) => g.join(' or ')).join('; ')})` : '';
  return `${b.name}(${params.join(', ')}) → ${b.returns}${alternatives}`;
}

export type CompletionKind = 'function' | 'constant' | 'keyword' | 'unit' | 'variable' | 'parameter' | 'option';

export interface CompletionEntry {
  label: string;
  kind: CompletionKind;
  detail: string;
  documentation: string;
  /** snippet text (Monaco/VS Code snippet syntax) */
  insertText: string;
  snippet: boolean;
}

function builtinEntry(b: Builtin): CompletionEntry {
  const callable = b.category !== 'coordinate' && b.category !== 'constant';
  const required = b.params.filter((p) => p.default === undefined && !p.optional);
  const firstChoice = b.oneOf?.[0]?.[0];
  const fill = [...required.map((p) => p.name), ...(firstChoice ? [firstChoice] : [])];
  const insertText = !callable
    ? b.name
    : b.variadic
      ? `${b.name}($1)`
      : `${b.name}(${fill.map((name, i) => `${name}: \${${i + 1}}`).join(', ')})`;
  return {
    label: b.name,
    kind: callable ? 'function' : 'constant',
    detail: signatureOf(b),
    documentation: `${b.description}${b.formula ? `\n\n${b.formula}` : ''}\n\nExample: ${b.example}`,
    insertText,
    snippet: callable,
  };
}

/** The innermost unclosed call before the offset, if any. */
function enclosingCall(source: string, line: number, column: number): Builtin | undefined {
  const { tokens } = tokenize(source);
  const stack: (string | null)[] = [];
  for (let i = 0; i < tokens.length; i++) {
    const t = tokens[i];
    const s = t.span.start;
    if (s.line > line || (s.line === line && s.column >= column)) break;
    if (t.kind === 'op' && t.text === '(') stack.push(tokens[i - 1]?.kind === 'ident' ? tokens[i - 1].text : null);
    else if (t.kind === 'op' && t.text === ')') stack.pop();
    else if (t.kind === 'newline') stack.length = 0;
  }
  const name = stack[stack.length - 1];
  return name ? findBuiltin(name) : undefined;
}

/** What may be typed at a position: the enclosing call's parameters first, then names, built-ins, units, keywords. */
export function completionsAt(source: string, line: number, column: number): CompletionEntry[] {
  const entries: CompletionEntry[] = [];
  const call = enclosingCall(source, line, column);
  if (call) {
    for (const p of call.params) {
      entries.push({ label: `${p.name}:`, kind: 'parameter', detail: describeParameter(p), documentation: p.doc, insertText: `${p.name}: `, snippet: false });
      for (const option of p.options ?? []) entries.push({ label: option, kind: 'option', detail: `${p.name} of ${call.name}`, documentation: p.doc, insertText: option, snippet: false });
    }
  }
  const { program } = parse(source);
  for (const s of program.statements) {
    if (s.kind === 'bind' && s.span.start.line < line) entries.push({ label: s.name, kind: 'variable', detail: `defined on line ${s.span.start.line}`, documentation: '', insertText: s.name, snippet: false });
  }
  for (const b of BUILTINS) entries.push(builtinEntry(b));
  for (const u of UNITS) entries.push({ label: u.name, kind: 'unit', detail: `unit: ${u.description}`, documentation: '', insertText: u.name, snippet: false });
  for (const d of DECLARATIONS) entries.push({ label: d.keyword, kind: 'keyword', detail: `declaration: ${d.description} (${d.expects})`, documentation: `Example: ${d.example}`, insertText: `${d.keyword} `, snippet: false });
  for (const k of [...KEYWORDS].filter((w) => !DECLARATIONS.some((d) => d.keyword === w))) entries.push({ label: k, kind: 'keyword', detail: 'keyword', documentation: '', insertText: k, snippet: false });
  return entries;
}

function contains(span: Span, p: Position): boolean {
  const after = span.start.line < p.line || (span.start.line === p.line && span.start.column <= p.column);
  const before = span.end.line > p.line || (span.end.line === p.line && span.end.column > p.column);
  return after && before;
}

function size(span: Span): number {
  return (span.end.line - span.start.line) * 10_000 + span.end.column - span.start.column;
}

export interface HoverInfo {
  span: Span;
  /** lines of markdown */
  contents: string[];
}

/**
 * Hover for a position: built-in names and units explain themselves; any other expression shows
 * its type and unit from the last analysis (`types`).
 */
export function hoverAt(source: string, types: TypeNote[], line: number, column: number): HoverInfo | null {
  const p = { line, column };
  const { tokens } = tokenize(source);
  const token = tokens.find((t) => t.kind === 'ident' && contains(t.span, p));
  const note = types.filter((n) => contains(n.span, p)).sort((a, b) => size(a.span) - size(b.span))[0];
  if (token) {
    const b = findBuiltin(token.text);
    const unit = findUnit(token.text);
    const declaration = DECLARATIONS.find((d) => d.keyword === token.text);
    if (b) {
      return { span: token.span, contents: ['```\n' + signatureOf(b) + '\n```', b.description + (b.formula ? `  \n${b.formula}` : '')] };
    }
    if (unit && tokens[tokens.indexOf(token) - 1]?.kind === 'number') return { span: token.span, contents: [`unit **${unit.name}**: ${unit.description}`] };
    if (declaration && !note) return { span: token.span, contents: [`declaration **${declaration.keyword}**: ${declaration.description}; expects ${declaration.expects}`] };
  }
  if (!note) return null;
  return { span: note.span, contents: [`type: **${note.type}**`] };
}
