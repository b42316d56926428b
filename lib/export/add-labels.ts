import type { Font } from 'opentype.js';
import type { LabelRequest } from '../design/types';
import type { LayoutLibrary } from '../layout/types';
import { textPolygons } from '../text';

export interface LabelLayer {
  layer: number;
  datatype: number;
}

/**
 * Draws the script's labels as polygons (and TEXT annotations with the same words) in the top cell,
 * on the label layer, adding that layer to the layer map if it is new. Returns a new library.
 */
export function addLabels(library: LayoutLibrary, labels: readonly LabelRequest[], font: Font, layer: LabelLayer, chordTolerance: number): LayoutLibrary {
  if (labels.length === 0) return library;
  const databaseUnit = library.databaseUnit / 1e-6;
  const polygons = labels.flatMap((label) => textPolygons(font, label, { databaseUnit, chordTolerance }));
  const texts = labels.map((label) => ({
    layer: layer.layer,
    texttype: layer.datatype,
    x: Math.round(label.x / databaseUnit),
    y: Math.round(label.y / databaseUnit),
    text: label.text,
  }));
  const cells = library.cells.map((cell) => {
    if (cell.name !== library.topCell) return cell;
    const shapes = cell.shapes.some((s) => s.layer === layer.layer && s.datatype === layer.datatype)
      ? cell.shapes.map((s) => (s.layer === layer.layer && s.datatype === layer.datatype ? { ...s, polygons: [...s.polygons, ...polygons] } : s))
      : [...cell.shapes, { layer: layer.layer, datatype: layer.datatype, polygons }];
    return { ...cell, shapes, texts: [...cell.texts, ...texts] };
  });
  const layers = library.layers.some((l) => l.layer === layer.layer && l.datatype === layer.datatype)
    ? library.layers
    : [...library.layers, { layer: layer.layer, datatype: layer.datatype, name: 'label', purpose: 'label' as const }];
  return { ...library, cells, layers };
}
