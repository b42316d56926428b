import type { Region } from '../design/types';
import { regionContains } from '../design/region-contains';

/** A square sampling grid: pixel (i, j) covers [x0 + i·pitch, x0 + (i+1)·pitch) × [y0 + j·pitch, …). */
export interface Grid {
  x0: number;
  y0: number;
  pitch: number;
  n: number;
}

const SUB_ROWS = 8;

/**
 * Sweeps the grid's scan lines (SUB_ROWS per pixel row). On each line every polygon is even-odd filled
 * on its own and the polygons of a layer are united; `visit` receives each run [x0, x1) of constant
 * state, the state's bit k set where layer k is drawn (runs with no layer drawn are skipped).
 */
function sweepStates(layers: Float64Array[][], grid: Grid, visit: (row: number, x0: number, x1: number, state: number) => void): void {
  const xa: number[] = [];
  const ya: number[] = [];
  const xb: number[] = [];
  const yb: number[] = [];
  const polygonOf: number[] = [];
  const layerOfPolygon: number[] = [];
  layers.forEach((polygons, layer) => {
    for (const p of polygons) {
      const id = layerOfPolygon.length;
      layerOfPolygon.push(layer);
      for (let i = 0, j = p.length - 2; i < p.length; j = i, i += 2) {
        if (p[i + 1] === p[j + 1]) continue;
        const low = p[i + 1] < p[j + 1] ? i : j;
        const high = low === i ? j : i;
        xa.push(p[low]);
        ya.push(p[low + 1]);
        xb.push(p[high]);
        yb.push(p[high + 1]);
        polygonOf.push(id);
      }
    }
  });
  const order = Array.from(ya.keys()).sort((a, b) => ya[a] - ya[b]);
  const parity = new Uint8Array(layerOfPolygon.length);
  const inside = new Int32Array(layers.length);
  // active edges kept in x order from line to line: the order barely changes, so insertion sort is near linear
  let active: number[] = [];
  let xs: number[] = [];
  let next = 0;
  for (let line = 0; line < grid.n * SUB_ROWS; line++) {
    const row = Math.floor(line / SUB_ROWS);
    const y = grid.y0 + ((line + 0.5) / SUB_ROWS) * grid.pitch;
    const kept: number[] = [];
    for (const e of active) if (yb[e] > y) kept.push(e);
    while (next < order.length && ya[order[next]] <= y) {
      const e = order[next++];
      if (yb[e] > y) kept.push(e);
    }
    active = kept;
    xs = active.map((e) => xa[e] + ((y - ya[e]) * (xb[e] - xa[e])) / (yb[e] - ya[e]));
    for (let i = 1; i < active.length; i++) {
      const x = xs[i];
      const e = active[i];
      let j = i - 1;
      while (j >= 0 && xs[j] > x) {
        xs[j + 1] = xs[j];
        active[j + 1] = active[j];
        j--;
      }
      xs[j + 1] = x;
      active[j + 1] = e;
    }
    let state = 0;
    let from = 0;
    for (let c = 0; c < active.length; c++) {
      const x = xs[c];
      if (state !== 0 && x > from) visit(row, from, x, state);
      const id = polygonOf[active[c]];
      const layer = layerOfPolygon[id];
      parity[id] ^= 1;
      inside[layer] += parity[id] ? 1 : -1;
      state = inside[layer] > 0 ? state | (1 << layer) : state & ~(1 << layer);
      from = x;
    }
  }
}

/** Fraction of every pixel covered by the union of the polygons, antialiased. Row-major n×n. */
export function polygonCoverage(polygons: Float64Array[], grid: Grid): Float32Array {
  return stateCoverage([polygons], grid)[1];
}

/**
 * Joint coverage of several layers: for every combination of drawn layers (bit k set = layer k drawn)
 * except none, the fraction of each pixel in exactly that combination. A multi-level pixel that holds
 * several level edges is then averaged correctly, which per-layer coverages alone cannot do.
 */
export function stateCoverage(layers: Float64Array[][], grid: Grid): Float32Array[] {
  const { n, x0, pitch } = grid;
  const coverage = Array.from({ length: 2 ** layers.length }, (_, s) => (s === 0 ? new Float32Array(0) : new Float32Array(n * n)));
  sweepStates(layers, grid, (row, a, b, state) => addSpan(coverage[state], row, n, (a - x0) / pitch, (b - x0) / pitch, 1 / SUB_ROWS));
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
