import type { CompiledDesign } from '../design/types';
import { narrowReach, openingLoss } from './narrow-features';
import type { MaskOptions } from './options';
import { loopBounds, signedArea } from './polygon-math';

/** Consecutive edges bounded together before a run is halved; long enough that box tests stay few. */
const RUN_EDGES = 256;
/** More groups of axis-parallel edges than this and the polygon is simply opened whole (each window costs a pass over it). */
const MOST_CUTS = 16;

/**
 * The polygons of one layer the opening test of narrow-features.ts must look at; the others are
 * proven to lose nothing it would report. With m the opening width, h = m/2:
 *
 * 1. A point p the mitred opening removes is also removed by the opening with a disk (mitred offsets
 *    reach at least as far as round ones). So no disk of radius h inside the polygon holds p: p lies
 *    closer than h to the boundary, and the disk of radius h touching the nearest boundary point q
 *    from inside, which holds p, leaves the polygon through another boundary point z. Both lie in
 *    that disk: |q − z| < m, and p, q, z are all within m of q.
 * 2. If q and z lie on zone boundaries of different phase levels, the phase changes by at least
 *    phaseGap between them, and by at most 2π·F per µm, so |q − z| ≥ phaseGap/(2π·F) with F the
 *    frequency bound over any box holding the segment. Drawn edges stand up to δ = chord tolerance +
 *    one grid step off the exact boundary, so the boxes (one per run of consecutive edges, halved
 *    until the test passes or one edge is left) are grown by m + 2δ and the test asks
 *    phaseGap/(2π·F) ≥ m + 2δ. phaseGap is the smaller of the drawn and undrawn phase spans, so the
 *    same holds for the gaps; but only drawn polygons are opened here (gaps are measured on the
 *    report's rays).
 * 3. Edges that are not zone boundaries: aperture and piece-region edges (polygons the tiles mark as
 *    clipped are always opened) and the straight tile and fracture cuts, which are axis-parallel. A
 *    cut can make a thin wedge where it meets a boundary at a shallow angle, so every axis-parallel
 *    edge is treated as a cut: by 1. anything lost because of it lies within m of it. The opening
 *    only looks about 2m around a point (mitre spikes reach 2·h, twice), so the polygon is cut to a
 *    window 3·(m + 2δ) wider than that core (when nothing else of it enters the window) and the
 *    window is opened instead. Every place the whole opening would report (area ≥ m²/4) lies in
 *    the cores, so the polygon is cleared when the pieces its windows lose in their cores add up to
 *    less than that.
 * narrow-features.ts opens the union of the layer's pieces; the union's opening holds each piece's,
 * so what a piece does not lose alone the union does not lose there either.
 * Step 2 needs F to bound |∇φ|/2π, which holds for single waves only: for a combination F bounds
 * the parts, not arg u (PhaseField.maxFieldGradient is set), so every polygon is opened. Not
 * covered, as with the bound this replaces: one phase level bending back within m of itself (a
 * ridge or valley of the phase across a zone, or a level curve curving tighter than m/2).
 */
export function narrowCandidates(design: CompiledDesign, options: MaskOptions, phaseGap: number, polygons: Float64Array[], clipped: Set<Float64Array>): Set<Float64Array> {
  const gridUm = options.databaseUnit / 1e-6;
  const width = options.minimumFeature / gridUm;
  // whole grid steps, so the windows of step 3 have integer corners
  const reach = narrowReach(width, options.chordTolerance / gridUm);
  const wideEnough = (x0: number, y0: number, x1: number, y1: number): boolean => {
    const ux0 = (x0 - reach) * gridUm;
    const uy0 = (y0 - reach) * gridUm;
    const ux1 = (x1 + reach) * gridUm;
    const uy1 = (y1 + reach) * gridUm;
    for (const piece of design.pieces) {
      const frequency = piece.field.maxSpatialFrequency(ux0, uy0, ux1, uy1);
      if (!(phaseGap / (2 * Math.PI * frequency) >= reach * gridUm)) return false;
    }
    return true;
  };
  if (design.pieces.some((piece) => piece.field.maxFieldGradient)) return new Set(polygons);
  const arcTolerance = options.chordTolerance / gridUm;
  const candidates = new Set<Float64Array>();
  for (const p of polygons) {
    if (clipped.has(p) || !boundaryClears(p, wideEnough)) {
      candidates.add(p);
      continue;
    }
    const windows = cutWindows(p, reach);
    if (!windows || !windowsClear(windows, width, arcTolerance)) candidates.add(p);
  }
  return candidates;
}

