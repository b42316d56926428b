import { ByteChunks } from '../layout/byte-chunks';
import { DataType, MAX_RECORD_BYTES } from './record-types';
import { encodeReal8 } from './real8';

/**
 * Frames GDSII records (2-byte length including the header, record type, data type; big-endian)
 * into a ByteChunks buffer. Every record has an even length: strings are padded with a NUL.
 */
export class GdsiiRecordWriter {
  constructor(readonly out: ByteChunks) {}

  private header(recordType: number, dataType: number, payloadBytes: number): void {
    const length = 4 + payloadBytes;
    if (length > MAX_RECORD_BYTES) throw new Error(`GDSII record of ${length} bytes exceeds the ${MAX_RECORD_BYTES}-byte limit`);
    this.out.u16be(length);
    this.out.u8(recordType);
    this.out.u8(dataType);
  }

  empty(recordType: number): void {
    this.header(recordType, DataType.NONE, 0);
  }

  int16(recordType: number, values: readonly number[]): void {
    this.header(recordType, DataType.INT16, values.length * 2);
    for (const value of values) this.out.i16be(value);
  }

  bits(recordType: number, value: number): void {
    this.header(recordType, DataType.BITS, 2);
    this.out.u16be(value);
  }

  real8(recordType: number, values: readonly number[]): void {
    this.header(recordType, DataType.REAL8, values.length * 8);
    for (const value of values) this.out.append(encodeReal8(value));
  }

  ascii(recordType: number, text: string): void {
    const padded = text.length % 2 === 0 ? text.length : text.length + 1;
    this.header(recordType, DataType.ASCII, padded);
    for (let i = 0; i < text.length; i++) this.out.u8(text.charCodeAt(i) & 0x7f);
    if (padded > text.length) this.out.u8(0);
  }

  /** XY points as 32-bit pairs; `close` repeats the first point, as BOUNDARY requires. */
  xy(recordType: number, points: ArrayLike<number>, close: boolean): void {
    const pairs = points.length / 2 + (close ? 1 : 0);
    this.header(recordType, DataType.INT32, pairs * 8);
    for (let i = 0; i < points.length; i++) this.out.i32be(points[i]);
    if (close) {
      this.out.i32be(points[0]);
      this.out.i32be(points[1]);
    }
  }
}
