/**
 * Reads figures back out of a stored revision report (JSON written by the export job).
 * The stored shape is `{ mask, summary }` from the export, plus `focusCheck` once the focus-check job has run.
 */

function asRecord(value: unknown): Record<string, unknown> | null {
  return typeof value === 'object' && value !== null && !Array.isArray(value) ? (value as Record<string, unknown>) : null;
}

/** The manufacturability warnings of a stored report, as sentences. */
export function reportWarnings(report: unknown): string[] {
  const mask = asRecord(asRecord(report)?.mask);
  const warnings = mask?.warnings;
  if (!Array.isArray(warnings)) return [];
  return warnings
    .map((w) => (typeof w === 'string' ? w : typeof asRecord(w)?.message === 'string' ? String(asRecord(w)!.message) : null))
    .filter((w): w is string => w !== null);
}

/** The cached focus-check result or its error; null while the check has not run yet. */
export function reportFocusCheck(report: unknown): { result: unknown } | { error: string } | null {
  const check = asRecord(asRecord(report)?.focusCheck);
  if (!check) return null;
  if (typeof check.error === 'string') return { error: check.error };
  return 'result' in check ? { result: check.result } : null;
}
