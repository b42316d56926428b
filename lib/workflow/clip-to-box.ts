/**
 * Clips a closed polygon (flat x,y pairs, integer database units) to an axis-aligned box with the
 * Sutherland–Hodgman method (Sutherland & Hodgman, "Reentrant polygon clipping", 1974). A concave
 * polygon may come out with zero-width bridges along the box edges; they add no area, and
 * clipping every polygon of two masks to the same box keeps them comparable tile by tile.
 */
export interface Box {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

type Inside = (x: number, y: number) => boolean;
type Cross = (ax: number, ay: number, bx: number, by: number) => [number, number];

function clipEdge(points: number[], inside: Inside, cross: Cross): number[] {
  const out: number[] = [];
  const n = points.length / 2;
  for (let i = 0; i < n; i++) {
    const ax = points[((i + n - 1) % n) * 2];
    const ay = points[((i + n - 1) % n) * 2 + 1];
    const bx = points[i * 2];
    const by = points[i * 2 + 1];
    const aIn = inside(ax, ay);
    const bIn = inside(bx, by);
    if (bIn) {
      if (!aIn) out.push(...cross(ax, ay, bx, by));
      out.push(bx, by);
    } else if (aIn) {
      out.push(...cross(ax, ay, bx, by));
    }
  }
  return out;
}

// Crossing points are rounded to the grid, as the polygons they join are on it.
const atX = (x: number): Cross => (ax, ay, bx, by) => [x, Math.round(ay + ((by - ay) * (x - ax)) / (bx - ax))];
const atY = (y: number): Cross => (ax, ay, bx, by) => [Math.round(ax + ((bx - ax) * (y - ay)) / (by - ay)), y];

/** The part of `polygon` inside `box`, or null when nothing of it is inside. */
export function clipToBox(polygon: Int32Array, box: Box): Int32Array | null {
  let points = Array.from(polygon);
  points = clipEdge(points, (x) => x >= box.x0, atX(box.x0));
  if (points.length) points = clipEdge(points, (x) => x <= box.x1, atX(box.x1));
  if (points.length) points = clipEdge(points, (_x, y) => y >= box.y0, atY(box.y0));
  if (points.length) points = clipEdge(points, (_x, y) => y <= box.y1, atY(box.y1));
  return points.length >= 6 ? Int32Array.from(points) : null;
}
