import type { PhaseField } from '../design/types';

/** Crossings of g = 0 found along one straight segment. */
export interface SegmentCrossings {
  /** parameter along the segment, 0..1, increasing */
  t: number[];
  /** sample step (µm) used where each crossing was found */
  step: number[];
}

const CHUNK_LENGTH = 256;
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
  field: PhaseField,
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
  const chunks = Math.max(1, Math.ceil(length / CHUNK_LENGTH));
  let tPrev = 0;
  let gPrev = at(0);
  for (let c = 0; c < chunks; c++) {
    const t0 = c / chunks;
    const t1 = (c + 1) / chunks;
    const cx0 = ax + t0 * dx;
    const cy0 = ay + t0 * dy;
    const cx1 = ax + t1 * dx;
    const cy1 = ay + t1 * dy;
    const frequency = field.maxSpatialFrequency(Math.min(cx0, cx1), Math.min(cy0, cy1), Math.max(cx0, cx1), Math.max(cy0, cy1));
    const chunkLength = length / chunks;
    const h = safeStep(phaseGap, frequency, chunkLength);
    const n = Math.max(1, Math.ceil(chunkLength / h));
    for (let i = 1; i <= n; i++) {
      const t = t0 + ((t1 - t0) * i) / n;
      const gt = at(t);
      if (gPrev > 0 !== gt > 0) {
        const root = refineRoot(at, tPrev, gPrev, t, gt, tolerance / length);
        // A zero that g only touches (a phase extremum sitting on a boundary level) is no boundary.
        const eps = Math.min(1e-3, chunkLength / n / 4) / length;
        if (at(root - eps) > 0 !== at(root + eps) > 0) {
          out.t.push(root);
          out.step.push(chunkLength / n);
        }
      }
      tPrev = t;
      gPrev = gt;
    }
  }
  return out;
}
