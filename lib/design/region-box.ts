import type { Region } from './types';

/** An axis-aligned box in µm. */
export interface RegionBox {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

/** An axis-aligned box that contains the region (empty intersections give an empty box). */
export function regionBox(region: Region): RegionBox {
  switch (region.kind) {
    case 'circle':
      return { x0: region.cx - region.r, y0: region.cy - region.r, x1: region.cx + region.r, y1: region.cy + region.r };
    case 'ring':
      return { x0: region.cx - region.rOuter, y0: region.cy - region.rOuter, x1: region.cx + region.rOuter, y1: region.cy + region.rOuter };
    case 'rectangle':
      return { x0: Math.min(region.x0, region.x1), y0: Math.min(region.y0, region.y1), x1: Math.max(region.x0, region.x1), y1: Math.max(region.y0, region.y1) };
    case 'polygon': {
      const box = { x0: Infinity, y0: Infinity, x1: -Infinity, y1: -Infinity };
      for (let i = 0; i < region.points.length; i += 2) {
        box.x0 = Math.min(box.x0, region.points[i]);
        box.x1 = Math.max(box.x1, region.points[i]);
        box.y0 = Math.min(box.y0, region.points[i + 1]);
        box.y1 = Math.max(box.y1, region.points[i + 1]);
      }
      return box;
    }
    case 'union':
    case 'intersection': {
      const boxes = region.parts.map(regionBox);
      const pick = region.kind === 'union' ? { lo: Math.min, hi: Math.max } : { lo: Math.max, hi: Math.min };
      return {
        x0: pick.lo(...boxes.map((b) => b.x0)),
        y0: pick.lo(...boxes.map((b) => b.y0)),
        x1: pick.hi(...boxes.map((b) => b.x1)),
        y1: pick.hi(...boxes.map((b) => b.y1)),
      };
    }
    case 'difference':
      return regionBox(region.parts[0]);
  }
}
