import ClipperLib from 'clipper-lib';
import type { CompiledDesign } from '@/lib/design/types';
import { assembleMask, buildMaskTile, planMaskTiles, resolveMaskOptions, type MaskOptions, type MaskResult } from '@/lib/geometry';
import type { LayoutLibrary, LayoutPolygon } from '@/lib/layout/types';

/** Independent helpers for the geometry tests (plain textbook algorithms, written for the tests). */

export function zonePolygons(library: LayoutLibrary, layer = 1, datatype = 0): LayoutPolygon[] {
  const cell = library.cells.find((c) => c.name === library.topCell)!;
  return cell.shapes.filter((s) => s.layer === layer && s.datatype === datatype).flatMap((s) => s.polygons);
}

export function area(p: ArrayLike<number>): number {
  let s = 0;
  const n = p.length / 2;
  for (let i = 0, j = n - 1; i < n; j = i++) s += p[2 * j] * p[2 * i + 1] - p[2 * i] * p[2 * j + 1];
  return s / 2;
}

/** Even-odd ray casting. */
export function contains(p: ArrayLike<number>, x: number, y: number): boolean {
  let inside = false;
  const n = p.length / 2;
  for (let i = 0, j = n - 1; i < n; j = i++) {
    const xi = p[2 * i];
    const yi = p[2 * i + 1];
    const xj = p[2 * j];
    const yj = p[2 * j + 1];
    if (yi > y !== yj > y && x < ((xj - xi) * (y - yi)) / (yj - yi) + xi) inside = !inside;
  }
  return inside;
}

/** True when two non-adjacent edges of the ring touch or cross (exact integer orientation tests). */
export function selfIntersects(p: ArrayLike<number>): boolean {
  const n = p.length / 2;
  const orient = (ax: number, ay: number, bx: number, by: number, cx: number, cy: number) => Math.sign((bx - ax) * (cy - ay) - (by - ay) * (cx - ax));
  const onSegment = (ax: number, ay: number, bx: number, by: number, cx: number, cy: number) =>
    Math.min(ax, bx) <= cx && cx <= Math.max(ax, bx) && Math.min(ay, by) <= cy && cy <= Math.max(ay, by);
  // sort edges by min x for a cheap sweep
  const edges = Array.from({ length: n }, (_, i) => i).sort((a, b) => Math.min(p[2 * a], p[2 * ((a + 1) % n)]) - Math.min(p[2 * b], p[2 * ((b + 1) % n)]));
  for (let s = 0; s < n; s++) {
    const i = edges[s];
    const ax = p[2 * i], ay = p[2 * i + 1], bx = p[2 * ((i + 1) % n)], by = p[2 * ((i + 1) % n) + 1];
    const maxX = Math.max(ax, bx);
    for (let t = s + 1; t < n; t++) {
      const j = edges[t];
      const cx = p[2 * j], cy = p[2 * j + 1], dx = p[2 * ((j + 1) % n)], dy = p[2 * ((j + 1) % n) + 1];
      if (Math.min(cx, dx) > maxX) break;
      if (j === (i + 1) % n || i === (j + 1) % n) continue;
      const o1 = orient(ax, ay, bx, by, cx, cy);
      const o2 = orient(ax, ay, bx, by, dx, dy);
      const o3 = orient(cx, cy, dx, dy, ax, ay);
      const o4 = orient(cx, cy, dx, dy, bx, by);
      if (o1 !== o2 && o3 !== o4) return true;
      if (o1 === 0 && onSegment(ax, ay, bx, by, cx, cy)) return true;
      if (o2 === 0 && onSegment(ax, ay, bx, by, dx, dy)) return true;
      if (o3 === 0 && onSegment(cx, cy, dx, dy, ax, ay)) return true;
      if (o4 === 0 && onSegment(cx, cy, dx, dy, bx, by)) return true;
    }
  }
  return false;
}

/** Area of the union by clipper-lib (a reference library): equals the sum of areas only if nothing overlaps. */
export function unionArea(polygons: LayoutPolygon[]): number {
  const c = new ClipperLib.Clipper();
  c.AddPaths(polygons.map((p) => Array.from({ length: p.length / 2 }, (_, i) => ({ X: p[2 * i], Y: p[2 * i + 1] }))), ClipperLib.PolyType.ptSubject, true);
  const out: ClipperLib.Paths = [];
  c.Execute(ClipperLib.ClipType.ctUnion, out, ClipperLib.PolyFillType.pftNonZero, ClipperLib.PolyFillType.pftNonZero);
  return out.reduce((s, p) => s + ClipperLib.Clipper.Area(p), 0);
}

/** Drawn at (x, y) µm in any polygon (grid 1 nm), via a coarse bucket index. */
export function drawnTester(polygons: LayoutPolygon[], dbuPerUm = 1000): (x: number, y: number) => boolean {
  const boxes = polygons.map((p) => {
    let x0 = Infinity, y0 = Infinity, x1 = -Infinity, y1 = -Infinity;
    for (let i = 0; i < p.length; i += 2) {
      x0 = Math.min(x0, p[i]); x1 = Math.max(x1, p[i]); y0 = Math.min(y0, p[i + 1]); y1 = Math.max(y1, p[i + 1]);
    }
    return { x0, y0, x1, y1 };
  });
  return (x, y) => {
    const X = x * dbuPerUm;
    const Y = y * dbuPerUm;
    return polygons.some((p, i) => X >= boxes[i].x0 && X <= boxes[i].x1 && Y >= boxes[i].y0 && Y <= boxes[i].y1 && contains(p, X, Y));
  };
}

/** A small seeded generator, so sampled checks are repeatable. */
export function rng(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (s * 1664525 + 1013904223) >>> 0;
    return s / 2 ** 32;
  };
}

/** The contour tracer on its own, without the exact path buildMask takes for rotationally symmetric designs. */
export function traceMask(d: CompiledDesign, options: Partial<MaskOptions> = {}): MaskResult {
  const resolved = resolveMaskOptions(options);
  return assembleMask(d, resolved, planMaskTiles(d, resolved.chordTolerance).map((plan) => buildMaskTile(d, resolved, plan)));
}
