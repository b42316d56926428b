import type { Bound, Box } from './bounds';
import { maxAbs, minAbs, productRange, quotientRange, radialRange, times } from './bounds';

/** Whether a field is rotationally symmetric, and about which point. */
export type Symmetry = { kind: 'any' } | { kind: 'about'; x: number; y: number } | { kind: 'none' };

/** A designed point focus carried by a lens field. */
export interface FocusInfo {
  x: number;
  y: number;
  z: number;
}

/** A real-valued function of the mask position, with its bounds. Internal units (µm, rad). */
export interface ScalarField {
  at: (x: number, y: number) => number;
  bound: (box: Box) => Bound;
  symmetry: Symmetry;
  focus: FocusInfo | null;
  /** set for a spiral phase: added to a lens centred here, it keeps the lens's focal point */
  neutralAbout?: { x: number; y: number };
  /** set when the field is a function of the distance from (x, y) plus charge·θ about it */
  spiral?: { x: number; y: number; charge: number };
}

/** A position-dependent condition (for `if`). */
export interface TestField {
  test: (x: number, y: number) => boolean;
  symmetry: Symmetry;
}

export const ANY: Symmetry = { kind: 'any' };
export const NONE: Symmetry = { kind: 'none' };

/** Two centres closer than 1e-9 µm are one (constants folded in different orders differ by rounding). */
const samePoint = (a: { x: number; y: number }, b: { x: number; y: number }): boolean => Math.abs(a.x - b.x) < 1e-9 && Math.abs(a.y - b.y) < 1e-9;

export function mergeSymmetry(a: Symmetry, b: Symmetry): Symmetry {
  if (a.kind === 'any') return b;
  if (b.kind === 'any') return a;
  if (a.kind === 'about' && b.kind === 'about' && samePoint(a, b)) return a;
  return NONE;
}

export function constantField(v: number): ScalarField {
  const bound: Bound = { lo: v, hi: v, slope: 0 };
  return { at: () => v, bound: () => bound, symmetry: ANY, focus: null };
}

export const COORDINATE_FIELDS: Record<'x' | 'y' | 'r', ScalarField> = {
  x: { at: (x) => x, bound: (b) => ({ lo: b.x0, hi: b.x1, slope: 1 }), symmetry: NONE, focus: null },
  y: { at: (_x, y) => y, bound: (b) => ({ lo: b.y0, hi: b.y1, slope: 1 }), symmetry: NONE, focus: null },
  r: {
    at: (x, y) => Math.sqrt(x * x + y * y),
    bound: (b) => {
      const [lo, hi] = radialRange(b, 0, 0);
      return { lo, hi, slope: 1 };
    },
    symmetry: { kind: 'about', x: 0, y: 0 },
    focus: null,
  },
};

/**
 * The polar angle about (cx, cy). |∇θ| = 1/ρ has no bound at the centre; the bound uses
 * ρ ≥ `core`. The compiler passes core = λ/(2π): inside it a charge-m spiral has spokes finer than
 * λ/m, which deflect light past 90° (no propagating wave) and lie below lithographic resolution.
 */
export function angleField(cx: number, cy: number, core: number, charge = 1): ScalarField {
  const m = Math.abs(charge);
  return {
    at: (x, y) => charge * Math.atan2(y - cy, x - cx),
    bound: (b) => ({ lo: -Math.PI * m, hi: Math.PI * m, slope: m / Math.max(radialRange(b, cx, cy)[0], core) }),
    symmetry: NONE,
    focus: null,
    neutralAbout: { x: cx, y: cy },
    spiral: { x: cx, y: cy, charge },
  };
}

const symmetricAbout = (s: Symmetry, centre: { x: number; y: number }): boolean => s.kind === 'any' || (s.kind === 'about' && samePoint(s, centre));

/** The spiral of a sum or difference: a spiral plus (or minus) a field symmetric about its centre, or two spirals about one centre. */
function spiralOf(op: '+' | '-', a: ScalarField, b: ScalarField): ScalarField['spiral'] {
  const sign = op === '+' ? 1 : -1;
  if (a.spiral && b.spiral) {
    const charge = a.spiral.charge + sign * b.spiral.charge;
    return samePoint(a.spiral, b.spiral) && charge !== 0 ? { ...a.spiral, charge } : undefined;
  }
  if (a.spiral) return symmetricAbout(b.symmetry, a.spiral) ? a.spiral : undefined;
  if (b.spiral) return symmetricAbout(a.symmetry, b.spiral) ? { ...b.spiral, charge: sign * b.spiral.charge } : undefined;
  return undefined;
}

type Op2 = '+' | '-' | '*' | '/';

