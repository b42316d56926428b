import type { Diagnostic } from '../lang';

/**
 * A refusal meant for the designer: the script does not compile, an option is out of range, or a budget
 * was exceeded. `kind` lets the server map it; the message is complete on its own.
 */
export class ExportError extends Error {
  constructor(
    readonly kind: 'script' | 'options' | 'budget' | 'layout',
    message: string,
    readonly diagnostics: Diagnostic[] = [],
  ) {
    super(message);
    this.name = 'ExportError';
  }
}

/** "line:column error: message (hint)" per diagnostic, as the CLI and the job log show them. */
export function formatDiagnostics(diagnostics: readonly Diagnostic[]): string {
  return diagnostics
    .map((d) => `${d.start.line}:${d.start.column} ${d.severity}: ${d.message}${d.hint ? ` (${d.hint})` : ''}`)
    .join('\n');
}
