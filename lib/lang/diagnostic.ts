/** A position in the script: 1-based line and column (columns count UTF-16 code units, as editors do). */
export interface Position {
  line: number;
  column: number;
}

/** A source range; `end` is the position just after the last character. */
export interface Span {
  start: Position;
  end: Position;
}

export interface Diagnostic {
  severity: 'error' | 'warning';
  message: string;
  hint?: string;
  start: Position;
  end: Position;
}

export function errorAt(span: Span, message: string, hint?: string): Diagnostic {
  return hint === undefined
    ? { severity: 'error', message, start: span.start, end: span.end }
    : { severity: 'error', message, hint, start: span.start, end: span.end };
}

export function warningAt(span: Span, message: string, hint?: string): Diagnostic {
  return { ...errorAt(span, message, hint), severity: 'warning' };
}

export function joinSpans(a: Span, b: Span): Span {
  return { start: a.start, end: b.end };
}

export function hasErrors(diagnostics: Diagnostic[]): boolean {
  return diagnostics.some((d) => d.severity === 'error');
}
