import type { ParameterValue } from '@/lib/workflow/parameter-diff';

/** A value as the tables show it: numbers to 6 significant figures, text as is, nothing as a dash. */
export function formatValue(value: ParameterValue | undefined): string {
  if (value === undefined) return '—';
  if (value === null) return 'none';
  if (typeof value === 'number') return String(Number(value.toPrecision(6))).replace('-', '−');
  return String(value);
}

export function formatDelta(delta: number | undefined): string {
  if (delta === undefined || delta === 0) return '';
  const text = String(Number(delta.toPrecision(4)));
  return delta > 0 ? `+${text}` : text.replace('-', '−');
}

/** An area in µm², grouped for reading. */
export function formatArea(um2: number): string {
  return `${um2.toLocaleString('en', { maximumFractionDigits: um2 < 10 ? 4 : 1 })} µm²`;
}
