import { flattenLayer } from '../optics/flatten-layer';
import type { LayoutLibrary, LayerShapes } from '../layout/types';

/**
 * The library with every placement expanded into its top cell, on the database grid, so a
 * comparison sees arrayed cells (exposure matrices, labels placed as cells) too. A library
 * whose cells place nothing is returned as it is.
 */
export function flatLibrary(library: LayoutLibrary): LayoutLibrary {
  if (library.cells.every((c) => c.placements.length === 0)) return library;
  const dbuPerUm = 1e-6 / library.databaseUnit;
  const keys = new Map<string, { layer: number; datatype: number }>();
  for (const cell of library.cells) for (const s of cell.shapes) keys.set(`${s.layer}/${s.datatype}`, { layer: s.layer, datatype: s.datatype });
  const shapes: LayerShapes[] = [...keys.values()].map(({ layer, datatype }) => ({
    layer,
    datatype,
    polygons: flattenLayer(library, layer, datatype).map((p) => Int32Array.from(p, (v) => Math.round(v * dbuPerUm))),
  }));
  return { ...library, cells: [{ name: library.topCell, shapes, texts: [], placements: [] }] };
}
