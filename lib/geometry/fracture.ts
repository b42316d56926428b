import { cleanLoop, loopBounds, signedArea, type Bounds } from './polygon-math';
import { splitByHorizontalLine, splitByVerticalLine } from './split-by-line';

/** Cut positions tried, as fractions of the span, in order of preference. */
const CUT_FRACTIONS = [0.5, 0.42, 0.58, 0.34, 0.66];
/** A cut is good when it crosses every edge at more than this sine of the angle (30°). */
const GOOD_CROSSING = 0.5;

/** Smallest |sin| of the angle between the line and the edges it crosses (1 when it crosses none). */
function crossingQuality(loops: Float64Array[], horizontal: boolean, c: number): number {
  let worst = 1;
  const a = horizontal ? 1 : 0;
  for (const loop of loops) {
    const n = loop.length / 2;
    for (let i = 0, j = n - 1; i < n; j = i++) {
      if (loop[2 * i + a] >= c !== loop[2 * j + a] >= c) {
        const dx = loop[2 * i] - loop[2 * j];
        const dy = loop[2 * i + 1] - loop[2 * j + 1];
        const s = Math.abs(horizontal ? dy : dx) / Math.hypot(dx, dy);
        if (s < worst) worst = s;
      }
    }
  }
  return worst;
}

function chooseCut(loops: Float64Array[], horizontal: boolean, lo: number, hi: number): number {
  let best = Math.round(lo + 0.5 * (hi - lo));
  let bestQuality = -1;
  for (const f of CUT_FRACTIONS) {
    const c = Math.round(lo + f * (hi - lo));
    if (c <= lo || c > hi) continue;
    const q = crossingQuality(loops, horizontal, c);
    if (q > bestQuality) {
      best = c;
      bestQuality = q;
    }
    if (q >= GOOD_CROSSING) break;
  }
  return best;
}

const contains = (outer: Bounds, inner: Bounds) => outer.x0 <= inner.x0 && outer.y0 <= inner.y0 && outer.x1 >= inner.x1 && outer.y1 >= inner.y1;

/**
 * Removes holes: each hole gets a horizontal cut through it, applied to the holes it crosses and to
 * the outlines that can contain them, so every polygon cut is cut with all its loops.
 */
function removeHoles(loops: Float64Array[]): Float64Array[] {
  let current = loops;
  for (let guard = 0; guard < 1_000_000; guard++) {
    const hole = current.find((l) => signedArea(l) < 0);
    if (!hole) return current;
    const hb = loopBounds(hole);
    const crosses = (b: Bounds, c: number) => b.y0 < c && b.y1 >= c;
    const bounds = current.map(loopBounds);
    const areas = current.map(signedArea);
    const c = chooseCut([hole], true, hb.y0, hb.y1);
    const crossedHoles = current.map((_, i) => areas[i] < 0 && crosses(bounds[i], c));
    const holeBounds = bounds.filter((_, i) => crossedHoles[i]);
    const group: Float64Array[] = [];
    const rest: Float64Array[] = [];
    current.forEach((l, i) => {
      const inGroup = crossedHoles[i] || (areas[i] > 0 && crosses(bounds[i], c) && holeBounds.some((h) => contains(bounds[i], h)));
      (inGroup ? group : rest).push(l);
    });
    const { below, above } = splitByHorizontalLine(group, c);
    current = rest.concat(cleanAll(below), cleanAll(above));
  }
  return current;
}

function cleanAll(loops: Float64Array[]): Float64Array[] {
  const out: Float64Array[] = [];
  for (const l of loops) {
    const c = cleanLoop(l);
    if (c) out.push(c);
  }
  return out;
}

/** Splits a hole-free loop until every piece has at most `maxVertices` points. */
function capVertices(loop: Float64Array, maxVertices: number, out: Float64Array[]): void {
  if (loop.length / 2 <= maxVertices) {
    out.push(loop);
    return;
  }
  const b = loopBounds(loop);
  const horizontal = b.y1 - b.y0 > b.x1 - b.x0;
  const pieces = horizontal
    ? (() => {
        const s = splitByHorizontalLine([loop], chooseCut([loop], true, b.y0, b.y1));
        return s.below.concat(s.above);
      })()
    : (() => {
        const s = splitByVerticalLine([loop], chooseCut([loop], false, b.x0, b.x1));
        return s.left.concat(s.right);
      })();
  for (const p of cleanAll(pieces)) capVertices(p, maxVertices, out);
}

/**
 * Fracturing for strict pattern generators: integer loops in, hole-free counter-clockwise loops of at
 * most `maxVertices` points out. Cuts are placed to cross edges steeply, which keeps pieces from
 * becoming slivers along a cut.
 */
export function fracture(loops: Float64Array[], maxVertices: number): Float64Array[] {
  const out: Float64Array[] = [];
  for (const l of removeHoles(loops)) capVertices(l, maxVertices, out);
  return out;
}
