import type { LayerInfo, LayoutCell, LayoutLibrary, LayoutPlacement } from '../layout/types';
import { readGdsiiRecords, type GdsiiRecord } from './read-records';
import { RecordType, STRANS_REFLECT } from './record-types';

/**
 * Reads a GDSII Stream file written by Zonewright (or any file using the same element kinds:
 * BOUNDARY, TEXT, SREF, AREF) back into a library, for round-trip checks.
 * Layers are listed as found, with purpose 'marker' since a GDSII file carries no meaning.
 */
export function readGdsii(bytes: Uint8Array): LayoutLibrary {
  const library: LayoutLibrary = { name: '', databaseUnit: 0, userUnit: 0, layers: [], cells: [], topCell: '' };
  const layerKeys = new Set<string>();
  let cell: LayoutCell | null = null;
  let element: ElementDraft | null = null;

  for (const record of readGdsiiRecords(bytes)) {
    switch (record.recordType) {
      case RecordType.LIBNAME:
        library.name = record.values as string;
        break;
      case RecordType.UNITS: {
        const [userPerDatabase, databaseUnit] = record.values as number[];
        library.databaseUnit = databaseUnit;
        library.userUnit = databaseUnit / userPerDatabase;
        break;
      }
      case RecordType.BGNSTR:
        cell = { name: '', shapes: [], texts: [], placements: [] };
        library.cells.push(cell);
        break;
      case RecordType.STRNAME:
        requireCell(cell, record).name = record.values as string;
        break;
      case RecordType.ENDSTR:
        cell = null;
        break;
      case RecordType.BOUNDARY:
      case RecordType.TEXT:
      case RecordType.SREF:
      case RecordType.AREF:
        element = { kind: record.recordType, layer: 0, datatype: 0, xy: [], text: '', cell: '', strans: 0, angle: 0, colrow: [1, 1] };
        break;
      case RecordType.LAYER:
        requireElement(element, record).layer = (record.values as number[])[0];
        break;
      case RecordType.DATATYPE:
      case RecordType.TEXTTYPE:
        requireElement(element, record).datatype = (record.values as number[])[0];
        break;
      case RecordType.XY:
        requireElement(element, record).xy = record.values as number[];
        break;
      case RecordType.STRING:
        requireElement(element, record).text = record.values as string;
        break;
      case RecordType.SNAME:
        requireElement(element, record).cell = record.values as string;
        break;
      case RecordType.STRANS:
        requireElement(element, record).strans = (record.values as number[])[0];
        break;
      case RecordType.ANGLE:
        requireElement(element, record).angle = (record.values as number[])[0];
        break;
      case RecordType.COLROW:
        requireElement(element, record).colrow = record.values as number[];
        break;
      case RecordType.ENDEL:
        finishElement(requireCell(cell, record), requireElement(element, record), library.layers, layerKeys);
        element = null;
        break;
      default:
        break;
    }
  }
  library.topCell = findTopCell(library.cells);
  return library;
}

interface ElementDraft {
  kind: number;
  layer: number;
  datatype: number;
  xy: number[];
  text: string;
  cell: string;
  strans: number;
  angle: number;
  colrow: number[];
}

function finishElement(cell: LayoutCell, element: ElementDraft, layers: LayerInfo[], layerKeys: Set<string>): void {
  if (element.kind === RecordType.BOUNDARY) {
    const key = `${element.layer}/${element.datatype}`;
    if (!layerKeys.has(key)) {
      layerKeys.add(key);
      layers.push({ layer: element.layer, datatype: element.datatype, name: `L${key}`, purpose: 'marker' });
    }
    let shapes = cell.shapes.find((s) => s.layer === element.layer && s.datatype === element.datatype);
    if (!shapes) {
      shapes = { layer: element.layer, datatype: element.datatype, polygons: [] };
      cell.shapes.push(shapes);
    }
    // drop the repeated closing point
    shapes.polygons.push(Int32Array.from(element.xy.slice(0, element.xy.length - 2)));
  } else if (element.kind === RecordType.TEXT) {
    cell.texts.push({ layer: element.layer, texttype: element.datatype, x: element.xy[0], y: element.xy[1], text: element.text });
  } else {
    const placement: LayoutPlacement = { cell: element.cell, x: element.xy[0], y: element.xy[1] };
    if (element.angle !== 0) placement.rotation = element.angle;
    if (element.strans & STRANS_REFLECT) placement.mirrorX = true;
    if (element.kind === RecordType.AREF) {
      const [columns, rows] = element.colrow;
      placement.columns = columns;
      placement.rows = rows;
      placement.columnStep = { x: (element.xy[2] - element.xy[0]) / columns, y: (element.xy[3] - element.xy[1]) / columns };
      placement.rowStep = { x: (element.xy[4] - element.xy[0]) / rows, y: (element.xy[5] - element.xy[1]) / rows };
    }
    cell.placements.push(placement);
  }
}

/** The top cell is the one no other cell places (the first such, if several). */
function findTopCell(cells: LayoutCell[]): string {
  const placed = new Set(cells.flatMap((c) => c.placements.map((p) => p.cell)));
  return cells.find((c) => !placed.has(c.name))?.name ?? cells[0]?.name ?? '';
}

function requireCell(cell: LayoutCell | null, record: GdsiiRecord): LayoutCell {
  if (!cell) throw new Error(`GDSII: record ${record.recordType} at byte ${record.offset} lies outside a structure`);
  return cell;
}

function requireElement(element: ElementDraft | null, record: GdsiiRecord): ElementDraft {
  if (!element) throw new Error(`GDSII: record ${record.recordType} at byte ${record.offset} lies outside an element`);
  return element;
}
