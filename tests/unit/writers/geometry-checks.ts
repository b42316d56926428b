/** Independent checks of polygon geometry, written for the tests (not shared with the code under test). */

/** Shoelace area, positive for counter-clockwise. */
export function signedArea(polygon: ArrayLike<number>): number {
  let twice = 0;
  const n = polygon.length / 2;
  for (let i = 0; i < n; i++) {
    const j = (i + 1) % n;
    twice += polygon[2 * i] * polygon[2 * j + 1] - polygon[2 * j] * polygon[2 * i + 1];
  }
  return twice / 2;
}

/** True when two edges that do not share a vertex cross or touch (O(n²), fine for label-sized polygons). */
export function selfIntersects(polygon: ArrayLike<number>): boolean {
  const n = polygon.length / 2;
  const p = (i: number): [number, number] => [polygon[2 * (i % n)], polygon[2 * (i % n) + 1]];
  for (let i = 0; i < n; i++) {
    for (let j = i + 2; j < n; j++) {
      if (i === 0 && j === n - 1) continue;
      if (segmentsMeet(p(i), p(i + 1), p(j), p(j + 1))) return true;
    }
  }
  return false;
}

function orient(a: [number, number], b: [number, number], c: [number, number]): number {
  return Math.sign((b[0] - a[0]) * (c[1] - a[1]) - (b[1] - a[1]) * (c[0] - a[0]));
}

function onSegment(a: [number, number], b: [number, number], c: [number, number]): boolean {
  return Math.min(a[0], b[0]) <= c[0] && c[0] <= Math.max(a[0], b[0]) && Math.min(a[1], b[1]) <= c[1] && c[1] <= Math.max(a[1], b[1]);
}

function segmentsMeet(a: [number, number], b: [number, number], c: [number, number], d: [number, number]): boolean {
  const o1 = orient(a, b, c), o2 = orient(a, b, d), o3 = orient(c, d, a), o4 = orient(c, d, b);
  if (o1 !== o2 && o3 !== o4) return true;
  return (o1 === 0 && onSegment(a, b, c)) || (o2 === 0 && onSegment(a, b, d)) || (o3 === 0 && onSegment(c, d, a)) || (o4 === 0 && onSegment(c, d, b));
}
