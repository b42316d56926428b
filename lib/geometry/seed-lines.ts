import type { PhaseField } from '../design/types';
import { type Domain } from './domain';
import { scanSegment } from './scan-segment';

/**
 * Seed lines: horizontal and vertical lines at a fixed spacing, offset from an anchor point (the
 * symmetry centre or a focus, through which the tiles are cut). scan-segment.ts samples them so that
 * each sample interval holds crossings of at most one boundary level, for single waves and
 * combinations alike; a boundary grazing a line (crossing it twice within one interval) is not seen
 * there. A contour is traced from the first unvisited crossing and marks every crossing it passes.
 */
export interface SeedLine {
  /** y of a horizontal line, x of a vertical one */
  coordinate: number;
  /** crossing positions along the line (x for horizontal, y for vertical), increasing */
  positions: Float64Array;
  /** sample step used around each crossing */
  steps: Float64Array;
  /** 0 while unvisited, else the number of the trace that passed it */
  visited: Int32Array;
  /** how often that trace passed it */
  passes: Uint8Array;
}

export interface SeedGrid {
  spacing: number;
  horizontalBase: number;
  verticalBase: number;
  /** horizontal line k sits at horizontalBase + (k + horizontalFirst)·spacing */
  horizontalFirst: number;
  verticalFirst: number;
  horizontal: SeedLine[];
  vertical: SeedLine[];
}

/** Parameter interval [s0, s1] of the line p + s·d inside the convex domain (empty when s0 > s1). */
export function clipLineToDomain(domain: Domain, px: number, py: number, dx: number, dy: number): [number, number] {
  let s0 = -Infinity;
  let s1 = Infinity;
  for (let i = 0; i < domain.nx.length; i++) {
    const rate = domain.nx[i] * dx + domain.ny[i] * dy;
    const value = domain.nx[i] * px + domain.ny[i] * py - domain.c[i];
    if (rate === 0) {
      if (value < 0) return [1, 0];
    } else if (rate > 0) s0 = Math.max(s0, -value / rate);
    else s1 = Math.min(s1, -value / rate);
  }
  return [s0, s1];
}

function scanLine(
  g: (x: number, y: number) => number,
  field: PhaseField,
  phaseGap: number,
  domain: Domain,
  horizontal: boolean,
  coordinate: number,
  tolerance: number,
): SeedLine {
  const [dx, dy] = horizontal ? [1, 0] : [0, 1];
  const [px, py] = horizontal ? [0, coordinate] : [coordinate, 0];
  const [s0, s1] = clipLineToDomain(domain, px, py, dx, dy);
  if (!(s1 > s0)) return { coordinate, positions: new Float64Array(0), steps: new Float64Array(0), visited: new Int32Array(0), passes: new Uint8Array(0) };
  const found = scanSegment(g, field, phaseGap, px + s0 * dx, py + s0 * dy, px + s1 * dx, py + s1 * dy, tolerance);
  const positions = Float64Array.from(found.t, (t) => s0 + t * (s1 - s0));
  return { coordinate, positions, steps: Float64Array.from(found.step), visited: new Int32Array(positions.length), passes: new Uint8Array(positions.length) };
}

export function buildSeedGrid(
  g: (x: number, y: number) => number,
  field: PhaseField,
  phaseGap: number,
  domain: Domain,
  spacing: number,
  anchorX: number,
  anchorY: number,
  tolerance: number,
): SeedGrid {
  const { box } = domain;
  const lines = (lo: number, hi: number, base: number) => {
    // strictly inside the box, so no seed line runs along the domain's edge
    const first = Math.floor((lo - base) / spacing) + 1;
    const last = Math.ceil((hi - base) / spacing) - 1;
    return { first, count: Math.max(0, last - first + 1) };
  };
  const h = lines(box.y0, box.y1, anchorY);
  const v = lines(box.x0, box.x1, anchorX);
  return {
    spacing,
    horizontalBase: anchorY,
    verticalBase: anchorX,
    horizontalFirst: h.first,
    verticalFirst: v.first,
    horizontal: Array.from({ length: h.count }, (_, k) => scanLine(g, field, phaseGap, domain, true, anchorY + (h.first + k) * spacing, tolerance)),
    vertical: Array.from({ length: v.count }, (_, k) => scanLine(g, field, phaseGap, domain, false, anchorX + (v.first + k) * spacing, tolerance)),
  };
}

/**
 * The seed on `line` that a traced crossing at `position` passes through, or −1. It must be the
 * nearest seed and closer than half the gap to its neighbours, so a crossing is never credited to a
 * different boundary found on the line, and closer than half its sample step or `slack` (how far a
 * traced chord may cross the line from the curve's crossing), whichever is larger: near a zero of a
 * combined field the sample step can be shorter than the chord's error.
 */
export function matchSeed(line: SeedLine, position: number, slack: number): number {
  const p = line.positions;
  let lo = 0;
  let hi = p.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (p[mid] < position) lo = mid + 1;
    else hi = mid;
  }
  const below = lo > 0 ? position - p[lo - 1] : Infinity;
  const above = lo < p.length ? p[lo] - position : Infinity;
  if (below === Infinity && above === Infinity) return -1;
  const best = below <= above ? lo - 1 : lo;
  const distance = Math.min(below, above);
  let limit = Math.max(0.5 * line.steps[best], slack);
  if (best > 0) limit = Math.min(limit, 0.5 * (p[best] - p[best - 1]));
  if (best < p.length - 1) limit = Math.min(limit, 0.5 * (p[best + 1] - p[best]));
  return distance < limit ? best : -1;
}
