/** One canvas path holding closed polygons given as flat x,y lists (µm); lists shorter than a triangle are skipped. */
export function polygonPath(polygons: Iterable<ArrayLike<number>>): Path2D {
  const path = new Path2D();
  for (const p of polygons) {
    if (p.length < 6) continue;
    path.moveTo(p[0], p[1]);
    for (let i = 2; i < p.length; i += 2) path.lineTo(p[i], p[i + 1]);
    path.closePath();
  }
  return path;
}
