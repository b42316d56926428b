import type { LayoutCell, LayoutLibrary, LayoutPlacement } from '@/lib/layout/types';

/** One layer's polygons in µm (flat x,y pairs), ready to draw. */
export interface ViewLayer {
  layer: number;
  datatype: number;
  name: string;
  polygons: Float64Array[];
}

export interface Bounds {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

export interface FlatMask {
  layers: ViewLayer[];
  bounds: Bounds | null;
  /** vertices drawn; placements are expanded until the budget is reached */
  vertexCount: number;
  /** true when the budget cut the expansion short, so the view shows part of the mask */
  truncated: boolean;
}

interface Affine {
  a: number;
  b: number;
  c: number;
  d: number;
  e: number;
  f: number;
}

const IDENTITY: Affine = { a: 1, b: 0, c: 0, d: 1, e: 0, f: 0 };

/** Placement transform as GDSII applies it: mirror about x, then rotate, then translate. */
function placementAffine(p: LayoutPlacement, dx: number, dy: number): Affine {
  const turns = Math.round((p.rotation ?? 0) / 90) & 3;
  const cos = [1, 0, -1, 0][turns];
  const sin = [0, 1, 0, -1][turns];
  const m = p.mirrorX ? -1 : 1;
  return { a: cos, b: sin, c: -sin * m, d: cos * m, e: p.x + dx, f: p.y + dy };
}

function compose(outer: Affine, inner: Affine): Affine {
  return {
    a: outer.a * inner.a + outer.c * inner.b,
    b: outer.b * inner.a + outer.d * inner.b,
    c: outer.a * inner.c + outer.c * inner.d,
    d: outer.b * inner.c + outer.d * inner.d,
    e: outer.a * inner.e + outer.c * inner.f + outer.e,
    f: outer.b * inner.e + outer.d * inner.f + outer.f,
  };
}

/**
 * Expands the top cell of a library (with its placements and arrays) into per-layer polygons in µm.
 * Stops adding polygons once `vertexBudget` vertices are collected, so a huge array cannot freeze the page.
 */
export function flattenLibrary(library: LayoutLibrary, vertexBudget = 4_000_000): FlatMask {
  const cells = new Map<string, LayoutCell>(library.cells.map((c) => [c.name, c]));
  const umPerDbu = library.databaseUnit / 1e-6;
  const byKey = new Map<string, ViewLayer>();
  for (const info of library.layers) {
    byKey.set(`${info.layer}/${info.datatype}`, { layer: info.layer, datatype: info.datatype, name: info.name, polygons: [] });
  }
  let vertexCount = 0;
  let truncated = false;
  let x0 = Infinity;
  let y0 = Infinity;
  let x1 = -Infinity;
  let y1 = -Infinity;

  const visit = (cell: LayoutCell, t: Affine, depth: number): void => {
    if (truncated) return;
    for (const shapes of cell.shapes) {
      const key = `${shapes.layer}/${shapes.datatype}`;
      let target = byKey.get(key);
      if (!target) {
        target = { layer: shapes.layer, datatype: shapes.datatype, name: `layer ${key}`, polygons: [] };
        byKey.set(key, target);
      }
      for (const poly of shapes.polygons) {
        const n = poly.length >> 1;
        if (vertexCount + n > vertexBudget) {
          truncated = true;
          return;
        }
        const out = new Float64Array(poly.length);
        for (let i = 0; i < poly.length; i += 2) {
          const px = poly[i];
          const py = poly[i + 1];
          const x = (t.a * px + t.c * py + t.e) * umPerDbu;
          const y = (t.b * px + t.d * py + t.f) * umPerDbu;
          out[i] = x;
          out[i + 1] = y;
          if (x < x0) x0 = x;
          if (x > x1) x1 = x;
          if (y < y0) y0 = y;
          if (y > y1) y1 = y;
        }
        target.polygons.push(out);
        vertexCount += n;
      }
    }
    // A reference cycle would recurse forever; 32 levels is far deeper than any mask needs.
    if (depth >= 32) return;
    for (const p of cell.placements) {
      const child = cells.get(p.cell);
      if (!child) continue;
      const columns = Math.max(1, p.columns ?? 1);
      const rows = Math.max(1, p.rows ?? 1);
      for (let j = 0; j < rows; j++) {
        for (let i = 0; i < columns; i++) {
          const dx = i * (p.columnStep?.x ?? 0) + j * (p.rowStep?.x ?? 0);
          const dy = i * (p.columnStep?.y ?? 0) + j * (p.rowStep?.y ?? 0);
          visit(child, compose(t, placementAffine(p, dx, dy)), depth + 1);
          if (truncated) return;
        }
      }
    }
  };

  const top = cells.get(library.topCell);
  if (top) visit(top, IDENTITY, 0);
  const layers = [...byKey.values()].filter((l) => l.polygons.length > 0);
  const bounds = Number.isFinite(x0) ? { x0, y0, x1, y1 } : null;
  return { layers, bounds, vertexCount, truncated };
}
