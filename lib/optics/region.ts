import { regionContains } from '../design/region-contains';
import type { Region } from '../design/types';

export interface Box {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

export function polygonsBounds(polygons: ArrayLike<number>[]): Box {
  let box: Box = { x0: Infinity, y0: Infinity, x1: -Infinity, y1: -Infinity };
  for (const p of polygons) {
    for (let i = 0; i < p.length; i += 2) {
      box = { x0: Math.min(box.x0, p[i]), y0: Math.min(box.y0, p[i + 1]), x1: Math.max(box.x1, p[i]), y1: Math.max(box.y1, p[i + 1]) };
    }
  }
  return box;
}


/**
 * The radius intervals [a0, b0, a1, b1, …] the region covers along any ray from (cx, cy), when the
 * region is built from circles and rings centred there; null when it is not rotationally symmetric about it.
 */
export function regionRadialIntervals(region: Region, cx: number, cy: number, tolerance: number): number[] | null {
  const centred = (x: number, y: number) => Math.abs(x - cx) <= tolerance && Math.abs(y - cy) <= tolerance;
  switch (region.kind) {
    case 'circle':
      return centred(region.cx, region.cy) ? [0, region.r] : null;
    case 'ring':
      return centred(region.cx, region.cy) ? [region.rInner, region.rOuter] : null;
    case 'rectangle':
    case 'polygon':
      return null;
    default: {
      const parts = region.parts.map((part) => regionRadialIntervals(part, cx, cy, tolerance));
      if (parts.some((p) => p === null)) return null;
      const sets = parts as number[][];
      if (region.kind === 'union') return sets.reduce(unionIntervals);
      if (region.kind === 'intersection') return sets.reduce(intersectIntervals);
      return sets.slice(1).reduce((acc, cut) => intersectIntervals(acc, complementIntervals(cut)), sets[0]);
    }
  }
}

/** Union of two sorted, disjoint interval lists (flat [a, b, …]). */
export function unionIntervals(a: number[], b: number[]): number[] {
  const all: Array<[number, number]> = [];
  for (const list of [a, b]) for (let i = 0; i < list.length; i += 2) all.push([list[i], list[i + 1]]);
  all.sort((p, q) => p[0] - q[0]);
  const out: number[] = [];
  for (const [s, e] of all) {
    if (out.length > 0 && s <= out[out.length - 1]) out[out.length - 1] = Math.max(out[out.length - 1], e);
    else out.push(s, e);
  }
  return out;
}

function intersectIntervals(a: number[], b: number[]): number[] {
  const out: number[] = [];
  for (let i = 0; i < a.length; i += 2) {
    for (let j = 0; j < b.length; j += 2) {
      const s = Math.max(a[i], b[j]);
      const e = Math.min(a[i + 1], b[j + 1]);
      if (e > s) out.push(s, e);
    }
  }
  return out;
}

function complementIntervals(a: number[]): number[] {
  const out = [0];
  for (let i = 0; i < a.length; i += 2) out.push(a[i], a[i + 1]);
  out.push(Infinity);
  return dropEmpty(out);
}

function dropEmpty(flat: number[]): number[] {
  const out: number[] = [];
  for (let i = 0; i < flat.length; i += 2) if (flat[i + 1] > flat[i]) out.push(flat[i], flat[i + 1]);
  return out;
}

/** Index of the design piece whose region holds (x, y): pieces with a region first, a piece without one takes the rest. */
export function pieceAt(regions: Array<Region | null>, x: number, y: number): number {
  let fallback = 0;
  for (let p = 0; p < regions.length; p++) {
    const region = regions[p];
    if (region === null) fallback = p;
    else if (regionContains(region, x, y)) return p;
  }
  return fallback;
}
