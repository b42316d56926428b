import type { LayoutCell, LayoutLibrary, LayoutPlacement } from './types';

export interface Box {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

const EMPTY: Box = { x0: Infinity, y0: Infinity, x1: -Infinity, y1: -Infinity };

/** The bounding box (DBU) of a cell with everything it places, each cell measured once. */
export function cellBoundingBox(library: LayoutLibrary, cellName: string): Box {
  const cells = new Map(library.cells.map((c) => [c.name, c]));
  const memo = new Map<string, Box>();
  const measure = (cell: LayoutCell): Box => {
    const known = memo.get(cell.name);
    if (known) return known;
    let box = { ...EMPTY };
    for (const shapes of cell.shapes) {
      for (const polygon of shapes.polygons) {
        for (let i = 0; i < polygon.length; i += 2) box = include(box, polygon[i], polygon[i + 1]);
      }
    }
    for (const placement of cell.placements) {
      const child = cells.get(placement.cell);
      if (child) box = union(box, placedBox(measure(child), placement));
    }
    memo.set(cell.name, box);
    return box;
  };
  const top = cells.get(cellName);
  if (!top) throw new Error(`cell "${cellName}" is not in the library`);
  return measure(top);
}

export function isEmptyBox(box: Box): boolean {
  return !(box.x1 >= box.x0 && box.y1 >= box.y0);
}

/** The box of a child's box after the placement's reflection, rotation, offset and array extent. */
function placedBox(child: Box, placement: LayoutPlacement): Box {
  if (isEmptyBox(child)) return child;
  let box = { ...EMPTY };
  const turns = ((((placement.rotation ?? 0) / 90) % 4) + 4) % 4;
  const columns = placement.columns ?? 1;
  const rows = placement.rows ?? 1;
  const column = placement.columnStep ?? { x: 0, y: 0 };
  const row = placement.rowStep ?? { x: 0, y: 0 };
  for (const [cx, cy] of [[child.x0, child.y0], [child.x1, child.y0], [child.x0, child.y1], [child.x1, child.y1]]) {
    const [rx, ry] = rotateQuarterTurns(cx, placement.mirrorX ? -cy : cy, turns);
    for (const [i, j] of [[0, 0], [columns - 1, 0], [0, rows - 1], [columns - 1, rows - 1]]) {
      box = include(box, placement.x + rx + i * column.x + j * row.x, placement.y + ry + i * column.y + j * row.y);
    }
  }
  return box;
}

export function rotateQuarterTurns(x: number, y: number, turns: number): [number, number] {
  switch (turns) {
    case 1:
      return [-y, x];
    case 2:
      return [-x, -y];
    case 3:
      return [y, -x];
    default:
      return [x, y];
  }
}

function include(box: Box, x: number, y: number): Box {
  return { x0: Math.min(box.x0, x), y0: Math.min(box.y0, y), x1: Math.max(box.x1, x), y1: Math.max(box.y1, y) };
}

function union(a: Box, b: Box): Box {
  return { x0: Math.min(a.x0, b.x0), y0: Math.min(a.y0, b.y0), x1: Math.max(a.x1, b.x1), y1: Math.max(a.y1, b.y1) };
}
