import { describe, expect, it } from 'vitest';
import { crc32Update } from '@/lib/layout/crc32';
import { encoded, writeGDelta, writeReal, writeSigned, writeString, writeUnsigned } from '@/lib/oasis/encoding';
import { writePolygonPointList } from '@/lib/oasis/point-list';

const bytes = (write: Parameters<typeof encoded>[0]) => [...encoded(write)];

// SEMI P39 (OASIS), section "unsigned-integer": worked examples, from memory:
// 0 → 00, 127 → 7F, 128 → 80 01, 16383 → FF 7F, 16384 → 80 80 01.
describe('OASIS unsigned-integer', () => {
  it.each([
    [0, [0x00]],
    [127, [0x7f]],
    [128, [0x80, 0x01]],
    [16383, [0xff, 0x7f]],
    [16384, [0x80, 0x80, 0x01]],
  ])('%i', (value, expected) => {
    expect(bytes((out) => writeUnsigned(out, value))).toEqual(expected);
  });

  it('stays exact above 2^31 (7-bit groups, little-endian)', () => {
    // 2^35 = 1 followed by five groups of seven zero bits
    expect(bytes((out) => writeUnsigned(out, 2 ** 35))).toEqual([0x80, 0x80, 0x80, 0x80, 0x80, 0x01]);
  });

  it('refuses negative and fractional values', () => {
    expect(() => bytes((out) => writeUnsigned(out, -1))).toThrow(/not an unsigned integer/);
    expect(() => bytes((out) => writeUnsigned(out, 1.5))).toThrow(/not an unsigned integer/);
  });
});

// SEMI P39, section "signed-integer": sign in the lowest bit, magnitude above it; worked examples, from memory:
// 0 → 00, +1 → 02, −1 → 03, +63 → 7E, −64 → 81 01, +8191 → FE 7F, −8192 → 81 80 01.
describe('OASIS signed-integer', () => {
  it.each([
    [0, [0x00]],
    [1, [0x02]],
    [-1, [0x03]],
    [63, [0x7e]],
    [-64, [0x81, 0x01]],
    [8191, [0xfe, 0x7f]],
    [-8192, [0x81, 0x80, 0x01]],
  ])('%i', (value, expected) => {
    expect(bytes((out) => writeSigned(out, value))).toEqual(expected);
  });
});

// SEMI P39, section "real": a type number then the value. Type 0 positive whole number (unsigned follows),
// 1 negative whole number, 2 positive reciprocal 1/n, 3 negative reciprocal, 7 IEEE-754 double, little-endian.
// Examples worked from those definitions: 1000 → 00 E8 07; −5 → 01 05; 0.5 → 02 02; −0.25 → 03 04.
describe('OASIS real', () => {
  it('writes whole numbers as type 0 / 1', () => {
    expect(bytes((out) => writeReal(out, 1000))).toEqual([0x00, 0xe8, 0x07]);
    expect(bytes((out) => writeReal(out, -5))).toEqual([0x01, 0x05]);
  });

  it('writes reciprocals as type 2 / 3', () => {
    expect(bytes((out) => writeReal(out, 0.5))).toEqual([0x02, 0x02]);
    expect(bytes((out) => writeReal(out, -0.25))).toEqual([0x03, 0x04]);
  });

  it('writes other values as a type-7 double, little-endian', () => {
    // IEEE-754: 1.5 = 0x3FF8000000000000, least significant byte first
    expect(bytes((out) => writeReal(out, 1.5))).toEqual([0x07, 0, 0, 0, 0, 0, 0, 0xf8, 0x3f]);
  });
});

describe('OASIS strings and g-deltas', () => {
  it('prefixes a string with its byte count', () => {
    // SEMI P39 "string": length as unsigned-integer, then the bytes; "1.0" → 03 31 2E 30
    expect(bytes((out) => writeString(out, '1.0'))).toEqual([0x03, 0x31, 0x2e, 0x30]);
  });

  it('writes octant steps as form 1 and other steps as form 2', () => {
    // SEMI P39 "g-delta", form 1: (magnitude << 4) | (direction << 1), directions E N W S NE NW SW SE = 0..7
    expect(bytes((out) => writeGDelta(out, 5, 0))).toEqual([5 << 4]);
    expect(bytes((out) => writeGDelta(out, 0, -3))).toEqual([(3 << 4) | (3 << 1)]);
    expect(bytes((out) => writeGDelta(out, -2, 2))).toEqual([(2 << 4) | (5 << 1)]);
    // form 2: (|dx| << 2) | (sign << 1) | 1, then dy as signed-integer: (−3, 7) → 0x0F, 0x0E
    expect(bytes((out) => writeGDelta(out, -3, 7))).toEqual([0x0f, 0x0e]);
  });
});

describe('OASIS point lists', () => {
  it('writes a rectangle as type 0 with the last two steps implied', () => {
    // SEMI P39 point-list type 0: 1-deltas alternating horizontal/vertical starting horizontal;
    // for a polygon the final two edges back to the start are implied. 4×2 rectangle → type 0, count 2, +4, +2
    expect(bytes((out) => writePolygonPointList(out, [0, 0, 4, 0, 4, 2, 0, 2]))).toEqual([0x00, 0x02, 0x08, 0x04]);
  });

  it('writes a vertical-first Manhattan polygon as type 1', () => {
    expect(bytes((out) => writePolygonPointList(out, [0, 0, 0, 2, 4, 2, 4, 0]))).toEqual([0x01, 0x02, 0x04, 0x08]);
  });

  it('writes a triangle as type 4 g-deltas', () => {
    // (0,0) → (3,0): form 1 east 3; (3,0) → (1,5): form 2 (−2, 5)
    expect(bytes((out) => writePolygonPointList(out, [0, 0, 3, 0, 1, 5]))).toEqual([0x04, 0x02, 3 << 4, (2 << 2) | 2 | 1, 0x0a]);
  });
});

describe('CRC-32', () => {
  it('gives the standard check value for "123456789", also when fed in pieces', () => {
    // the CRC-32 check value 0xCBF43926 (ISO 3309 polynomial, reflected), from memory
    const text = new TextEncoder().encode('123456789');
    expect(crc32Update(0, text)).toBe(0xcbf43926);
    expect(crc32Update(crc32Update(0, text.subarray(0, 4)), text.subarray(4))).toBe(0xcbf43926);
  });
});
