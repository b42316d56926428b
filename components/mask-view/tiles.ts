import { loopBounds } from '@/lib/geometry/polygon-math';
import type { Bounds } from './flatten';

/** A group of nearby polygons with the box that holds them, so the view can skip what is off screen. */
export interface Tile {
  bounds: Bounds;
  polygons: Float64Array[];
}


/** Sorts polygons into a `grid` × `grid` raster over `bounds` by the centre of each polygon's box. */
export function tilePolygons(polygons: Float64Array[], bounds: Bounds, grid = 16): Tile[] {
  const w = Math.max(bounds.x1 - bounds.x0, 1e-9);
  const h = Math.max(bounds.y1 - bounds.y0, 1e-9);
  const cells = new Map<number, Tile>();
  for (const p of polygons) {
    const b = loopBounds(p);
    const i = Math.min(grid - 1, Math.max(0, Math.floor((((b.x0 + b.x1) / 2 - bounds.x0) / w) * grid)));
    const j = Math.min(grid - 1, Math.max(0, Math.floor((((b.y0 + b.y1) / 2 - bounds.y0) / h) * grid)));
    const key = j * grid + i;
    const tile = cells.get(key);
    if (!tile) {
      cells.set(key, { bounds: b, polygons: [p] });
    } else {
      tile.polygons.push(p);
      tile.bounds = {
        x0: Math.min(tile.bounds.x0, b.x0),
        y0: Math.min(tile.bounds.y0, b.y0),
        x1: Math.max(tile.bounds.x1, b.x1),
        y1: Math.max(tile.bounds.y1, b.y1),
      };
    }
  }
  return [...cells.values()];
}

export function overlaps(a: Bounds, b: Bounds): boolean {
  return a.x0 <= b.x1 && b.x0 <= a.x1 && a.y0 <= b.y1 && b.y0 <= a.y1;
}
