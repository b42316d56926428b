import ClipperLib from 'clipper-lib';
import { fromPath, toPath } from './clip-region';
import { signedArea } from './polygon-math';

export interface NarrowPlace {
  /** centroid, grid units */
  x: number;
  y: number;
  /** grid units² */
  area: number;
}

function offset(paths: ClipperLib.Paths, delta: number, arcTolerance: number): ClipperLib.Paths {
  const o = new ClipperLib.ClipperOffset(2, arcTolerance);
  o.AddPaths(paths, ClipperLib.JoinType.jtMiter, ClipperLib.EndType.etClosedPolygon);
  const out: ClipperLib.Paths = [];
  o.Execute(out, delta);
  return out;
}

/**
 * What a morphological opening by `width` (grid units) removes from polygons: shrink by half the
 * width, grow back, and keep what did not come back. Mitred joins give corners of 60° or more back
 * whole. Polygons further apart than twice the width do not affect each other.
 */
export function openingLoss(polygons: Float64Array[], width: number, arcTolerance: number): Float64Array[] {
  const original = polygons.map(toPath);
  const half = width / 2;
  const opened = offset(offset(original, -half, arcTolerance), half, arcTolerance);
  const c = new ClipperLib.Clipper();
  c.AddPaths(original, ClipperLib.PolyType.ptSubject, true);
  c.AddPaths(opened, ClipperLib.PolyType.ptClip, true);
  const lost: ClipperLib.Paths = [];
  c.Execute(ClipperLib.ClipType.ctDifference, lost, ClipperLib.PolyFillType.pftNonZero, ClipperLib.PolyFillType.pftNonZero);
  return lost.map(fromPath);
}

/**
 * Parts of a polygon narrower than `width` (grid units), found by the opening. Sharp tips still lose
 * a little area, so only pieces larger than a quarter of the width squared are reported.
 */
export function narrowPlaces(polygon: Float64Array, width: number, arcTolerance: number): NarrowPlace[] {
  const places: NarrowPlace[] = [];
  for (const loop of openingLoss([polygon], width, arcTolerance)) {
    const area = signedArea(loop);
    if (area < 0.25 * width * width) continue;
    let cx = 0;
    let cy = 0;
    for (let i = 0; i < loop.length; i += 2) {
      cx += loop[i];
      cy += loop[i + 1];
    }
    places.push({ x: (2 * cx) / loop.length, y: (2 * cy) / loop.length, area });
  }
  return places;
}
