/**
 * Reads figures back out of a stored revision report (JSON written by the export job).
 * The stored shape is `{ mask: <export report>, focusCheck: ... }`; rows written before a field existed lack it.
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

/** The stored focus-check result or its error, if the export ran one. */
export function reportFocusCheck(report: unknown): { result: unknown } | { error: string } | null {
  const check = asRecord(asRecord(report)?.focusCheck);
  if (!check) return null;
  if (typeof check.error === 'string') return { error: check.error };
  return 'result' in check ? { result: check.result } : null;
}
