import { averageWidth, cleanLoop, loopBounds, signedArea, type Bounds } from './polygon-math';
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

/** The smallest average width (2·area/perimeter) among the outlines a cut leaves; holes are skipped. */
function narrowestPiece(pieces: Float64Array[]): number {
  let narrowest = Infinity;
  for (const p of pieces) if (signedArea(p) > 0) narrowest = Math.min(narrowest, averageWidth(p));
  return narrowest;
}

/**
 * Picks a cut position in (lo, hi]: a cut that leaves no piece narrower than `minWidth` (grid units)
 * beats any that does, then the steeper crossing of `crossed`'s edges wins; when every position
 * leaves a sliver, the one leaving the widest. `split` gives the pieces of a cut at c.
 */
function chooseCut(crossed: Float64Array[], horizontal: boolean, lo: number, hi: number, minWidth: number, split: (c: number) => Float64Array[]): number {
  let best = Math.round(lo + 0.5 * (hi - lo));
  let bestScore = -Infinity;
  for (const f of CUT_FRACTIONS) {
    const c = Math.round(lo + f * (hi - lo));
    if (c <= lo || c > hi) continue;
    const quality = crossingQuality(crossed, horizontal, c);
    const narrowest = minWidth > 0 ? narrowestPiece(split(c)) : Infinity;
    const clean = narrowest >= minWidth;
    // clean cuts score 2 + quality (2..3), the others narrowest/minWidth (below 1)
    const score = clean ? 2 + quality : narrowest / minWidth;
    if (score > bestScore) {
      best = c;
      bestScore = score;
    }
    if (clean && quality >= GOOD_CROSSING) break;
  }
  return best;
}

const contains = (outer: Bounds, inner: Bounds) => outer.x0 <= inner.x0 && outer.y0 <= inner.y0 && outer.x1 >= inner.x1 && outer.y1 >= inner.y1;

/**
 * Removes holes: each hole gets a horizontal cut through it, applied to the holes it crosses and to
 * the outlines that can contain them, so every polygon cut is cut with all its loops.
 */
function removeHoles(loops: Float64Array[], minWidth: number): Float64Array[] {
  let current = loops;
  for (let guard = 0; guard < 1_000_000; guard++) {
    const hole = current.find((l) => signedArea(l) < 0);
    if (!hole) return current;
    const hb = loopBounds(hole);
    const crosses = (b: Bounds, c: number) => b.y0 < c && b.y1 >= c;
    const bounds = current.map(loopBounds);
    const areas = current.map(signedArea);
    // the loops a cut at c must take together, and the rest
    const grouped = (c: number) => {
      const crossedHoles = current.map((_, i) => areas[i] < 0 && crosses(bounds[i], c));
      const holeBounds = bounds.filter((_, i) => crossedHoles[i]);
      const group: Float64Array[] = [];
      const rest: Float64Array[] = [];
      current.forEach((l, i) => {
        const inGroup = crossedHoles[i] || (areas[i] > 0 && crosses(bounds[i], c) && holeBounds.some((h) => contains(bounds[i], h)));
        (inGroup ? group : rest).push(l);
      });
      return { group, rest };
    };
    const cutGroup = (c: number) => {
      const { below, above } = splitByHorizontalLine(grouped(c).group, c);
      return cleanAll(below).concat(cleanAll(above));
    };
    const c = chooseCut([hole], true, hb.y0, hb.y1, minWidth, cutGroup);
    current = grouped(c).rest.concat(cutGroup(c));
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
function capVertices(loop: Float64Array, maxVertices: number, minWidth: number, out: Float64Array[]): void {
  if (loop.length / 2 <= maxVertices) {
    out.push(loop);
    return;
  }
  const b = loopBounds(loop);
  const horizontal = b.y1 - b.y0 > b.x1 - b.x0;
  const split = (c: number) => {
    if (horizontal) {
      const s = splitByHorizontalLine([loop], c);
      return cleanAll(s.below.concat(s.above));
    }
    const s = splitByVerticalLine([loop], c);
    return cleanAll(s.left.concat(s.right));
  };
  const c = horizontal ? chooseCut([loop], true, b.y0, b.y1, minWidth, split) : chooseCut([loop], false, b.x0, b.x1, minWidth, split);
  for (const p of split(c)) capVertices(p, maxVertices, minWidth, out);
}

/**
 * Fracturing for strict pattern generators: integer loops in, hole-free counter-clockwise loops of at
 * most `maxVertices` points out. Of the cut positions tried, one leaving no piece narrower on
 * average than `minSliverWidth` (grid units; 0 for no such test) comes first, then one crossing the
 * edges steeply, so cuts do not make slivers; slivers the outline itself holds are left to the caller.
 */
export function fracture(loops: Float64Array[], maxVertices: number, minSliverWidth = 0): Float64Array[] {
  const out: Float64Array[] = [];
  for (const l of removeHoles(loops, minSliverWidth)) capVertices(l, maxVertices, minSliverWidth, out);
  return out;
}
