import { cellBoundingBox } from './bounding-box';
import { renameCells } from './rename-cells';
import type { LayerInfo, LayoutCell, LayoutLibrary, LayoutPlacement } from './types';

export interface ExposureMatrixSpec {
  /** name of the matrix's top cell and of the library */
  name: string;
  /** one variant per column (e.g. a duty cycle or size bias), each a library in the same units */
  columns: Array<{ library: LayoutLibrary; caption: string }>;
  /** one caption per row (e.g. the dose); rows repeat the column's geometry */
  rows: string[];
  /** clear space between neighbouring elements and between an element and its label, µm */
  gap: number;
  /** capital-letter height of the labels, µm */
  labelHeight: number;
  labelLayer: { layer: number; datatype: number };
  /** the text each element carries */
  labelFor: (column: number, row: number) => string;
  /** draws text at a baseline start (µm) as polygons in database units */
  drawLabel: (text: string, x: number, y: number) => Int32Array[];
}

/**
 * An N × M exposure matrix: column c holds variant c, repeated down the rows by one array placement
 * (a GDSII AREF, an OASIS repetition); if every column is the same library, one columns × rows array.
 * Every element gets its own label, below it, on the label layer, plus a TEXT annotation with the same words.
 */
export function buildExposureMatrix(spec: ExposureMatrixSpec): LayoutLibrary {
  if (spec.columns.length === 0 || spec.rows.length === 0) throw new Error('an exposure matrix needs at least one column and one row');
  const first = spec.columns[0].library;
  if (spec.columns.some((c) => c.library.databaseUnit !== first.databaseUnit || c.library.userUnit !== first.userUnit)) {
    throw new Error('every variant of an exposure matrix must use the same database unit and user unit');
  }
  const dbuPerMicrometre = 1e-6 / first.databaseUnit;
  const sameVariant = spec.columns.every((c) => c.library === first);
  const variants = (sameVariant ? [first] : spec.columns.map((c) => c.library)).map((library, index) => ({
    ...renameCells(library, `_V${index}`),
    box: cellBoundingBox(library, library.topCell),
  }));

  const gap = Math.round(spec.gap * dbuPerMicrometre);
  const labelBand = Math.round(spec.labelHeight * 1.6 * dbuPerMicrometre) + gap;
  const width = Math.max(...variants.map((v) => v.box.x1 - v.box.x0));
  const height = Math.max(...variants.map((v) => v.box.y1 - v.box.y0));
  const pitchX = width + gap;
  const pitchY = height + labelBand + gap;

  const placements: LayoutPlacement[] = [];
  const columnOrigin = (c: number) => ({ x: c * pitchX, y: 0 });
  if (sameVariant) {
    const v = variants[0];
    placements.push(arrayPlacement(v.topCell, -v.box.x0, -v.box.y0, spec.columns.length, spec.rows.length, pitchX, -pitchY));
  } else {
    variants.forEach((v, c) => placements.push(arrayPlacement(v.topCell, columnOrigin(c).x - v.box.x0, -v.box.y0, 1, spec.rows.length, pitchX, -pitchY)));
  }

  const labelPolygons: Int32Array[] = [];
  const texts: LayoutCell['texts'] = [];
  for (let c = 0; c < spec.columns.length; c++) {
    for (let r = 0; r < spec.rows.length; r++) {
      const text = spec.labelFor(c, r);
      const x = columnOrigin(c).x;
      const baseline = -r * pitchY - gap - Math.round(spec.labelHeight * dbuPerMicrometre);
      labelPolygons.push(...spec.drawLabel(text, x / dbuPerMicrometre, baseline / dbuPerMicrometre));
      texts.push({ layer: spec.labelLayer.layer, texttype: spec.labelLayer.datatype, x, y: baseline, text });
    }
  }

  const top: LayoutCell = {
    name: spec.name,
    shapes: [{ layer: spec.labelLayer.layer, datatype: spec.labelLayer.datatype, polygons: labelPolygons }],
    texts,
    placements,
  };
  return {
    name: spec.name,
    databaseUnit: first.databaseUnit,
    userUnit: first.userUnit,
    layers: mergedLayers(spec.columns.map((c) => c.library), spec.labelLayer),
    cells: [...variants.flatMap((v) => v.cells), top],
    topCell: spec.name,
  };
}

function arrayPlacement(cell: string, x: number, y: number, columns: number, rows: number, pitchX: number, pitchY: number): LayoutPlacement {
  const placement: LayoutPlacement = { cell, x, y };
  if (columns > 1 || rows > 1) {
    placement.columns = columns;
    placement.rows = rows;
    placement.columnStep = { x: pitchX, y: 0 };
    placement.rowStep = { x: 0, y: pitchY };
  }
  return placement;
}

function mergedLayers(libraries: LayoutLibrary[], labelLayer: { layer: number; datatype: number }): LayerInfo[] {
  const byKey = new Map<string, LayerInfo>();
  for (const layer of libraries.flatMap((l) => l.layers)) byKey.set(`${layer.layer}/${layer.datatype}`, byKey.get(`${layer.layer}/${layer.datatype}`) ?? layer);
  const labelKey = `${labelLayer.layer}/${labelLayer.datatype}`;
  if (!byKey.has(labelKey)) byKey.set(labelKey, { ...labelLayer, name: 'label', purpose: 'label' });
  return [...byKey.values()];
}
