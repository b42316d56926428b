/**
 * A growable byte buffer that writers fill record by record and drain in chunks,
 * so a file is produced as a stream and never held twice in memory.
 */
export class ByteChunks {
  private bytes: Uint8Array;
  private view: DataView;
  length = 0;

  constructor(initialCapacity = 1 << 16) {
    this.bytes = new Uint8Array(initialCapacity);
    this.view = new DataView(this.bytes.buffer);
  }

  private ensure(extra: number): void {
    const needed = this.length + extra;
    if (needed <= this.bytes.length) return;
    let capacity = this.bytes.length * 2;
    while (capacity < needed) capacity *= 2;
    const grown = new Uint8Array(capacity);
    grown.set(this.bytes.subarray(0, this.length));
    this.bytes = grown;
    this.view = new DataView(grown.buffer);
  }

  u8(value: number): void {
    this.ensure(1);
    this.bytes[this.length++] = value;
  }

  u16be(value: number): void {
    this.ensure(2);
    this.view.setUint16(this.length, value);
    this.length += 2;
  }

  i16be(value: number): void {
    this.ensure(2);
    this.view.setInt16(this.length, value);
    this.length += 2;
  }

  i32be(value: number): void {
    this.ensure(4);
    this.view.setInt32(this.length, value);
    this.length += 4;
  }

  u16le(value: number): void {
    this.ensure(2);
    this.view.setUint16(this.length, value, true);
    this.length += 2;
  }

  u32le(value: number): void {
    this.ensure(4);
    this.view.setUint32(this.length, value, true);
    this.length += 4;
  }

  f64le(value: number): void {
    this.ensure(8);
    this.view.setFloat64(this.length, value, true);
    this.length += 8;
  }

  /** Little-endian groups of 7 bits, high bit set on all but the last (OASIS unsigned-integer); value must be a safe integer ≥ 0. */
  varUint(value: number): void {
    this.ensure(8);
    let rest = value;
    while (rest >= 128) {
      this.bytes[this.length++] = (rest % 128) + 128;
      rest = Math.floor(rest / 128);
    }
    this.bytes[this.length++] = rest;
  }

  append(data: Uint8Array): void {
    this.ensure(data.length);
    this.bytes.set(data, this.length);
    this.length += data.length;
  }

  /** Overwrite a big-endian 16-bit value at an earlier position (used to patch record lengths). */
  patchU16be(position: number, value: number): void {
    this.view.setUint16(position, value);
  }

  /** The bytes written so far, as a fresh array; the buffer is emptied. */
  take(): Uint8Array {
    const out = this.bytes.slice(0, this.length);
    this.length = 0;
    return out;
  }
}
