import ClipperLib from 'clipper-lib';
import type { LayoutLibrary, LayoutPolygon } from '../layout/types';
import { toPath } from './clip-region';

export interface LayerXor {
  layer: number;
  datatype: number;
  /** µm², drawn in b but not in a */
  addedArea: number;
  /** µm², drawn in a but not in b */
  removedArea: number;
  /** outlines counter-clockwise, holes clockwise, database units of b (added) and a (removed) */
  added: LayoutPolygon[];
  removed: LayoutPolygon[];
}

export interface XorResult {
  perLayer: LayerXor[];
}

/** Polygons of the top cell per "layer/datatype" (placements are not expanded). */
function topShapes(lib: LayoutLibrary): Map<string, LayoutPolygon[]> {
  const cell = lib.cells.find((c) => c.name === lib.topCell);
  const out = new Map<string, LayoutPolygon[]>();
  for (const s of cell?.shapes ?? []) {
    const key = `${s.layer}/${s.datatype}`;
    out.set(key, (out.get(key) ?? []).concat(s.polygons));
  }
  return out;
}

function difference(subject: ClipperLib.Paths, clip: ClipperLib.Paths): ClipperLib.Paths {
  const c = new ClipperLib.Clipper();
  c.AddPaths(subject, ClipperLib.PolyType.ptSubject, true);
  c.AddPaths(clip, ClipperLib.PolyType.ptClip, true);
  const out: ClipperLib.Paths = [];
  c.Execute(ClipperLib.ClipType.ctDifference, out, ClipperLib.PolyFillType.pftNonZero, ClipperLib.PolyFillType.pftNonZero);
  return out;
}

function scaled(paths: ClipperLib.Paths, from: number, to: number): ClipperLib.Paths {
  if (from === to) return paths;
  const f = from / to;
  return paths.map((p) => p.map((pt) => ({ X: Math.round(pt.X * f), Y: Math.round(pt.Y * f) })));
}

const toLayout = (paths: ClipperLib.Paths): LayoutPolygon[] =>
  paths.map((p) => {
    const out = new Int32Array(p.length * 2);
    p.forEach((pt, i) => {
      out[2 * i] = pt.X;
      out[2 * i + 1] = pt.Y;
    });
    return out;
  });

/**
 * Geometric difference of two revisions' masks, layer by layer: what b adds to a and what it removes,
 * with their areas. Both are compared on a's database grid when the grids differ.
 */
export function xorLayers(a: LayoutLibrary, b: LayoutLibrary): XorResult {
  const sa = topShapes(a);
  const sb = topShapes(b);
  const keys = [...new Set([...sa.keys(), ...sb.keys()])].sort((x, y) => {
    const [lx, dx] = x.split('/').map(Number);
    const [ly, dy] = y.split('/').map(Number);
    return lx - ly || dx - dy;
  });
  const umPerUnit = a.databaseUnit / 1e-6;
  const area = (paths: ClipperLib.Paths) => paths.reduce((s, p) => s + ClipperLib.Clipper.Area(p), 0) * umPerUnit * umPerUnit;
  const perLayer = keys.map((key) => {
    const [layer, datatype] = key.split('/').map(Number);
    const pa = (sa.get(key) ?? []).map(toPath);
    const pb = scaled((sb.get(key) ?? []).map(toPath), b.databaseUnit, a.databaseUnit);
    const added = difference(pb, pa);
    const removed = difference(pa, pb);
    return { layer, datatype, addedArea: area(added), removedArea: area(removed), added: toLayout(added), removed: toLayout(removed) };
  });
  return { perLayer };
}
