import type { Bound } from './bounds';
import { maxAbs, minAbs, times } from './bounds';
import type { ScalarField } from './scalar';
import { combineFields, mapField } from './scalar';

const ONE_ARGUMENT: Record<string, (u: number) => number> = {
  sin: Math.sin,
  cos: Math.cos,
  tan: Math.tan,
  sqrt: Math.sqrt,
  exp: Math.exp,
  log: Math.log,
  abs: Math.abs,
  floor: Math.floor,
};

/** Floored modulo: the result has the sign of b, as a phase wrap needs. */
function modulo(a: number, b: number): number {
  return a - b * Math.floor(a / b);
}

const TWO_ARGUMENTS: Record<string, (a: number, b: number) => number> = {
  atan2: Math.atan2,
  mod: modulo,
  min: Math.min,
  max: Math.max,
  hypot: (a, b) => Math.sqrt(a * a + b * b),
};

/** A math function applied to constants. */
export function mathValue(name: string, args: number[]): number {
  return args.length === 1 ? ONE_ARGUMENT[name](args[0]) : TWO_ARGUMENTS[name](args[0], args[1]);
}

const monotone = (f: (u: number) => number) => (u: Bound): [number, number] => [f(u.lo), f(u.hi)];
const unit = (): [number, number] => [-1, 1];

/** Whether the interval holds an odd multiple of π/2 (a pole of tan). */
function holdsPole(u: Bound): boolean {
  return Math.floor(u.lo / Math.PI - 0.5) !== Math.floor(u.hi / Math.PI - 0.5) || !Number.isFinite(u.lo) || !Number.isFinite(u.hi);
}

/** For one-argument functions: the value range over an input range and max |f′| there. */
const RULES: Record<string, { range: (u: Bound) => [number, number]; derivative: (u: Bound) => number }> = {
  sin: { range: unit, derivative: () => 1 },
  cos: { range: unit, derivative: () => 1 },
  tan: {
    range: (u) => (holdsPole(u) ? [-Infinity, Infinity] : [Math.tan(u.lo), Math.tan(u.hi)]),
    derivative: (u) => (holdsPole(u) ? Infinity : 1 + Math.max(Math.tan(u.lo) ** 2, Math.tan(u.hi) ** 2)),
  },
  sqrt: { range: (u) => [Math.sqrt(Math.max(u.lo, 0)), Math.sqrt(Math.max(u.hi, 0))], derivative: (u) => (u.lo > 0 ? 1 / (2 * Math.sqrt(u.lo)) : Infinity) },
  exp: { range: monotone(Math.exp), derivative: (u) => Math.exp(u.hi) },
  log: { range: (u) => [u.lo > 0 ? Math.log(u.lo) : -Infinity, Math.log(Math.max(u.hi, 0))], derivative: (u) => (u.lo > 0 ? 1 / u.lo : Infinity) },
  abs: { range: (u) => [minAbs(u), maxAbs(u)], derivative: () => 1 },
  // piecewise constant: its jumps are zone edges, not a spatial frequency
  floor: { range: monotone(Math.floor), derivative: () => 0 },
};

function powerRule(n: number): { range: (u: Bound) => [number, number]; derivative: (u: Bound) => number } {
  return {
    range: (u) => {
      const ends = [u.lo ** n, u.hi ** n];
      if (u.lo < 0 && u.hi > 0 && n > 0) ends.push(0);
      const finite = ends.filter((v) => !Number.isNaN(v));
      return finite.length < 2 || (u.lo < 0 && !Number.isInteger(n)) || (minAbs(u) === 0 && n < 0) ? [-Infinity, Infinity] : [Math.min(...finite), Math.max(...finite)];
    },
    derivative: (u) => {
      if (n === 0) return 0;
      const m = n - 1 >= 0 ? maxAbs(u) ** (n - 1) : minAbs(u) === 0 ? Infinity : minAbs(u) ** (n - 1);
      return Math.abs(n) * m;
    },
  };
}

/**
 * A math function of varying arguments. `power` raises the field to a constant;
 * `base` raises a positive constant to the field.
 */
export function mathField(name: string, args: ScalarField[], constant = 0): ScalarField {
  if (name === 'power') {
    const rule = powerRule(constant);
    return mapField(args[0], (u) => u ** constant, rule.range, rule.derivative);
  }
  if (name === 'base') {
    const ln = Math.log(constant);
    return mapField(args[0], (u) => constant ** u, (u) => [Math.min(constant ** u.lo, constant ** u.hi), Math.max(constant ** u.lo, constant ** u.hi)], (u) => Math.abs(ln) * Math.max(constant ** u.lo, constant ** u.hi));
  }
  if (args.length === 1) {
    const rule = RULES[name];
    return mapField(args[0], ONE_ARGUMENT[name], rule.range, rule.derivative);
  }
  const [a, b] = args;
  const f = TWO_ARGUMENTS[name];
  return combineFields(a, b, f, (u, v) => {
    switch (name) {
      case 'atan2': {
        // ∇atan2(a, b) = (b∇a − a∇b)/(a² + b²)
        const denominator = minAbs(u) ** 2 + minAbs(v) ** 2;
        const top = times(maxAbs(v), u.slope) + times(maxAbs(u), v.slope);
        return { lo: -Math.PI, hi: Math.PI, slope: top === 0 ? 0 : denominator === 0 ? Infinity : top / denominator };
      }
      case 'mod': {
        // a − b·floor(a/b): away from the jumps the slope is |∇a| + |floor(a/b)|·|∇b|
        const quotient = Math.max(maxAbs(u) / Math.max(minAbs(v), Number.MIN_VALUE), 0);
        return { lo: Math.min(0, v.lo), hi: Math.max(0, v.hi), slope: u.slope + times(Math.floor(quotient) + 1, v.slope) };
      }
      case 'hypot':
        return { lo: Math.hypot(minAbs(u), minAbs(v)), hi: Math.hypot(maxAbs(u), maxAbs(v)), slope: u.slope + v.slope };
      default:
        return { lo: f(u.lo, v.lo), hi: f(u.hi, v.hi), slope: Math.max(u.slope, v.slope) };
    }
  });
}
