import type { ByteChunks } from '../layout/byte-chunks';
import type { LayoutCell, LayoutPlacement, LayoutText } from '../layout/types';
import { writeSigned, writeString, writeUnsigned } from './encoding';
import type { ModalState } from './modal-state';
import { writePolygonPointList } from './point-list';
import { RecordId } from './record-ids';
import { writeArrayRepetition } from './repetition';

/**
 * Writes the element records of one cell (POLYGON, TEXT, PLACEMENT), pausing after each
 * so the caller can drain or compress the buffer.
 */
export function* cellElementRecords(
  out: ByteChunks,
  cell: LayoutCell,
  modal: ModalState,
  cellNumber: (name: string) => number,
): Generator<void> {
  for (const shapes of cell.shapes) {
    for (const polygon of shapes.polygons) {
      writePolygon(out, modal, shapes.layer, shapes.datatype, polygon);
      yield;
    }
  }
  for (const text of cell.texts) {
    writeText(out, modal, text);
    yield;
  }
  for (const placement of cell.placements) {
    writePlacement(out, modal, placement, cellNumber(placement.cell));
    yield;
  }
}

/** POLYGON: info byte 00PXYRDL, then [layer] [datatype] [point-list] [x] [y]. */
function writePolygon(out: ByteChunks, modal: ModalState, layer: number, datatype: number, polygon: ArrayLike<number>): void {
  const x = polygon[0];
  const y = polygon[1];
  const info =
    0x20 |
    (x !== modal.geometryX ? 0x10 : 0) |
    (y !== modal.geometryY ? 0x08 : 0) |
    (datatype !== modal.datatype ? 0x02 : 0) |
    (layer !== modal.layer ? 0x01 : 0);
  writeUnsigned(out, RecordId.POLYGON);
  out.u8(info);
  if (info & 0x01) writeUnsigned(out, layer);
  if (info & 0x02) writeUnsigned(out, datatype);
  writePolygonPointList(out, polygon);
  if (info & 0x10) writeSigned(out, x);
  if (info & 0x08) writeSigned(out, y);
  modal.layer = layer;
  modal.datatype = datatype;
  modal.geometryX = x;
  modal.geometryY = y;
}

/** TEXT: info byte 0CNXYRTL with the string inline (C set, N clear), then [textlayer] [texttype] [x] [y]. */
function writeText(out: ByteChunks, modal: ModalState, text: LayoutText): void {
  const info =
    0x40 |
    (text.x !== modal.textX ? 0x10 : 0) |
    (text.y !== modal.textY ? 0x08 : 0) |
    (text.texttype !== modal.textType ? 0x02 : 0) |
    (text.layer !== modal.textLayer ? 0x01 : 0);
  writeUnsigned(out, RecordId.TEXT);
  out.u8(info);
  writeString(out, text.text);
  if (info & 0x01) writeUnsigned(out, text.layer);
  if (info & 0x02) writeUnsigned(out, text.texttype);
  if (info & 0x10) writeSigned(out, text.x);
  if (info & 0x08) writeSigned(out, text.y);
  modal.textLayer = text.layer;
  modal.textType = text.texttype;
  modal.textX = text.x;
  modal.textY = text.y;
}

/**
 * PLACEMENT: info byte CNXYRAAF with the cell by reference number, AA the rotation in quarter turns
 * (counter-clockwise) and F the reflection about the x-axis applied before rotation.
 */
function writePlacement(out: ByteChunks, modal: ModalState, placement: LayoutPlacement, reference: number): void {
  const quarterTurns = ((((placement.rotation ?? 0) / 90) % 4) + 4) % 4;
  const arrayed = (placement.columns ?? 1) > 1 || (placement.rows ?? 1) > 1;
  const info =
    0xc0 |
    (placement.x !== modal.placementX ? 0x20 : 0) |
    (placement.y !== modal.placementY ? 0x10 : 0) |
    (arrayed ? 0x08 : 0) |
    (quarterTurns << 1) |
    (placement.mirrorX ? 0x01 : 0);
  writeUnsigned(out, RecordId.PLACEMENT);
  out.u8(info);
  writeUnsigned(out, reference);
  if (info & 0x20) writeSigned(out, placement.x);
  if (info & 0x10) writeSigned(out, placement.y);
  if (arrayed) writeArrayRepetition(out, placement);
  modal.placementX = placement.x;
  modal.placementY = placement.y;
}
