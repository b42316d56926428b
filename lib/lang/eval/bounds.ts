/**
 * Interval bounds over an axis-aligned box, used to bound the spatial frequency of any
 * expression: each field reports the range of its value and an upper bound of |∇value|
 * over the box, combined by the usual interval rules (sum of slopes for a sum, product rule, …).
 */
export interface Box {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

export interface Bound {
  lo: number;
  hi: number;
  /** upper bound of |∇value| over the box, per µm */
  slope: number;
}

export const WHOLE_LINE: Bound = { lo: -Infinity, hi: Infinity, slope: Infinity };

/** 0·∞ counts as 0: a constant factor of zero contributes no slope however large the other side. */
export function times(a: number, b: number): number {
  return a === 0 || b === 0 ? 0 : a * b;
}

export function maxAbs(b: Bound): number {
  return Math.max(Math.abs(b.lo), Math.abs(b.hi));
}

export function minAbs(b: Bound): number {
  return b.lo <= 0 && b.hi >= 0 ? 0 : Math.min(Math.abs(b.lo), Math.abs(b.hi));
}

export function productRange(a: Bound, b: Bound): [number, number] {
  const p = [times(a.lo, b.lo), times(a.lo, b.hi), times(a.hi, b.lo), times(a.hi, b.hi)];
  return [Math.min(...p), Math.max(...p)];
}

export function quotientRange(a: Bound, b: Bound): [number, number] {
  if (b.lo <= 0 && b.hi >= 0) return [-Infinity, Infinity];
  return productRange(a, { lo: 1 / b.hi, hi: 1 / b.lo, slope: 0 });
}

/** Nearest and farthest distance from (cx, cy) to points of the box. */
export function radialRange(box: Box, cx: number, cy: number): [number, number] {
  const dx = Math.max(box.x0 - cx, 0, cx - box.x1);
  const dy = Math.max(box.y0 - cy, 0, cy - box.y1);
  const fx = Math.max(Math.abs(box.x0 - cx), Math.abs(box.x1 - cx));
  const fy = Math.max(Math.abs(box.y0 - cy), Math.abs(box.y1 - cy));
  return [Math.sqrt(dx * dx + dy * dy), Math.sqrt(fx * fx + fy * fy)];
}

/** Range of the linear form a·(x − cx) + b·(y − cy) over the box. */
export function linearRange(box: Box, a: number, b: number, cx: number, cy: number): [number, number] {
  const xs = [a * (box.x0 - cx), a * (box.x1 - cx)];
  const ys = [b * (box.y0 - cy), b * (box.y1 - cy)];
  return [Math.min(...xs) + Math.min(...ys), Math.max(...xs) + Math.max(...ys)];
}

export function normaliseBox(x0: number, y0: number, x1: number, y1: number): Box {
  return { x0: Math.min(x0, x1), y0: Math.min(y0, y1), x1: Math.max(x0, x1), y1: Math.max(y0, y1) };
}
