import type { Region } from './types';

/** Whether (x, y) lies in the region (boundaries count as inside; polygons by the even-odd rule). */
export function regionContains(region: Region, x: number, y: number): boolean {
  switch (region.kind) {
    case 'circle':
      return (x - region.cx) ** 2 + (y - region.cy) ** 2 <= region.r ** 2;
    case 'ring': {
      const d2 = (x - region.cx) ** 2 + (y - region.cy) ** 2;
      return d2 >= region.rInner ** 2 && d2 <= region.rOuter ** 2;
    }
    case 'rectangle':
      return x >= Math.min(region.x0, region.x1) && x <= Math.max(region.x0, region.x1) && y >= Math.min(region.y0, region.y1) && y <= Math.max(region.y0, region.y1);
    case 'polygon':
      return polygonContains(region.points, x, y);
    case 'union':
      return region.parts.some((part) => regionContains(part, x, y));
    case 'intersection':
      return region.parts.every((part) => regionContains(part, x, y));
    case 'difference':
      return regionContains(region.parts[0], x, y) && !region.parts.slice(1).some((part) => regionContains(part, x, y));
  }
}

/** Even-odd point-in-polygon test on flat x,y pairs. */
export function polygonContains(points: ArrayLike<number>, x: number, y: number): boolean {
  let inside = false;
  const n = points.length;
  for (let i = 0, j = n - 2; i < n; j = i, i += 2) {
    const yi = points[i + 1];
    const yj = points[j + 1];
    if (yi > y !== yj > y) {
      const xCross = points[i] + ((y - yi) * (points[j] - points[i])) / (yj - yi);
      if (x < xCross) inside = !inside;
    }
  }
  return inside;
}
