import type { Region } from '../design/types';
import type { Box } from './region';

/** A convex polygon, counter-clockwise, flat x,y pairs in µm. */
export type ConvexPolygon = Float64Array;

const CIRCLE_SIDES = 64;

function circumscribedCircle(cx: number, cy: number, r: number): ConvexPolygon {
  const R = r / Math.cos(Math.PI / CIRCLE_SIDES);
  const out = new Float64Array(2 * CIRCLE_SIDES);
  for (let i = 0; i < CIRCLE_SIDES; i++) {
    const a = (2 * Math.PI * i) / CIRCLE_SIDES;
    out[2 * i] = cx + R * Math.cos(a);
    out[2 * i + 1] = cy + R * Math.sin(a);
  }
  return out;
}

/** Andrew's monotone chain; returns a CCW hull. */
export function convexHull(points: Float64Array): ConvexPolygon {
  const n = points.length / 2;
  const idx = Array.from({ length: n }, (_, i) => i).sort((a, b) => points[2 * a] - points[2 * b] || points[2 * a + 1] - points[2 * b + 1]);
  const cross = (o: number, a: number, b: number) =>
    (points[2 * a] - points[2 * o]) * (points[2 * b + 1] - points[2 * o + 1]) - (points[2 * a + 1] - points[2 * o + 1]) * (points[2 * b] - points[2 * o]);
  const lower: number[] = [];
  for (const i of idx) {
    while (lower.length >= 2 && cross(lower[lower.length - 2], lower[lower.length - 1], i) <= 0) lower.pop();
    lower.push(i);
  }
  const upper: number[] = [];
  for (let k = idx.length - 1; k >= 0; k--) {
    const i = idx[k];
    while (upper.length >= 2 && cross(upper[upper.length - 2], upper[upper.length - 1], i) <= 0) upper.pop();
    upper.push(i);
  }
  const hull = lower.slice(0, -1).concat(upper.slice(0, -1));
  const out = new Float64Array(hull.length * 2);
  hull.forEach((i, k) => {
    out[2 * k] = points[2 * i];
    out[2 * k + 1] = points[2 * i + 1];
  });
  return out;
}

/** Sutherland–Hodgman clip of a convex polygon by another convex polygon (both CCW). */
export function intersectConvex(subject: ConvexPolygon, clip: ConvexPolygon): ConvexPolygon {
  let poly = Array.from(subject);
  const m = clip.length / 2;
  for (let e = 0; e < m && poly.length >= 6; e++) {
    const ax = clip[2 * e];
    const ay = clip[2 * e + 1];
    const bx = clip[(2 * e + 2) % clip.length];
    const by = clip[(2 * e + 3) % clip.length];
    const side = (x: number, y: number) => (bx - ax) * (y - ay) - (by - ay) * (x - ax);
    const next: number[] = [];
    const n = poly.length / 2;
    for (let i = 0; i < n; i++) {
      const px = poly[2 * i];
      const py = poly[2 * i + 1];
      const qx = poly[(2 * i + 2) % poly.length];
      const qy = poly[(2 * i + 3) % poly.length];
      const sp = side(px, py);
      const sq = side(qx, qy);
      if (sp >= 0) next.push(px, py);
      if (sp >= 0 !== sq >= 0) {
        const t = sp / (sp - sq);
        next.push(px + t * (qx - px), py + t * (qy - py));
      }
    }
    poly = next;
  }
  return dropRepeatedPoints(poly);
}

function dropRepeatedPoints(poly: number[]): ConvexPolygon {
  const out: number[] = [];
  const close = (ax: number, ay: number, bx: number, by: number) => Math.abs(ax - bx) <= 1e-9 && Math.abs(ay - by) <= 1e-9;
  for (let i = 0; i < poly.length; i += 2) {
    const m = out.length;
    if (m >= 2 && close(out[m - 2], out[m - 1], poly[i], poly[i + 1])) continue;
    out.push(poly[i], poly[i + 1]);
  }
  while (out.length >= 4 && close(out[0], out[1], out[out.length - 2], out[out.length - 1])) out.splice(-2, 2);
  return new Float64Array(out.length >= 6 ? out : []);
}