/** Arithmetic where at least one side varies; a constant side is folded into the closure. */
export function arithmeticField(op: Op2, left: ScalarField | number, right: ScalarField | number): ScalarField {
  const a = typeof left === 'number' ? constantField(left) : left;
  const b = typeof right === 'number' ? constantField(right) : right;
  const fa = a.at;
  const fb = b.at;
  const symmetry = mergeSymmetry(a.symmetry, b.symmetry);
  const bound = (box: Box): Bound => {
    const p = a.bound(box);
    const q = b.bound(box);
    switch (op) {
      case '+':
        return { lo: p.lo + q.lo, hi: p.hi + q.hi, slope: p.slope + q.slope };
      case '-':
        return { lo: p.lo - q.hi, hi: p.hi - q.lo, slope: p.slope + q.slope };
      case '*': {
        const [lo, hi] = productRange(p, q);
        return { lo, hi, slope: times(maxAbs(p), q.slope) + times(maxAbs(q), p.slope) };
      }
      case '/': {
        const [lo, hi] = quotientRange(p, q);
        const m = minAbs(q);
        const slope = m === 0 ? Infinity : p.slope / m + times(maxAbs(p), q.slope) / (m * m);
        return { lo, hi, slope };
      }
    }
  };
  let at: (x: number, y: number) => number;
  if (typeof right === 'number') {
    const c = right;
    at = op === '+' ? (x, y) => fa(x, y) + c : op === '-' ? (x, y) => fa(x, y) - c : op === '*' ? (x, y) => fa(x, y) * c : (x, y) => fa(x, y) / c;
  } else if (typeof left === 'number') {
    const c = left;
    at = op === '+' ? (x, y) => c + fb(x, y) : op === '-' ? (x, y) => c - fb(x, y) : op === '*' ? (x, y) => c * fb(x, y) : (x, y) => c / fb(x, y);
  } else {
    at = op === '+' ? (x, y) => fa(x, y) + fb(x, y) : op === '-' ? (x, y) => fa(x, y) - fb(x, y) : op === '*' ? (x, y) => fa(x, y) * fb(x, y) : (x, y) => fa(x, y) / fb(x, y);
  }
  // a lens plus a constant phase, or plus a spiral about its axis, still focuses to the same point
  const keeps = (lens: ScalarField, other: ScalarField | number): boolean =>
    typeof other === 'number' || (other.neutralAbout !== undefined && lens.focus !== null && other.neutralAbout.x === lens.focus.x && other.neutralAbout.y === lens.focus.y);
  const additive = op === '+' || op === '-';
  const focus = additive && a.focus && keeps(a, right) ? a.focus : op === '+' && b.focus && keeps(b, left) ? b.focus : null;
  const spiral = additive ? spiralOf(op, a, b) : undefined;
  return spiral ? { at, bound, symmetry, focus, spiral } : { at, bound, symmetry, focus };
}

/** A function of one field: the value, the value range, and max |f′| over that range. */
export function mapField(
  a: ScalarField,
  f: (u: number) => number,
  range: (u: Bound) => [number, number],
  derivative: (u: Bound) => number,
): ScalarField {
  const fa = a.at;
  return {
    at: (x, y) => f(fa(x, y)),
    bound: (box) => {
      const u = a.bound(box);
      const [lo, hi] = range(u);
      return { lo, hi, slope: times(derivative(u), u.slope) };
    },
    symmetry: a.symmetry,
    focus: null,
  };
}

/** A function of two fields with its bound rule. */
export function combineFields(
  a: ScalarField,
  b: ScalarField,
  f: (u: number, v: number) => number,
  bound: (u: Bound, v: Bound) => Bound,
): ScalarField {
  const fa = a.at;
  const fb = b.at;
  return {
    at: (x, y) => f(fa(x, y), fb(x, y)),
    bound: (box) => bound(a.bound(box), b.bound(box)),
    symmetry: mergeSymmetry(a.symmetry, b.symmetry),
    focus: null,
  };
}

/** `if test then a else b`; a jump at the boundary is a zone edge, not a frequency, so only the branches' slopes count. */
export function chooseField(t: TestField, a: ScalarField, b: ScalarField): ScalarField {
  const test = t.test;
  const fa = a.at;
  const fb = b.at;
  return {
    at: (x, y) => (test(x, y) ? fa(x, y) : fb(x, y)),
    bound: (box) => {
      const p = a.bound(box);
      const q = b.bound(box);
      return { lo: Math.min(p.lo, q.lo), hi: Math.max(p.hi, q.hi), slope: Math.max(p.slope, q.slope) };
    },
    symmetry: mergeSymmetry(t.symmetry, mergeSymmetry(a.symmetry, b.symmetry)),
    focus: null,
  };
}
