import ClipperLib from 'clipper-lib';
import type { Region } from '../design/types';
import { cleanLoop, signedArea } from './polygon-math';

/** Points on a circle so the chords sag at most `tolerance` (same units as r), counter-clockwise. */
function circlePath(cx: number, cy: number, r: number, tolerance: number, scale: number): ClipperLib.Path {
  const n = Math.max(16, Math.ceil(Math.PI / Math.acos(Math.max(-1, 1 - tolerance / r))));
  const path: ClipperLib.Path = [];
  for (let i = 0; i < n; i++) {
    const a = (2 * Math.PI * i) / n;
    path.push({ X: Math.round((cx + r * Math.cos(a)) * scale), Y: Math.round((cy + r * Math.sin(a)) * scale) });
  }
  return path;
}

function combine(type: ClipperLib.ClipType, subject: ClipperLib.Paths, clip: ClipperLib.Paths): ClipperLib.Paths {
  const c = new ClipperLib.Clipper();
  c.AddPaths(subject, ClipperLib.PolyType.ptSubject, true);
  c.AddPaths(clip, ClipperLib.PolyType.ptClip, true);
  const out: ClipperLib.Paths = [];
  c.Execute(type, out, ClipperLib.PolyFillType.pftNonZero, ClipperLib.PolyFillType.pftNonZero);
  return out;
}

/** The region as integer paths (outer counter-clockwise, holes clockwise); scale = grid points per µm. */
export function regionPaths(region: Region, scale: number, tolerance: number): ClipperLib.Paths {
  switch (region.kind) {
    case 'circle':
      return [circlePath(region.cx, region.cy, region.r, tolerance, scale)];
    case 'ring': {
      const inner = region.rInner > 0 ? [circlePath(region.cx, region.cy, region.rInner, tolerance, scale).reverse()] : [];
      return [circlePath(region.cx, region.cy, region.rOuter, tolerance, scale), ...inner];
    }
    case 'rectangle': {
      const x0 = Math.round(Math.min(region.x0, region.x1) * scale);
      const x1 = Math.round(Math.max(region.x0, region.x1) * scale);
      const y0 = Math.round(Math.min(region.y0, region.y1) * scale);
      const y1 = Math.round(Math.max(region.y0, region.y1) * scale);
      return [[{ X: x0, Y: y0 }, { X: x1, Y: y0 }, { X: x1, Y: y1 }, { X: x0, Y: y1 }]];
    }
    case 'polygon': {
      const path: ClipperLib.Path = [];
      for (let i = 0; i < region.points.length; i += 2) path.push({ X: Math.round(region.points[i] * scale), Y: Math.round(region.points[i + 1] * scale) });
      return ClipperLib.Clipper.SimplifyPolygon(path, ClipperLib.PolyFillType.pftNonZero);
    }
    case 'union':
      return region.parts.map((p) => regionPaths(p, scale, tolerance)).reduce((a, b) => combine(ClipperLib.ClipType.ctUnion, a, b));
    case 'intersection':
      return region.parts.map((p) => regionPaths(p, scale, tolerance)).reduce((a, b) => combine(ClipperLib.ClipType.ctIntersection, a, b));
    case 'difference':
      return region.parts
        .slice(1)
        .reduce((a, p) => combine(ClipperLib.ClipType.ctDifference, a, regionPaths(p, scale, tolerance)), regionPaths(region.parts[0], scale, tolerance));
  }
}

export function toPath(loop: ArrayLike<number>): ClipperLib.Path {
  const path: ClipperLib.Path = new Array(loop.length / 2);
  for (let i = 0; i < loop.length; i += 2) path[i / 2] = { X: loop[i], Y: loop[i + 1] };
  return path;
}

export function fromPath(path: ClipperLib.Path): Float64Array {
  const out = new Float64Array(path.length * 2);
  for (let i = 0; i < path.length; i++) {
    out[2 * i] = path[i].X;
    out[2 * i + 1] = path[i].Y;
  }
  return out;
}

/**
 * Integer loops (drawn side left, holes clockwise) intersected with the clip paths. The result keeps
 * the same conventions: outers counter-clockwise, holes clockwise, strictly simple.
 */
export function clipLoops(loops: Float64Array[], clip: ClipperLib.Paths): Float64Array[] {
  if (loops.length === 0) return [];
  const c = new ClipperLib.Clipper();
  c.StrictlySimple = true;
  c.AddPaths(loops.map(toPath), ClipperLib.PolyType.ptSubject, true);
  c.AddPaths(clip, ClipperLib.PolyType.ptClip, true);
  const out: ClipperLib.Paths = [];
  c.Execute(ClipperLib.ClipType.ctIntersection, out, ClipperLib.PolyFillType.pftPositive, ClipperLib.PolyFillType.pftNonZero);
  const result: Float64Array[] = [];
  for (const p of out) {
    const l = cleanLoop(fromPath(p));
    if (l && signedArea(l) !== 0) result.push(l);
  }
  return result;
}
