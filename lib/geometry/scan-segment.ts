import type { PhaseField } from '../design/types';

/** What scanSegment needs of a field: its bounds, and u itself where it is a combination. */
export type SampledField = Pick<PhaseField, 'field' | 'maxSpatialFrequency' | 'maxFieldGradient'>;

/** Crossings of g = 0 found along one straight segment. */
export interface SegmentCrossings {
  /** parameter along the segment, 0..1, increasing */
  t: number[];
  /** length (µm) of the sample interval in which each crossing was found */
  step: number[];
}

const CHUNK_LENGTH = 256;
const MAX_SAMPLES_PER_PIECE = 4096;
/** µm; a piece shorter than this is never halved, whatever the bound says */
const MIN_PIECE_LENGTH = 1e-3;
/** Fraction of the proven-safe phase turn actually used, so rounding never breaks the bound. */
const SAFETY = 0.9;

/**
 * The sample step that leaves at most one boundary level per interval for a single wave: the phase
 * changes by at most 2π·F·h over a step h when F bounds |∇φ|/2π, and consecutive boundaries differ
 * in phase by at least `phaseGap`, so h < phaseGap/(2π·F) keeps them in different intervals.
 */
export function safeStep(phaseGap: number, maxFrequency: number, fallback: number): number {
  if (!(maxFrequency > 0)) return fallback;
  return Math.min(fallback, (SAFETY * phaseGap) / (2 * Math.PI * maxFrequency));
}

/**
 * The same guarantee for a combination u, from a sample where |u| = m and a bound G of |∇u|/2π
 * (`maxFieldGradient`) over the piece. With A = 2π·G, |u| ≥ m − A·t at distance t along the step,
 * and |∇arg u| ≤ |∇u|/|u|, so over a step h < m/A the phase turns by at most
 * ∫₀ʰ A/(m − A·t) dt = −ln(1 − A·h/m). Solving −ln(1 − A·h/m) = γ = SAFETY·phaseGap gives
 * h = (m/A)·(1 − e^(−γ)): u cannot vanish within the step and arg u turns by less than phaseGap.
 * The step shrinks towards zeros of u, where every boundary level meets.
 */
export function combinationStep(phaseGap: number, modulus: number, maxFieldGradient: number): number {
  if (maxFieldGradient === 0) return Infinity;
  if (!(maxFieldGradient < Infinity)) return 0;
  return (modulus / (2 * Math.PI * maxFieldGradient)) * -Math.expm1(-SAFETY * phaseGap);
}

/** Refines a bracketed root of f on [a, b] (f(a), f(b) of opposite sign) by the Illinois method. */
export function refineRoot(f: (t: number) => number, a: number, fa: number, b: number, fb: number, tolerance: number): number {
  let side = 0;
  for (let i = 0; i < 60 && Math.abs(b - a) > tolerance; i++) {
    const c = fa === fb ? 0.5 * (a + b) : (a * fb - b * fa) / (fb - fa);
    const fc = f(c);
    if (fc === 0) return c;
    if (fc > 0 === fb > 0) {
      b = c;
      fb = fc;
      if (side === -1) fa *= 0.5;
      side = -1;
    } else {
      a = c;
      fa = fc;
      if (side === 1) fb *= 0.5;
      side = 1;
    }
  }
  return fa === fb ? 0.5 * (a + b) : (a * fb - b * fa) / (fb - fa);
}

/**
 * Samples g along the segment A→B and returns every sign change of g (drawn side g > 0), refined to
 * `tolerance` µm. Between consecutive samples the phase turns by less than `phaseGap`, so each
 * interval holds crossings of at most one boundary level: a boundary crossing the segment an odd
 * number of times within one interval is found once, an even number of times (a boundary grazing
 * the segment) not at all. Steps are those of safeStep for a single wave and of combinationStep
 * for a combination (recomputed at every sample from |u| there), but never below `tolerance`:
 * an interval at that floor is certified only where |u| ≥ 2π·maxFieldGradient·tolerance/phaseGap,
 * i.e. boundaries closer than `tolerance` near a zero of u may merge.
 */
export function scanSegment(
  g: (x: number, y: number) => number,
  field: SampledField,
  phaseGap: number,
  ax: number,
  ay: number,
  bx: number,
  by: number,
  tolerance: number,
): SegmentCrossings {
  const length = Math.hypot(bx - ax, by - ay);
  const out: SegmentCrossings = { t: [], step: [] };
  if (length === 0) return out;
  const dx = bx - ax;
  const dy = by - ay;
  const at = (t: number) => g(ax + t * dx, ay + t * dy);
  const u = new Float64Array(2);
  const modulusAt = (t: number): number => {
    field.field(ax + t * dx, ay + t * dy, u);
    return Math.hypot(u[0], u[1]);
  };
  // the step floor; never so small that t + step/length rounds back to t
  const floor = Math.max(tolerance, length * 1e-12);
  // g at the last sample, carried from piece to piece
  let gPrev = at(0);
  // Pieces of the segment are sampled at their own bound. A piece whose first step says it needs many
  // samples is halved first, and one that runs out of samples on the way (|u| falling) halves what is
  // left, so a bound that blows up near a singular point costs only a few levels of halving.
  const sample = (t0: number, t1: number): void => {
    const x0 = ax + t0 * dx;
    const y0 = ay + t0 * dy;
    const x1 = ax + t1 * dx;
    const y1 = ay + t1 * dy;
    const bx0 = Math.min(x0, x1);
    const by0 = Math.min(y0, y1);
    const bx1 = Math.max(x0, x1);
    const by1 = Math.max(y0, y1);
    const pieceLength = (t1 - t0) * length;
    const gradient = field.maxFieldGradient?.(bx0, by0, bx1, by1);
    const fixed = gradient === undefined ? safeStep(phaseGap, field.maxSpatialFrequency(bx0, by0, bx1, by1), pieceLength) : 0;
    const stepAt = (t: number): number => {
      const h = gradient === undefined ? fixed : combinationStep(phaseGap, modulusAt(t), gradient);
      return h > floor ? h : floor;
    };
    let h = stepAt(t0);
    if (pieceLength / h > MAX_SAMPLES_PER_PIECE && pieceLength > MIN_PIECE_LENGTH) {
      const mid = 0.5 * (t0 + t1);
      sample(t0, mid);
      sample(mid, t1);
      return;
    }
    let t = t0;
    for (let count = 0; t < t1; count++) {
      if (count === MAX_SAMPLES_PER_PIECE && (t1 - t) * length > MIN_PIECE_LENGTH) {
        const mid = 0.5 * (t + t1);
        sample(t, mid);
        sample(mid, t1);
        return;
      }
      if (count > 0) h = stepAt(t);
      const next = Math.min(t1, t + h / length);
      const gt = at(next);
      if (gPrev > 0 !== gt > 0) {
        const root = refineRoot(at, t, gPrev, next, gt, tolerance / length);
        // A zero that g only touches (a phase extremum sitting on a boundary level) is no boundary.
        const interval = (next - t) * length;
        const eps = Math.min(1e-3, interval / 4) / length;
        if (at(root - eps) > 0 !== at(root + eps) > 0) {
          out.t.push(root);
          out.step.push(interval);
        }
      }
      gPrev = gt;
      t = next;
    }
  };
  const chunks = Math.max(1, Math.ceil(length / CHUNK_LENGTH));
  for (let c = 0; c < chunks; c++) sample(c / chunks, (c + 1) / chunks);
  return out;
}