/** Step 2: every run of edges passes the frequency test on its box grown by the reach. */
function boundaryClears(p: Float64Array, wideEnough: (x0: number, y0: number, x1: number, y1: number) => boolean): boolean {
  const n = p.length / 2;
  // edge i runs from vertex i to vertex i + 1 (mod n); a run covers edges [from, to)
  const runClears = (from: number, to: number): boolean => {
    let x0 = Infinity;
    let y0 = Infinity;
    let x1 = -Infinity;
    let y1 = -Infinity;
    for (let i = from; i <= to; i++) {
      const k = 2 * (i % n);
      if (p[k] < x0) x0 = p[k];
      if (p[k] > x1) x1 = p[k];
      if (p[k + 1] < y0) y0 = p[k + 1];
      if (p[k + 1] > y1) y1 = p[k + 1];
    }
    if (wideEnough(x0, y0, x1, y1)) return true;
    if (to - from <= 1) return false;
    const mid = (from + to) >> 1;
    return runClears(from, mid) && runClears(mid, to);
  };
  for (let from = 0; from < n; from += RUN_EDGES) if (!runClears(from, Math.min(n, from + RUN_EDGES))) return false;
  return true;
}

interface CutWindow {
  /** the polygon's part inside the window */
  part: Float64Array;
  /** points within the reach of the cuts */
  core: Box;
}

/**
 * Step 3, first half: one window per group of nearby axis-parallel edges (a cut and the short steps
 * the tracer takes beside it), each with the polygon's part in it; null when the polygon must be
 * opened whole (too many such edges, or another part of it enters a window).
 */
function cutWindows(p: Float64Array, reach: number): CutWindow[] | null {
  const n = p.length / 2;
  const groups: { edge: number; core: Box }[] = [];
  for (let i = 0; i < n; i++) {
    const j = i + 1 === n ? 0 : i + 1;
    if (p[2 * i] !== p[2 * j] && p[2 * i + 1] !== p[2 * j + 1]) continue;
    const core = {
      x0: Math.min(p[2 * i], p[2 * j]) - reach,
      y0: Math.min(p[2 * i + 1], p[2 * j + 1]) - reach,
      x1: Math.max(p[2 * i], p[2 * j]) + reach,
      y1: Math.max(p[2 * i + 1], p[2 * j + 1]) + reach,
    };
    const near = groups.find((g) => boxesMeet(g.core, core));
    if (near) near.core = joinBoxes(near.core, core);
    else if (groups.push({ edge: i, core }) > MOST_CUTS) return null;
  }
  const out: CutWindow[] = [];
  for (const { edge, core } of groups) {
    const window = { x0: core.x0 - 3 * reach, y0: core.y0 - 3 * reach, x1: core.x1 + 3 * reach, y1: core.y1 + 3 * reach };
    const chain = chainInBox(p, edge, window);
    if (!chain) return null;
    out.push({ part: windowPart(p, chain, window), core });
  }
  return out;
}

/** Step 3, second half: whether the polygon's windows lose less than a reportable area in their cores. */
function windowsClear(windows: CutWindow[], width: number, arcTolerance: number): boolean {
  let lost = 0;
  for (const w of windows) {
    for (const piece of openingLoss([w.part], width, arcTolerance)) {
      if (boxesMeet(loopBounds(piece), w.core)) lost += Math.abs(signedArea(piece));
    }
    if (lost >= 0.25 * width * width) return false;
  }
  return true;
}

