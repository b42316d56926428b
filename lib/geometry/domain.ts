import type { ConvexPolygon } from './convex-domain';

/** A convex tracing domain with what the tracer needs: inward edge normals and the perimeter parameter. */
export interface Domain {
  polygon: ConvexPolygon;
  /** per edge: inward unit normal and offset, inside when nx·x + ny·y − c ≥ 0 */
  nx: Float64Array;
  ny: Float64Array;
  c: Float64Array;
  /** perimeter position of each vertex (counter-clockwise), and the total perimeter */
  cumulative: Float64Array;
  perimeter: number;
  box: { x0: number; y0: number; x1: number; y1: number };
}

export function makeDomain(polygon: ConvexPolygon): Domain {
  const n = polygon.length / 2;
  const nx = new Float64Array(n);
  const ny = new Float64Array(n);
  const c = new Float64Array(n);
  const cumulative = new Float64Array(n + 1);
  const box = { x0: Infinity, y0: Infinity, x1: -Infinity, y1: -Infinity };
  for (let i = 0; i < n; i++) {
    const ax = polygon[2 * i];
    const ay = polygon[2 * i + 1];
    const bx = polygon[(2 * i + 2) % polygon.length];
    const by = polygon[(2 * i + 3) % polygon.length];
    const len = Math.hypot(bx - ax, by - ay);
    nx[i] = -(by - ay) / len;
    ny[i] = (bx - ax) / len;
    c[i] = nx[i] * ax + ny[i] * ay;
    cumulative[i + 1] = cumulative[i] + len;
    box.x0 = Math.min(box.x0, ax);
    box.x1 = Math.max(box.x1, ax);
    box.y0 = Math.min(box.y0, ay);
    box.y1 = Math.max(box.y1, ay);
  }
  return { polygon, nx, ny, c, cumulative, perimeter: cumulative[n], box };
}

/** Smallest inward distance to any edge (negative outside). */
export function depthInDomain(d: Domain, x: number, y: number): number {
  let best = Infinity;
  for (let i = 0; i < d.nx.length; i++) {
    const v = d.nx[i] * x + d.ny[i] * y - d.c[i];
    if (v < best) best = v;
  }
  return best;
}

/** Distance along direction (tx, ty) from an inside point to the boundary, and the edge hit. */
export function exitAlong(d: Domain, x: number, y: number, tx: number, ty: number): { distance: number; edge: number } {
  let distance = Infinity;
  let edge = -1;
  for (let i = 0; i < d.nx.length; i++) {
    const rate = d.nx[i] * tx + d.ny[i] * ty;
    if (rate < 0) {
      const s = (d.nx[i] * x + d.ny[i] * y - d.c[i]) / -rate;
      if (s < distance) {
        distance = s;
        edge = i;
      }
    }
  }
  return { distance: Math.max(0, distance), edge };
}

/** Perimeter position of the point at fraction u along edge e. */
export function perimeterPosition(d: Domain, edge: number, u: number): number {
  return d.cumulative[edge] + u * (d.cumulative[edge + 1] - d.cumulative[edge]);
}
