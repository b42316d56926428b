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

