/**
 * Compares two parameter sets (e.g. two revisions' manifests) into a table of values, each marked
 * unchanged, changed, added or removed. Nested objects and arrays are flattened into dotted paths
 * ("foci[1].z") so every leaf value gets its own row.
 */

export type ParameterValue = string | number | boolean | null;
export type ParameterChange = 'unchanged' | 'changed' | 'added' | 'removed';

export interface ParameterRow {
  path: string;
  before: ParameterValue | undefined;
  after: ParameterValue | undefined;
  change: ParameterChange;
  /** after − before, when both are numbers */
  delta?: number;
}

export interface ParameterDiffOptions {
  /** paths (or path prefixes ending at a "." or "[") left out of the table, e.g. "files" */
  ignore?: readonly string[];
  /** numbers within this relative difference count as equal (floating-point noise); default 1e-12 */
  relativeTolerance?: number;
}

/** Flattens a JSON-like value into path → leaf value. */
export function flattenParameters(value: unknown, prefix = '', out = new Map<string, ParameterValue>()): Map<string, ParameterValue> {
  if (Array.isArray(value)) {
    if (value.length === 0 && prefix) out.set(prefix, '[]');
    value.forEach((item, i) => flattenParameters(item, `${prefix}[${i}]`, out));
  } else if (value !== null && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>);
    if (entries.length === 0 && prefix) out.set(prefix, '{}');
    for (const [key, item] of entries) flattenParameters(item, prefix ? `${prefix}.${key}` : key, out);
  } else if (typeof value === 'string' || typeof value === 'boolean' || value === null) {
    if (prefix) out.set(prefix, value);
  } else if (typeof value === 'number') {
    // JSON cannot carry NaN or infinities; show them as text rather than dropping the row
    if (prefix) out.set(prefix, Number.isFinite(value) ? value : String(value));
  }
  return out;
}

function isIgnored(path: string, ignore: readonly string[]): boolean {
  return ignore.some((p) => path === p || path.startsWith(`${p}.`) || path.startsWith(`${p}[`));
}

function sameValue(a: ParameterValue, b: ParameterValue, relativeTolerance: number): boolean {
  if (typeof a === 'number' && typeof b === 'number') {
    return Math.abs(a - b) <= relativeTolerance * Math.max(Math.abs(a), Math.abs(b));
  }
  return a === b;
}

/** Rows for every path in either set, in the order they first appear (before's order, then after's new paths). */
export function diffParameters(before: unknown, after: unknown, options: ParameterDiffOptions = {}): ParameterRow[] {
  const ignore = options.ignore ?? [];
  const tolerance = options.relativeTolerance ?? 1e-12;
  const a = flattenParameters(before);
  const b = flattenParameters(after);
  const paths = [...new Set([...a.keys(), ...b.keys()])].filter((p) => !isIgnored(p, ignore));
  return paths.map((path): ParameterRow => {
    const x = a.get(path);
    const y = b.get(path);
    if (x === undefined) return { path, before: x, after: y, change: 'added' };
    if (y === undefined) return { path, before: x, after: y, change: 'removed' };
    const row: ParameterRow = { path, before: x, after: y, change: sameValue(x, y, tolerance) ? 'unchanged' : 'changed' };
    if (typeof x === 'number' && typeof y === 'number') row.delta = y - x;
    return row;
  });
}