export function boxPolygon(b: Box): ConvexPolygon {
  return new Float64Array([b.x0, b.y0, b.x1, b.y0, b.x1, b.y1, b.x0, b.y1]);
}

/** A convex polygon that contains the region (a circumscribed polygon for round parts). */
export function regionDomain(region: Region): ConvexPolygon {
  switch (region.kind) {
    case 'circle':
      return circumscribedCircle(region.cx, region.cy, region.r);
    case 'ring':
      return circumscribedCircle(region.cx, region.cy, region.rOuter);
    case 'rectangle':
      return boxPolygon({
        x0: Math.min(region.x0, region.x1),
        y0: Math.min(region.y0, region.y1),
        x1: Math.max(region.x0, region.x1),
        y1: Math.max(region.y0, region.y1),
      });
    case 'polygon':
      return convexHull(region.points);
    case 'union': {
      const all = region.parts.map(regionDomain);
      const merged = new Float64Array(all.reduce((s, p) => s + p.length, 0));
      let o = 0;
      for (const p of all) {
        merged.set(p, o);
        o += p.length;
      }
      return convexHull(merged);
    }
    case 'intersection':
      return region.parts.map(regionDomain).reduce((a, b) => intersectConvex(a, b));
    case 'difference':
      return regionDomain(region.parts[0]);
  }
}

/** Vertices on the circle, a multiple of 8 of them starting at angle 0, chords sagging at most `tolerance`. */
export function inscribedCircle(cx: number, cy: number, r: number, tolerance: number): ConvexPolygon {
  const n = 8 * Math.max(2, Math.ceil(Math.PI / Math.acos(Math.max(-1, 1 - tolerance / r)) / 8));
  const out = new Float64Array(2 * n);
  for (let i = 0; i < n; i++) {
    const a = (2 * Math.PI * i) / n;
    out[2 * i] = cx + r * Math.cos(a);
    out[2 * i + 1] = cy + r * Math.sin(a);
  }
  return out;
}

function isConvexCcw(points: Float64Array): boolean {
  const n = points.length / 2;
  let area = 0;
  for (let i = 0; i < n; i++) {
    const j = (i + 1) % n;
    const k = (i + 2) % n;
    const cross = (points[2 * j] - points[2 * i]) * (points[2 * k + 1] - points[2 * j + 1]) - (points[2 * j + 1] - points[2 * i + 1]) * (points[2 * k] - points[2 * j]);
    if (cross < 0) return false;
    area += points[2 * i] * points[2 * j + 1] - points[2 * j] * points[2 * i + 1];
  }
  return area > 0;
}

/**
 * The region itself as a convex polygon (circles as inscribed polygons within the chord tolerance)
 * when it is convex, else null. Tracing inside it needs no clipping afterwards.
 */
export function exactConvexDomain(region: Region, tolerance: number): ConvexPolygon | null {
  switch (region.kind) {
    case 'circle':
      return inscribedCircle(region.cx, region.cy, region.r, tolerance);
    case 'rectangle':
      return regionDomain(region);
    case 'polygon': {
      if (isConvexCcw(region.points)) return region.points.slice();
      const reversed = new Float64Array(region.points.length);
      for (let i = 0; i < region.points.length; i += 2) {
        reversed[i] = region.points[region.points.length - 2 - i];
        reversed[i + 1] = region.points[region.points.length - 1 - i];
      }
      return isConvexCcw(reversed) ? reversed : null;
    }
    case 'intersection': {
      const parts = region.parts.map((p) => exactConvexDomain(p, tolerance));
      if (parts.some((p) => p === null)) return null;
      return (parts as ConvexPolygon[]).reduce((a, b) => intersectConvex(a, b));
    }
    default:
      return null;
  }
}
