/** Static types of the language. Numbers carry the exponents of length (µm) and angle (rad). */
export type Ty =
  | { k: 'num'; L: number; A: number; varies: boolean }
  | { k: 'bool'; varies: boolean }
  | { k: 'text' }
  | { k: 'tuple'; items: Ty[] }
  | { k: 'complex' }
  | { k: 'multiplexed' }
  | { k: 'region' }
  | { k: 'quantization' }
  | { k: 'label' }
  | { k: 'function'; name: string }
  /** already reported; suppresses follow-on errors */
  | { k: 'error' };

export const num = (L: number, A: number, varies = false): Ty => ({ k: 'num', L, A, varies });
export const LENGTH = num(1, 0);
export const ANGLE = num(0, 1);
export const DIMENSIONLESS = num(0, 0);
export const ERROR: Ty = { k: 'error' };

function power(unit: string, exponent: number): string {
  if (exponent === 1) return unit;
  const superscripts: Record<string, string> = { '-': '⁻', '2': '²', '3': '³', '4': '⁴', '1': '¹', '5': '⁵', '6': '⁶' };
  const text = String(exponent);
  return unit + (/^-?[1-6]$/.test(text) ? [...text].map((c) => superscripts[c]).join('') : `^${text}`);
}

/** The unit of a numeric type in internal units, e.g. "µm", "rad", "µm²", "" for dimensionless. */
export function unitOf(L: number, A: number): string {
  const parts: string[] = [];
  if (L !== 0) parts.push(power('µm', L));
  if (A !== 0) parts.push(power('rad', A));
  return parts.join('·');
}

function dimensionName(L: number, A: number): string {
  if (L === 0 && A === 0) return 'dimensionless';
  if (L === 1 && A === 0) return 'length';
  if (L === 0 && A === 1) return 'angle or phase';
  if (L === 2 && A === 0) return 'area';
  if (L === -1 && A === 0) return 'inverse length';
  return 'quantity';
}

/** A type as the user reads it in messages and hovers, e.g. "length (µm)", "phase field (rad)". */
export function formatType(t: Ty): string {
  switch (t.k) {
    case 'num': {
      const unit = unitOf(t.L, t.A);
      if (t.varies && t.L === 0) return `phase field${unit ? ` (${unit})` : ' (plain number, read as rad)'}`;
      const base = `${dimensionName(t.L, t.A)}${unit ? ` (${unit})` : ''}`;
      return t.varies ? `position-dependent ${base}` : base;
    }
    case 'bool':
      return t.varies ? 'position-dependent condition' : 'condition';
    case 'text':
      return 'text';
    case 'tuple':
      return t.items.length === 2 && t.items.every(isConstantLength)
        ? 'point (µm, µm)'
        : t.items.length === 3 && t.items.every(isConstantLength)
          ? 'point (µm, µm, µm)'
          : `tuple (${t.items.map(formatType).join(', ')})`;
    case 'complex':
      return 'complex field';
    case 'multiplexed':
      return 'multiplexed profile';
    case 'region':
      return 'region';
    case 'quantization':
      return 'quantization';
    case 'label':
      return 'label';
    case 'function':
      return `built-in function ${t.name}(…)`;
    case 'error':
      return 'unknown';
  }
}

export function isConstantLength(t: Ty): boolean {
  return t.k === 'num' && t.L === 1 && t.A === 0 && !t.varies;
}

/** Angles and plain numbers mix freely (a plain number is read as radians); lengths must match. */
export function sameDimension(a: Ty, b: Ty): boolean {
  return a.k === 'num' && b.k === 'num' && a.L === b.L && (a.A === b.A || a.A === 0 || b.A === 0);
}

export function sameType(a: Ty, b: Ty): boolean {
  if (a.k === 'error' || b.k === 'error') return true;
  if (a.k === 'num' || b.k === 'num') return sameDimension(a, b);
  if (a.k === 'tuple' && b.k === 'tuple') return a.items.length === b.items.length && a.items.every((t, i) => sameType(t, b.items[i]));
  return a.k === b.k;
}
