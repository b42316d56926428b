import { ByteChunks } from '../layout/byte-chunks';

/**
 * The basic OASIS encodings (SEMI P39, "Basic data representations"):
 * unsigned integers as little-endian groups of 7 bits with the high bit marking continuation,
 * signed integers with the sign in the lowest bit, reals tagged by a type number, strings with a length prefix.
 * Arithmetic rather than bit operators keeps values above 2^31 exact.
 */
export function writeUnsigned(out: ByteChunks, value: number): void {
  if (!Number.isSafeInteger(value) || value < 0) throw new Error(`OASIS: ${value} is not an unsigned integer`);
  out.varUint(value);
}

export function writeSigned(out: ByteChunks, value: number): void {
  writeUnsigned(out, Math.abs(value) * 2 + (value < 0 ? 1 : 0));
}

/** Real types: 0/1 positive/negative whole number, 2/3 reciprocal 1/n, 7 IEEE double (little-endian). */
export function writeReal(out: ByteChunks, value: number): void {
  const magnitude = Math.abs(value);
  const negative = value < 0 ? 1 : 0;
  if (Number.isSafeInteger(magnitude)) {
    writeUnsigned(out, negative);
    writeUnsigned(out, magnitude);
  } else if (magnitude > 0 && Number.isSafeInteger(1 / magnitude) && 1 / (1 / magnitude) === magnitude) {
    writeUnsigned(out, 2 + negative);
    writeUnsigned(out, 1 / magnitude);
  } else {
    writeUnsigned(out, 7);
    out.f64le(value);
  }
}

/** a-string, b-string and n-string share one layout: byte count, then the bytes. */
export function writeString(out: ByteChunks, text: string): void {
  writeUnsigned(out, text.length);
  for (let i = 0; i < text.length; i++) out.u8(text.charCodeAt(i) & 0xff);
}

/**
 * A g-delta: form 1 (one integer, lowest bit 0) for a step along one of the eight octant directions
 * (0 east, 1 north, 2 west, 3 south, 4 north-east, 5 north-west, 6 south-west, 7 south-east),
 * form 2 (lowest bit 1, then the sign of x, then |x|; followed by y as a signed integer) otherwise.
 */
export function writeGDelta(out: ByteChunks, dx: number, dy: number): void {
  const direction = octantDirection(dx, dy);
  if (direction >= 0) {
    writeUnsigned(out, Math.max(Math.abs(dx), Math.abs(dy)) * 16 + direction * 2);
    return;
  }
  writeUnsigned(out, Math.abs(dx) * 4 + (dx < 0 ? 2 : 0) + 1);
  writeSigned(out, dy);
}

function octantDirection(dx: number, dy: number): number {
  if (dx === 0 && dy === 0) return -1;
  if (dy === 0) return dx > 0 ? 0 : 2;
  if (dx === 0) return dy > 0 ? 1 : 3;
  if (dx === dy) return dx > 0 ? 4 : 6;
  if (dx === -dy) return dx < 0 ? 5 : 7;
  return -1;
}

/** The encoding of one value as bytes, for tests and for sizing records. */
export function encoded(write: (out: ByteChunks) => void): Uint8Array {
  const out = new ByteChunks(16);
  write(out);
  return out.take();
}
