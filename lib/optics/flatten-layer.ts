import type { LayoutCell, LayoutLibrary, LayoutPlacement } from '../layout/types';

/** An affine map of the plane as [a, b, c, d, e, f]: (x, y) → (a·x + b·y + e, c·x + d·y + f). */
type Affine = [number, number, number, number, number, number];

const IDENTITY: Affine = [1, 0, 0, 1, 0, 0];

/**
 * Every polygon of one layer/datatype in the top cell and everything it places, in µm,
 * with placements (rotation, mirror, arrays) applied.
 */
export function flattenLayer(library: LayoutLibrary, layer: number, datatype: number): Float64Array[] {
  const cells = new Map(library.cells.map((cell) => [cell.name, cell]));
  const top = cells.get(library.topCell);
  if (!top) throw new Error(`the layout has no top cell "${library.topCell}"`);
  const umPerDbu = library.databaseUnit / 1e-6;
  const out: Float64Array[] = [];
  const visit = (cell: LayoutCell, transform: Affine, depth: number) => {
    if (depth > 64) throw new Error(`cell "${cell.name}" places itself (or nests deeper than 64 levels)`);
    for (const shapes of cell.shapes) {
      if (shapes.layer !== layer || shapes.datatype !== datatype) continue;
      for (const polygon of shapes.polygons) out.push(applyAffine(polygon, transform, umPerDbu));
    }
    for (const placement of cell.placements) {
      const child = cells.get(placement.cell);
      if (!child) throw new Error(`cell "${cell.name}" places unknown cell "${placement.cell}"`);
      for (const offset of arrayOffsets(placement)) {
        visit(child, compose(transform, placementAffine(placement, offset)), depth + 1);
      }
    }
  };
  visit(top, IDENTITY, 0);
  return out;
}

function applyAffine(polygon: Int32Array, [a, b, c, d, e, f]: Affine, scale: number): Float64Array {
  const out = new Float64Array(polygon.length);
  for (let i = 0; i < polygon.length; i += 2) {
    const x = polygon[i];
    const y = polygon[i + 1];
    out[i] = (a * x + b * y + e) * scale;
    out[i + 1] = (c * x + d * y + f) * scale;
  }
  return out;
}

function arrayOffsets(placement: LayoutPlacement): Array<[number, number]> {
  const columns = placement.columns ?? 1;
  const rows = placement.rows ?? 1;
  const cs = placement.columnStep ?? { x: 0, y: 0 };
  const rs = placement.rowStep ?? { x: 0, y: 0 };
  const offsets: Array<[number, number]> = [];
  for (let i = 0; i < columns; i++) {
    for (let j = 0; j < rows; j++) offsets.push([i * cs.x + j * rs.x, i * cs.y + j * rs.y]);
  }
  return offsets;
}

/** GDSII order: mirror about the x axis first, then rotate counter-clockwise, then translate. */
function placementAffine(placement: LayoutPlacement, [dx, dy]: [number, number]): Affine {
  const turns = ((((placement.rotation ?? 0) / 90) % 4) + 4) % 4;
  const cos = [1, 0, -1, 0][turns];
  const sin = [0, 1, 0, -1][turns];
  const m = placement.mirrorX ? -1 : 1;
  return [cos, -sin * m, sin, cos * m, placement.x + dx, placement.y + dy];
}

function compose([a1, b1, c1, d1, e1, f1]: Affine, [a2, b2, c2, d2, e2, f2]: Affine): Affine {
  return [
    a1 * a2 + b1 * c2,
    a1 * b2 + b1 * d2,
    c1 * a2 + d1 * c2,
    c1 * b2 + d1 * d2,
    a1 * e2 + b1 * f2 + e1,
    c1 * e2 + d1 * f2 + f1,
  ];
}
