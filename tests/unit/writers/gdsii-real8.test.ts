import { describe, expect, it } from 'vitest';
import { decodeReal8, encodeReal8 } from '@/lib/gdsii/real8';

const hex = (bytes: Uint8Array) => Buffer.from(bytes).toString('hex');

// GDSII Stream Format Manual, release 6.0, "8-byte real": value = (−1)^S · (M / 2^56) · 16^(E − 64),
// E in excess-64, M normalised so that 1/16 ≤ M/2^56 < 1. Each expected value below is worked by hand from that rule.
describe('GDSII 8-byte real', () => {
  it('encodes 1 as 0x41 10 00 00 00 00 00 00', () => {
    // 1 = (1/16)·16^1: E = 65 = 0x41, M/2^56 = 1/16 = 0x0.10 → mantissa bytes 10 00 00 00 00 00 00 (the manual's own example of 1)
    expect(hex(encodeReal8(1))).toBe('4110000000000000');
  });

  it('encodes −2.5 with the sign bit set', () => {
    // 2.5 = 0.15625·16^1, 0.15625 = 0x0.28: S = 1, E = 0x41 → first byte 0xC1, mantissa 28 00 …
    expect(hex(encodeReal8(-2.5))).toBe('c128000000000000');
  });

  it('encodes 90 (a rotation angle) as 0x42 5A …', () => {
    // 90 = 0x5A = (0x5A/256)·16^2: E = 66 = 0x42, mantissa 5A 00 …
    expect(hex(encodeReal8(90))).toBe('425a000000000000');
  });

  it('encodes the double nearest 0.001 exactly', () => {
    // 0.001 = 0.256·16^−2: E = 62 = 0x3E. The double nearest 0.001 is 0x3F50624DD2F1A9FC = 1.0624DD2F1A9FC·2^−10;
    // times 16^2 that is 1.0624DD2F1A9FC·2^−2 = 0x0.4189374BC6A7F0 (53 bits shifted into 56), so the mantissa is 41 89 37 4B C6 A7 F0.
    expect(hex(encodeReal8(0.001))).toBe('3e4189374bc6a7f0');
    expect(decodeReal8(encodeReal8(0.001))).toBe(0.001);
  });

  it('encodes 1e-9 (a database unit in metres) with exponent 0x39', () => {
    // 1e−9 = 0.268435456·16^−7: E = 57 = 0x39; 0.268435456 = 0x0.44B82FA09B5A5…
    const bytes = encodeReal8(1e-9);
    expect(bytes[0]).toBe(0x39);
    expect(hex(bytes).slice(2, 12)).toBe('44b82fa09b');
    expect(decodeReal8(bytes)).toBe(1e-9);
  });

  it('encodes zero as eight zero bytes', () => {
    // the manual: zero is all bits zero
    expect(hex(encodeReal8(0))).toBe('0000000000000000');
  });

  it('round-trips arbitrary doubles in range without loss', () => {
    for (const value of [3.14159, -1e-12, 12345.678, 2 ** -200, 1e70]) expect(decodeReal8(encodeReal8(value))).toBe(value);
  });

  it('refuses values out of range', () => {
    expect(() => encodeReal8(1e80)).toThrow(/out of range/);
    expect(() => encodeReal8(Number.NaN)).toThrow(/cannot be written/);
  });
});