interface Box {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

const inBox = (b: Box, x: number, y: number) => x >= b.x0 && x <= b.x1 && y >= b.y0 && y <= b.y1;
const boxesMeet = (a: Box, b: Box) => a.x0 <= b.x1 && a.x1 >= b.x0 && a.y0 <= b.y1 && a.y1 >= b.y0;
const joinBoxes = (a: Box, b: Box): Box => ({ x0: Math.min(a.x0, b.x0), y0: Math.min(a.y0, b.y0), x1: Math.max(a.x1, b.x1), y1: Math.max(a.y1, b.y1) });

/** Whether the segment (ax, ay)–(bx, by) meets the box (Liang–Barsky clipping). */
function segmentMeetsBox(ax: number, ay: number, bx: number, by: number, b: Box): boolean {
  if ((ax < b.x0 && bx < b.x0) || (ax > b.x1 && bx > b.x1) || (ay < b.y0 && by < b.y0) || (ay > b.y1 && by > b.y1)) return false;
  let t0 = 0;
  let t1 = 1;
  const clip = (q: number, r: number): boolean => {
    if (q === 0) return r >= 0;
    const t = r / q;
    if (q < 0) t0 = Math.max(t0, t);
    else t1 = Math.min(t1, t);
    return t0 <= t1;
  };
  const dx = bx - ax;
  const dy = by - ay;
  return clip(-dx, ax - b.x0) && clip(dx, b.x1 - ax) && clip(-dy, ay - b.y0) && clip(dy, b.y1 - ay);
}

/** Where the segment from an inside point a to an outside point b leaves the box. */
function exitPoint(ax: number, ay: number, bx: number, by: number, b: Box): [number, number] {
  let t = 1;
  if (bx > b.x1) t = Math.min(t, (b.x1 - ax) / (bx - ax));
  if (bx < b.x0) t = Math.min(t, (b.x0 - ax) / (bx - ax));
  if (by > b.y1) t = Math.min(t, (b.y1 - ay) / (by - ay));
  if (by < b.y0) t = Math.min(t, (b.y0 - ay) / (by - ay));
  const x = Math.min(b.x1, Math.max(b.x0, Math.round(ax + t * (bx - ax))));
  const y = Math.min(b.y1, Math.max(b.y0, Math.round(ay + t * (by - ay))));
  return [x, y];
}

/** Position along the box outline, counter-clockwise from its lower-left corner. */
function outlinePosition(b: Box, x: number, y: number): number {
  const w = b.x1 - b.x0;
  const h = b.y1 - b.y0;
  if (y === b.y0) return x - b.x0;
  if (x === b.x1) return w + (y - b.y0);
  if (y === b.y1) return w + h + (b.x1 - x);
  return 2 * w + h + (b.y1 - y);
}

/**
 * The chain of a counter-clockwise polygon through its edge e (vertex e to e + 1) inside the box:
 * vertices back + 1 … ahead − 1 are inside, back and ahead the first ones outside (indices may run
 * past the ends). Null when any other part of the polygon enters the box, or the chain never leaves it.
 */
function chainInBox(p: Float64Array, e: number, b: Box): { back: number; ahead: number } | null {
  const n = p.length / 2;
  const at = (i: number) => 2 * (((i % n) + n) % n);
  let back = e;
  while (inBox(b, p[at(back)], p[at(back) + 1])) {
    back--;
    if (e - back >= n) return null;
  }
  let ahead = e + 1;
  while (inBox(b, p[at(ahead)], p[at(ahead) + 1])) {
    ahead++;
    if (ahead - back >= n) return null;
  }
  if (ahead - back >= n) return null;
  // the rest of the polygon, from vertex `ahead` round to vertex `back`, must stay out of the box
  for (let k = 0, i = at(ahead) / 2; k < n - (ahead - back); k++) {
    const j = i + 1 === n ? 0 : i + 1;
    if (segmentMeetsBox(p[2 * i], p[2 * i + 1], p[2 * j], p[2 * j + 1], b)) return null;
    i = j;
  }
  return { back, ahead };
}

/** The part of a counter-clockwise polygon inside the box: its chain there, closed along the box outline. */
function windowPart(p: Float64Array, chain: { back: number; ahead: number }, b: Box): Float64Array {
  const n = p.length / 2;
  const x = (i: number) => p[2 * (((i % n) + n) % n)];
  const y = (i: number) => p[2 * (((i % n) + n) % n) + 1];
  const { back, ahead } = chain;
  const points: number[] = [];
  const entry = exitPoint(x(back + 1), y(back + 1), x(back), y(back), b);
  points.push(entry[0], entry[1]);
  for (let i = back + 1; i < ahead; i++) points.push(x(i), y(i));
  const exit = exitPoint(x(ahead - 1), y(ahead - 1), x(ahead), y(ahead), b);
  points.push(exit[0], exit[1]);
  // counter-clockwise along the outline from the exit back to the entry keeps the inside on the left
  const perimeter = 2 * (b.x1 - b.x0 + b.y1 - b.y0);
  const from = outlinePosition(b, exit[0], exit[1]);
  let to = outlinePosition(b, entry[0], entry[1]);
  if (to <= from) to += perimeter;
  const corners: [number, number, number][] = [
    [b.x1 - b.x0, b.x1, b.y0],
    [b.x1 - b.x0 + (b.y1 - b.y0), b.x1, b.y1],
    [2 * (b.x1 - b.x0) + (b.y1 - b.y0), b.x0, b.y1],
    [perimeter, b.x0, b.y0],
  ];
  for (let lap = 0; lap < 2; lap++) {
    for (const [s, cx, cy] of corners) {
      const at = s + lap * perimeter;
      if (at > from && at < to) points.push(cx, cy);
    }
  }
  return Float64Array.from(points);
}
