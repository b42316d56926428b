import type { Region } from '../../design/types';
import type { Box } from './bounds';

/** The region moved by (dx, dy). */
export function shiftRegion(region: Region, dx: number, dy: number): Region {
  switch (region.kind) {
    case 'circle':
      return { ...region, cx: region.cx + dx, cy: region.cy + dy };
    case 'ring':
      return { ...region, cx: region.cx + dx, cy: region.cy + dy };
    case 'rectangle':
      return { kind: 'rectangle', x0: region.x0 + dx, y0: region.y0 + dy, x1: region.x1 + dx, y1: region.y1 + dy };
    case 'polygon': {
      const points = new Float64Array(region.points.length);
      for (let i = 0; i < points.length; i += 2) {
        points[i] = region.points[i] + dx;
        points[i + 1] = region.points[i + 1] + dy;
      }
      return { kind: 'polygon', points };
    }
    default:
      return { kind: region.kind, parts: region.parts.map((p) => shiftRegion(p, dx, dy)) };
  }
}

/** An axis-aligned box that contains the region (empty intersections give an empty box). */
export function regionBox(region: Region): Box {
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

/** Whether (x, y) lies inside the region (polygons by the even-odd rule). */
export function regionContains(region: Region, x: number, y: number): boolean {
  switch (region.kind) {
    case 'circle':
      return (x - region.cx) ** 2 + (y - region.cy) ** 2 <= region.r * region.r;
    case 'ring': {
      const d2 = (x - region.cx) ** 2 + (y - region.cy) ** 2;
      return d2 >= region.rInner * region.rInner && d2 <= region.rOuter * region.rOuter;
    }
    case 'rectangle':
      return x >= Math.min(region.x0, region.x1) && x <= Math.max(region.x0, region.x1) && y >= Math.min(region.y0, region.y1) && y <= Math.max(region.y0, region.y1);
    case 'polygon': {
      const p = region.points;
      let inside = false;
      for (let i = 0, j = p.length - 2; i < p.length; j = i, i += 2) {
        if (p[i + 1] > y !== p[j + 1] > y && x < ((p[j] - p[i]) * (y - p[i + 1])) / (p[j + 1] - p[i + 1]) + p[i]) inside = !inside;
      }
      return inside;
    }
    case 'union':
      return region.parts.some((r) => regionContains(r, x, y));
    case 'intersection':
      return region.parts.every((r) => regionContains(r, x, y));
    case 'difference':
      return regionContains(region.parts[0], x, y) && !region.parts.slice(1).some((r) => regionContains(r, x, y));
  }
}
