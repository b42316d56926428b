import { DataType } from './record-types';
import { decodeReal8 } from './real8';

export interface GdsiiRecord {
  recordType: number;
  dataType: number;
  /** byte offset of the record in the file, for error messages */
  offset: number;
  values: number[] | string | null;
}

/** Splits a GDSII Stream file into decoded records; stops after ENDLIB. */
export function* readGdsiiRecords(bytes: Uint8Array): Generator<GdsiiRecord> {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  let offset = 0;
  while (offset + 4 <= bytes.length) {
    const length = view.getUint16(offset);
    const recordType = bytes[offset + 2];
    const dataType = bytes[offset + 3];
    if (length < 4 || length % 2 !== 0 || offset + length > bytes.length) {
      throw new Error(`GDSII: bad record length ${length} at byte ${offset}`);
    }
    const start = offset + 4;
    const end = offset + length;
    yield { recordType, dataType, offset, values: decodePayload(view, bytes, dataType, start, end, offset) };
    offset = end;
    if (recordType === 0x04) return;
  }
  throw new Error('GDSII: the file ends before ENDLIB');
}

function decodePayload(view: DataView, bytes: Uint8Array, dataType: number, start: number, end: number, offset: number): GdsiiRecord['values'] {
  const values: number[] = [];
  switch (dataType) {
    case DataType.NONE:
      return null;
    case DataType.BITS:
    case DataType.INT16:
      for (let p = start; p < end; p += 2) values.push(dataType === DataType.BITS ? view.getUint16(p) : view.getInt16(p));
      return values;
    case DataType.INT32:
      for (let p = start; p < end; p += 4) values.push(view.getInt32(p));
      return values;
    case DataType.REAL8:
      for (let p = start; p < end; p += 8) values.push(decodeReal8(bytes, p));
      return values;
    case DataType.ASCII: {
      let text = '';
      for (let p = start; p < end && bytes[p] !== 0; p++) text += String.fromCharCode(bytes[p]);
      return text;
    }
    default:
      throw new Error(`GDSII: unsupported data type ${dataType} at byte ${offset}`);
  }
}
