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

/**
 * Fraction of every pixel covered by the union of the polygons (each even-odd filled): exact across each
 * of SUB_ROWS scan lines per pixel row, so edges are antialiased. Row-major n×n.
 */
export function polygonCoverage(polygons: Float64Array[], grid: Grid): Float32Array {
  const { x0, y0, pitch, n } = grid;
  const coverage = new Float32Array(n * n);
  // edge table: polygon id, endpoints with ya < yb
  const edges: Array<{ id: number; xa: number; ya: number; xb: number; yb: number }> = [];
  polygons.forEach((p, id) => {
    for (let i = 0, j = p.length - 2; i < p.length; j = i, i += 2) {
      const [xa, ya, xb, yb] = p[i + 1] < p[j + 1] ? [p[i], p[i + 1], p[j], p[j + 1]] : [p[j], p[j + 1], p[i], p[i + 1]];
      if (ya !== yb) edges.push({ id, xa, ya, xb, yb });
    }
  });
  edges.sort((a, b) => a.ya - b.ya);
  let next = 0;
  let active: typeof edges = [];
  const crossings: Array<{ id: number; x: number }> = [];
  const spans: Array<[number, number]> = [];
  const weight = 1 / SUB_ROWS;
  for (let row = 0; row < n; row++) {
    for (let sub = 0; sub < SUB_ROWS; sub++) {
      const y = y0 + (row + (sub + 0.5) / SUB_ROWS) * pitch;
      while (next < edges.length && edges[next].ya <= y) active.push(edges[next++]);
      active = active.filter((e) => e.yb > y);
      if (active.length === 0) continue;
      crossings.length = 0;
      for (const e of active) {
        if (e.ya <= y) crossings.push({ id: e.id, x: e.xa + ((y - e.ya) * (e.xb - e.xa)) / (e.yb - e.ya) });
      }
      crossings.sort((a, b) => a.id - b.id || a.x - b.x);
      spans.length = 0;
      for (let i = 0; i + 1 < crossings.length; i += 2) spans.push([crossings[i].x, crossings[i + 1].x]);
      spans.sort((a, b) => a[0] - b[0]);
      let start = -Infinity;
      let end = -Infinity;
      for (const [s, e] of spans) {
        if (s > end) {
          if (end > start) addSpan(coverage, row, n, (start - x0) / pitch, (end - x0) / pitch, weight);
          start = s;
          end = e;
        } else end = Math.max(end, e);
      }
      if (end > start) addSpan(coverage, row, n, (start - x0) / pitch, (end - x0) / pitch, weight);
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
