import { ByteChunks } from '../layout/byte-chunks';
import { concatBytes } from '../layout/concat-bytes';
import type { LayoutCell, LayoutLibrary, LayoutPlacement } from '../layout/types';
import { validateLibrary } from '../layout/validate-library';
import { MAX_XY_POINTS, RecordType, STRANS_REFLECT } from './record-types';
import { GdsiiRecordWriter } from './record-writer';

export interface GdsiiOptions {
  /** written into BGNLIB and BGNSTR; fixed by the caller so a revision's file is reproducible */
  timestamp?: Date;
  /** bytes gathered before a chunk is handed out */
  chunkBytes?: number;
}

/**
 * Writes a library as a GDSII Stream file (release 6.0 records), one chunk at a time:
 * the caller consumes each chunk before the next is built, so the polygon data exists once.
 */
export function* gdsiiChunks(library: LayoutLibrary, options: GdsiiOptions = {}): Generator<Uint8Array> {
  validateLibrary(library);
  const chunkBytes = options.chunkBytes ?? 1 << 20;
  const out = new ByteChunks();
  const records = new GdsiiRecordWriter(out);
  const date = dateWords(options.timestamp ?? new Date());

  records.int16(RecordType.HEADER, [600]);
  records.int16(RecordType.BGNLIB, [...date, ...date]);
  records.ascii(RecordType.LIBNAME, library.name);
  records.real8(RecordType.UNITS, [library.databaseUnit / library.userUnit, library.databaseUnit]);

  for (const cell of library.cells) {
    records.int16(RecordType.BGNSTR, [...date, ...date]);
    records.ascii(RecordType.STRNAME, cell.name);
    for (const _ of cellElements(records, cell)) {
      if (out.length >= chunkBytes) yield out.take();
    }
    records.empty(RecordType.ENDSTR);
  }
  records.empty(RecordType.ENDLIB);
  yield out.take();
}

export function writeGdsii(library: LayoutLibrary, options: GdsiiOptions = {}): Uint8Array {
  return concatBytes(gdsiiChunks(library, options));
}

/** Writes the cell's elements one by one, pausing after each so the caller can drain the buffer. */
function* cellElements(records: GdsiiRecordWriter, cell: LayoutCell): Generator<void> {
  for (const shapes of cell.shapes) {
    for (const polygon of shapes.polygons) {
      if (polygon.length / 2 + 1 > MAX_XY_POINTS) {
        throw new Error(
          `cell "${cell.name}" layer ${shapes.layer}/${shapes.datatype}: a polygon of ${polygon.length / 2} points exceeds GDSII's ${MAX_XY_POINTS - 1}-point limit; lower the vertex cap`,
        );
      }
      records.empty(RecordType.BOUNDARY);
      records.int16(RecordType.LAYER, [shapes.layer]);
      records.int16(RecordType.DATATYPE, [shapes.datatype]);
      records.xy(RecordType.XY, polygon, true);
      records.empty(RecordType.ENDEL);
      yield;
    }
  }
  for (const text of cell.texts) {
    records.empty(RecordType.TEXT);
    records.int16(RecordType.LAYER, [text.layer]);
    records.int16(RecordType.TEXTTYPE, [text.texttype]);
    records.xy(RecordType.XY, [text.x, text.y], false);
    records.ascii(RecordType.STRING, text.text);
    records.empty(RecordType.ENDEL);
    yield;
  }
  for (const placement of cell.placements) {
    writePlacement(records, placement);
    yield;
  }
}

function writePlacement(records: GdsiiRecordWriter, placement: LayoutPlacement): void {
  const columns = placement.columns ?? 1;
  const rows = placement.rows ?? 1;
  const arrayed = columns > 1 || rows > 1;
  records.empty(arrayed ? RecordType.AREF : RecordType.SREF);
  records.ascii(RecordType.SNAME, placement.cell);
  const rotation = normaliseRotation(placement.rotation ?? 0);
  if (placement.mirrorX || rotation !== 0) {
    records.bits(RecordType.STRANS, placement.mirrorX ? STRANS_REFLECT : 0);
    if (rotation !== 0) records.real8(RecordType.ANGLE, [rotation]);
  }
  if (!arrayed) {
    records.xy(RecordType.XY, [placement.x, placement.y], false);
  } else {
    // AREF: the origin, then the origin displaced by all columns, then by all rows (manual, AREF element).
    const column = placement.columnStep ?? { x: 0, y: 0 };
    const row = placement.rowStep ?? { x: 0, y: 0 };
    records.int16(RecordType.COLROW, [columns, rows]);
    records.xy(
      RecordType.XY,
      [
        placement.x,
        placement.y,
        placement.x + columns * column.x,
        placement.y + columns * column.y,
        placement.x + rows * row.x,
        placement.y + rows * row.y,
      ],
      false,
    );
  }
  records.empty(RecordType.ENDEL);
}

function normaliseRotation(degrees: number): number {
  return ((degrees % 360) + 360) % 360;
}

/** Year, month, day, hour, minute, second in UTC, as BGNLIB and BGNSTR carry them. */
function dateWords(date: Date): number[] {
  return [date.getUTCFullYear(), date.getUTCMonth() + 1, date.getUTCDate(), date.getUTCHours(), date.getUTCMinutes(), date.getUTCSeconds()];
}
