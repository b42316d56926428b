import { unionIntervals } from './region';

/**
 * The radius intervals [a0, b0, a1, b1, …] (sorted, merged) where a ray from (cx, cy) at angle θ runs
 * inside the union of the polygons. Each polygon is even-odd filled on its own, so a ring drawn as one
 * polygon with a keyhole cut reads as a ring, and abutting fractured pieces merge.
 */
export function rayIntervals(polygons: Float64Array[], cx: number, cy: number, angle: number): number[] {
  const ux = Math.cos(angle);
  const uy = Math.sin(angle);
  const all: number[] = [];
  const hits: number[] = [];
  for (const p of polygons) {
    hits.length = 0;
    const n = p.length;
    for (let i = 0, j = n - 2; i < n; j = i, i += 2) {
      // coordinates along the ray (u) and across it (v)
      const ui = (p[i] - cx) * ux + (p[i + 1] - cy) * uy;
      const vi = -(p[i] - cx) * uy + (p[i + 1] - cy) * ux;
      const uj = (p[j] - cx) * ux + (p[j + 1] - cy) * uy;
      const vj = -(p[j] - cx) * uy + (p[j + 1] - cy) * ux;
      if (vi > 0 !== vj > 0) {
        const u = ui + ((uj - ui) * -vi) / (vj - vi);
        if (u > 0) hits.push(u);
      }
    }
    if (hits.length === 0) continue;
    hits.sort((a, b) => a - b);
    if (hits.length % 2 === 1) all.push(0);
    all.push(...hits);
  }
  return unionIntervals(all, []);
}
