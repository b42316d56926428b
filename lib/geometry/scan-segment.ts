import type { PhaseField } from '../design/types';

/** Crossings of g = 0 found along one straight segment. */
export interface SegmentCrossings {
  /** parameter along the segment, 0..1, increasing */
  t: number[];
  /** sample step (µm) used where each crossing was found */
  step: number[];
}

const CHUNK_LENGTH = 256;
const MAX_SAMPLES_PER_PIECE = 4096;
/** µm; below this a piece is sampled at most MAX_SAMPLES_PER_PIECE times whatever the bound says */
const MIN_PIECE_LENGTH = 1e-3;
/** Fraction of the proven-safe step actually used, so rounding never breaks the bound. */
const SAFETY = 0.9;

/**
 * The sample step that leaves at most one boundary crossing per interval: the phase changes by at
 * most 2π·F·h over a step h when F bounds |∇φ|/2π, and consecutive boundaries differ in phase by at
 * least `phaseGap`, so h < phaseGap/(2π·F) keeps them in different intervals.
 */
export function safeStep(phaseGap: number, maxFrequency: number, fallback: number): number {
  if (!(maxFrequency > 0)) return fallback;
  return Math.min(fallback, (SAFETY * phaseGap) / (2 * Math.PI * maxFrequency));
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
 * Samples g along the segment A→B at the safe step for the local frequency bound and returns every
 * sign change of g (drawn side g > 0), refined to `tolerance` µm.
 */
export function scanSegment(
  g: (x: number, y: number) => number,
  field: Pick<PhaseField, 'maxSpatialFrequency'>,
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
  let tPrev = 0;
  let gPrev = at(0);
  // Pieces of the segment are sampled at their own safe step; a piece that would need many samples
  // is halved first, so a bound that blows up near a singular point costs only a few levels of halving.
  const sample = (t0: number, t1: number): void => {
    const x0 = ax + t0 * dx;
    const y0 = ay + t0 * dy;
    const x1 = ax + t1 * dx;
    const y1 = ay + t1 * dy;
    const pieceLength = (t1 - t0) * length;
    const frequency = field.maxSpatialFrequency(Math.min(x0, x1), Math.min(y0, y1), Math.max(x0, x1), Math.max(y0, y1));
    const h = safeStep(phaseGap, frequency, pieceLength);
    const n = Math.max(1, Math.ceil(pieceLength / h));
    if (n > MAX_SAMPLES_PER_PIECE && pieceLength > MIN_PIECE_LENGTH) {
      const mid = 0.5 * (t0 + t1);
      sample(t0, mid);
      sample(mid, t1);
      return;
    }
    const count = Math.min(n, MAX_SAMPLES_PER_PIECE);
    for (let i = 1; i <= count; i++) {
      const t = t0 + ((t1 - t0) * i) / count;
      const gt = at(t);
      if (gPrev > 0 !== gt > 0) {
        const root = refineRoot(at, tPrev, gPrev, t, gt, tolerance / length);
        // A zero that g only touches (a phase extremum sitting on a boundary level) is no boundary.
        const eps = Math.min(1e-3, pieceLength / count / 4) / length;
        if (at(root - eps) > 0 !== at(root + eps) > 0) {
          out.t.push(root);
          out.step.push(pieceLength / count);
        }
      }
      tPrev = t;
      gPrev = gt;
    }
  };
  const chunks = Math.max(1, Math.ceil(length / CHUNK_LENGTH));
  for (let c = 0; c < chunks; c++) sample(c / chunks, (c + 1) / chunks);
  return out;
}
