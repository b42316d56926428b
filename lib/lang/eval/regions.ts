import type { Region } from '../../design/types';

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

export { regionBox } from '../../design/region-box';

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
