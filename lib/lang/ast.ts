import type { Span } from './diagnostic';

export type BinaryOp = '+' | '-' | '*' | '/' | '^' | '<' | '<=' | '>' | '>=' | '==' | '!=' | 'and' | 'or';
export type UnaryOp = '-' | 'not';

export type Expr =
  | { kind: 'number'; value: number; unit: string | null; span: Span; unitSpan: Span | null }
  | { kind: 'text'; value: string; span: Span }
  | { kind: 'name'; name: string; span: Span }
  | { kind: 'unary'; op: UnaryOp; operand: Expr; span: Span }
  | { kind: 'binary'; op: BinaryOp; left: Expr; right: Expr; span: Span }
  | { kind: 'if'; condition: Expr; then: Expr; otherwise: Expr; span: Span }
  | { kind: 'tuple'; items: Expr[]; span: Span }
  | { kind: 'call'; callee: string; calleeSpan: Span; args: Arg[]; span: Span }
  /** a placeholder where the parser recovered from an error */
  | { kind: 'invalid'; span: Span };

export interface Arg {
  name: string | null;
  nameSpan: Span | null;
  value: Expr;
}

/** The declarations a design needs; `label` may repeat, the others appear exactly once. */
export const DECLARATION_KEYWORDS = ['wavelength', 'aperture', 'profile', 'quantize', 'label'] as const;
export type DeclarationKeyword = (typeof DECLARATION_KEYWORDS)[number];

export type Statement =
  | { kind: 'bind'; name: string; nameSpan: Span; value: Expr; span: Span }
  | { kind: 'declare'; keyword: DeclarationKeyword; keywordSpan: Span; value: Expr; span: Span };

export interface Program {
  statements: Statement[];
  /** declarations whose line did not parse (so they are not reported missing as well) */
  brokenDeclarations: string[];
}

/** Words the grammar reserves (they cannot name a binding). */
export const KEYWORDS = new Set<string>(['if', 'then', 'else', 'and', 'or', 'not', ...DECLARATION_KEYWORDS]);
