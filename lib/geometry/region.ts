import { regionBox } from '../design/region-box';
import type { Region } from '../design/types';

/** Axis-aligned box in µm. */
export interface Box {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

export class RegionError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'RegionError';
  }
}

function polygonSignedDistance(points: Float64Array, x: number, y: number): number {
  let inside = false;
  let best = Infinity;
  const n = points.length / 2;
  for (let i = 0, j = n - 1; i < n; j = i++) {
    const xi = points[2 * i];
    const yi = points[2 * i + 1];
    const xj = points[2 * j];
    const yj = points[2 * j + 1];
    if (yi > y !== yj > y && x < ((xj - xi) * (y - yi)) / (yj - yi) + xi) inside = !inside;
    const dx = xj - xi;
    const dy = yj - yi;
    const len2 = dx * dx + dy * dy;
    const t = len2 > 0 ? Math.max(0, Math.min(1, ((x - xi) * dx + (y - yi) * dy) / len2)) : 0;
    best = Math.min(best, Math.hypot(x - xi - t * dx, y - yi - t * dy));
  }
  return inside ? best : -best;
}

/**
 * Positive inside, negative outside. Where positive it never exceeds the true distance to the
 * region's boundary, so "every vertex deeper than half the longest edge" proves a polygon lies inside.
 */
export function regionSignedDistance(region: Region, x: number, y: number): number {
  switch (region.kind) {
    case 'circle':
      return region.r - Math.hypot(x - region.cx, y - region.cy);
    case 'ring': {
      const d = Math.hypot(x - region.cx, y - region.cy);
      return Math.min(region.rOuter - d, d - region.rInner);
    }
    case 'rectangle': {
      const b = regionBox(region);
      const dx = Math.max(b.x0 - x, 0, x - b.x1);
      const dy = Math.max(b.y0 - y, 0, y - b.y1);
      if (dx > 0 || dy > 0) return -Math.hypot(dx, dy);
      return Math.min(x - b.x0, b.x1 - x, y - b.y0, b.y1 - y);
    }
    case 'polygon':
      return polygonSignedDistance(region.points, x, y);
    case 'union':
      return Math.max(...region.parts.map((p) => regionSignedDistance(p, x, y)));
    case 'intersection':
      return Math.min(...region.parts.map((p) => regionSignedDistance(p, x, y)));
    case 'difference': {
      let d = regionSignedDistance(region.parts[0], x, y);
      for (let i = 1; i < region.parts.length; i++) d = Math.min(d, -regionSignedDistance(region.parts[i], x, y));
      return d;
    }
  }
}

/** Rejects regions that cannot be drawn, with a message naming what is wrong. */
export function validateRegion(region: Region, what: string): void {
  const finite = (...v: number[]) => v.every(Number.isFinite);
  switch (region.kind) {
    case 'circle':
      if (!finite(region.cx, region.cy, region.r) || region.r <= 0) throw new RegionError(`${what}: a circle needs a finite centre and a positive radius.`);
      return;
    case 'ring':
      if (!finite(region.cx, region.cy, region.rInner, region.rOuter) || region.rInner < 0 || region.rOuter <= region.rInner) {
        throw new RegionError(`${what}: a ring needs 0 ≤ inner radius < outer radius.`);
      }
      return;
    case 'rectangle':
      if (!finite(region.x0, region.y0, region.x1, region.y1) || region.x0 === region.x1 || region.y0 === region.y1) {
        throw new RegionError(`${what}: a rectangle needs two distinct finite corners.`);
      }
      return;
    case 'polygon':
      if (region.points.length < 6 || region.points.length % 2 !== 0 || !region.points.every(Number.isFinite)) {
        throw new RegionError(`${what}: a polygon needs at least three finite points.`);
      }
      return;
    default:
      if (region.parts.length === 0) throw new RegionError(`${what}: a ${region.kind} needs at least one part.`);
      region.parts.forEach((p) => validateRegion(p, what));
  }
}
