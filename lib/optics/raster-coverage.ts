import type { Region } from '../design/types';
import { regionContains } from './region';

/** A square sampling grid: pixel (i, j) covers [x0 + i·pitch, x0 + (i+1)·pitch) × [y0 + j·pitch, …). */
export interface Grid {
  x0: number;
  y0: number;
  pitch: number;
  n: number;
}

const SUB_ROWS = 8;

interface Edge {
  id: number;
  xa: number;
  ya: number;
  xb: number;
  yb: number;
}

/**
 * A scanner over the grid's scan lines (SUB_ROWS per pixel row, taken in increasing order): each call
 * returns that line's inside spans of the union of the polygons (each even-odd filled), sorted and merged.
 */
function spanScanner(polygons: Float64Array[], grid: Grid): (line: number) => Array<[number, number]> {
  const edges: Edge[] = [];
  polygons.forEach((p, id) => {
    for (let i = 0, j = p.length - 2; i < p.length; j = i, i += 2) {
      const [xa, ya, xb, yb] = p[i + 1] < p[j + 1] ? [p[i], p[i + 1], p[j], p[j + 1]] : [p[j], p[j + 1], p[i], p[i + 1]];
      if (ya !== yb) edges.push({ id, xa, ya, xb, yb });
    }
  });
  edges.sort((a, b) => a.ya - b.ya);
  let next = 0;
  let active: Edge[] = [];
  const crossings: Array<{ id: number; x: number }> = [];
  return (line) => {
    const y = grid.y0 + ((line + 0.5) / SUB_ROWS) * grid.pitch;
    while (next < edges.length && edges[next].ya <= y) active.push(edges[next++]);
    active = active.filter((e) => e.yb > y);
    crossings.length = 0;
    for (const e of active) crossings.push({ id: e.id, x: e.xa + ((y - e.ya) * (e.xb - e.xa)) / (e.yb - e.ya) });
    crossings.sort((a, b) => a.id - b.id || a.x - b.x);
    const raw: Array<[number, number]> = [];
    for (let i = 0; i + 1 < crossings.length; i += 2) raw.push([crossings[i].x, crossings[i + 1].x]);
    raw.sort((a, b) => a[0] - b[0]);
    const spans: Array<[number, number]> = [];
    for (const [s, e] of raw) {
      const last = spans[spans.length - 1];
      if (last && s <= last[1]) last[1] = Math.max(last[1], e);
      else spans.push([s, e]);
    }
    return spans;
  };
}

/** Fraction of every pixel covered by the union of the polygons, antialiased. Row-major n×n. */
export function polygonCoverage(polygons: Float64Array[], grid: Grid): Float32Array {
  const coverage = new Float32Array(grid.n * grid.n);
  const scan = spanScanner(polygons, grid);
  for (let line = 0; line < grid.n * SUB_ROWS; line++) {
    const row = Math.floor(line / SUB_ROWS);
    for (const [s, e] of scan(line)) addSpan(coverage, row, grid.n, (s - grid.x0) / grid.pitch, (e - grid.x0) / grid.pitch, 1 / SUB_ROWS);
  }
  return coverage;
}

/**
 * Joint coverage of several layers: for every combination of drawn layers (bit k set = layer k drawn)
 * except none, the fraction of each pixel in exactly that combination. A multi-level pixel that holds
 * several level edges is then averaged correctly, which per-layer coverages alone cannot do.
 */
export function stateCoverage(layers: Float64Array[][], grid: Grid): Float32Array[] {
  const { n, x0, pitch } = grid;
  const states = 2 ** layers.length;
  const coverage = Array.from({ length: states }, (_, s) => (s === 0 ? new Float32Array(0) : new Float32Array(n * n)));
  const scanners = layers.map((polygons) => spanScanner(polygons, grid));
  for (let line = 0; line < n * SUB_ROWS; line++) {
    const row = Math.floor(line / SUB_ROWS);
    const events: Array<{ x: number; bit: number; enter: boolean }> = [];
    scanners.forEach((scan, k) => {
      for (const [s, e] of scan(line)) events.push({ x: s, bit: 1 << k, enter: true }, { x: e, bit: 1 << k, enter: false });
    });
    events.sort((a, b) => a.x - b.x);
    let state = 0;
    for (let i = 0; i < events.length; i++) {
      state = events[i].enter ? state | events[i].bit : state & ~events[i].bit;
      const next = events[i + 1];
      if (state !== 0 && next && next.x > events[i].x) addSpan(coverage[state], row, n, (events[i].x - x0) / pitch, (next.x - x0) / pitch, 1 / SUB_ROWS);
    }
  }
  return coverage;
}

function addSpan(coverage: Float32Array, row: number, n: number, u0: number, u1: number, weight: number): void {
  const a = Math.max(0, u0);
  const b = Math.min(n, u1);
  if (b <= a) return;
  const base = row * n;
  const ia = Math.floor(a);
  const ib = Math.min(n - 1, Math.floor(b));
  if (ia === ib) {
    coverage[base + ia] += (b - a) * weight;
    return;
  }
  coverage[base + ia] += (ia + 1 - a) * weight;
  for (let i = ia + 1; i < ib; i++) coverage[base + i] += weight;
  coverage[base + ib] += (b - ib) * weight;
}

const REGION_SUBSAMPLES = 4;

/**
 * Fraction of every pixel inside a design region: pixels whose four corners agree are taken as wholly
 * in or out, the others are sampled REGION_SUBSAMPLES² times.
 */
export function regionCoverage(region: Region, grid: Grid): Float32Array {
  const { x0, y0, pitch, n } = grid;
  const corners = new Uint8Array((n + 1) * (n + 1));
  for (let j = 0; j <= n; j++) {
    for (let i = 0; i <= n; i++) corners[j * (n + 1) + i] = regionContains(region, x0 + i * pitch, y0 + j * pitch) ? 1 : 0;
  }
  const coverage = new Float32Array(n * n);
  for (let j = 0; j < n; j++) {
    for (let i = 0; i < n; i++) {
      const c = corners[j * (n + 1) + i] + corners[j * (n + 1) + i + 1] + corners[(j + 1) * (n + 1) + i] + corners[(j + 1) * (n + 1) + i + 1];
      if (c === 0 || c === 4) {
        coverage[j * n + i] = c / 4;
        continue;
      }
      let inside = 0;
      for (let b = 0; b < REGION_SUBSAMPLES; b++) {
        for (let a = 0; a < REGION_SUBSAMPLES; a++) {
          if (regionContains(region, x0 + (i + (a + 0.5) / REGION_SUBSAMPLES) * pitch, y0 + (j + (b + 0.5) / REGION_SUBSAMPLES) * pitch)) inside++;
        }
      }
      coverage[j * n + i] = inside / REGION_SUBSAMPLES ** 2;
    }
  }
  return coverage;
}
