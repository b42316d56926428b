import { deflateSync } from 'node:zlib';
import { describe, expect, it } from 'vitest';
import { PHASE_MAP_LIMITS, parsePhaseCsv, parsePhasePng } from '@/lib/phasemap';

/** CRC-32 as defined in the PNG specification (ISO/IEC 15948, annex D). */
function crc32(bytes: Uint8Array): number {
  let c = 0xffffffff;
  for (const b of bytes) {
    c ^= b;
    for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
  }
  return (c ^ 0xffffffff) >>> 0;
}

function chunk(type: string, data: Uint8Array): Buffer {
  const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
  const out = Buffer.alloc(body.length + 8);
  out.writeUInt32BE(data.length, 0);
  body.copy(out, 4);
  out.writeUInt32BE(crc32(body), body.length + 4);
  return out;
}

/** A PNG written by hand from the specification: IHDR, one unfiltered IDAT, IEND; samples big-endian. */
function png(width: number, height: number, depth: number, colorType: number, samples: number[]): Buffer {
  const header = Buffer.alloc(13);
  header.writeUInt32BE(width, 0);
  header.writeUInt32BE(height, 4);
  header[8] = depth;
  header[9] = colorType;
  const bytesPerSample = depth / 8;
  const channels = colorType === 0 ? 1 : colorType === 2 ? 3 : colorType === 4 ? 2 : 4;
  const rowBytes = width * channels * bytesPerSample;
  const raw = Buffer.alloc(height * (rowBytes + 1));
  samples.forEach((s, i) => {
    const row = Math.floor(i / (width * channels));
    const at = row * (rowBytes + 1) + 1 + (i % (width * channels)) * bytesPerSample;
    if (bytesPerSample === 2) raw.writeUInt16BE(s, at);
    else raw[at] = s;
  });
  return Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), chunk('IHDR', header), chunk('IDAT', deflateSync(raw)), chunk('IEND', new Uint8Array(0))]);
}

describe('CSV phase maps', () => {
  it('reads a grid with the first line as the top row, centred by default', () => {
    const result = parsePhaseCsv('# comment\n0, 0.25, 0.5\n0.75;1;1.25\n', { pitchX: 2, unit: 'waves' });
    if (!result.ok) throw new Error(result.error);
    const m = result.map;
    expect([m.columns, m.rows, m.pitchX, m.pitchY, m.originX, m.originY]).toEqual([3, 2, 2, 2, -2, -1]);
    // bottom row (j = 0) is the last line of the file
    expect(Array.from(m.values)).toEqual([0.75, 1, 1.25, 0, 0.25, 0.5].map((w) => w * 2 * Math.PI));
  });
  it('accepts tabs and spaces, degrees, and an explicit origin', () => {
    const result = parsePhaseCsv('90\t180\n0 360\n', { pitchX: 1, pitchY: 3, originX: 5, originY: 6, unit: 'deg' });
    expect(result.ok && [result.map.originX, result.map.originY, result.map.pitchY, result.map.values[3]]).toEqual([5, 6, 3, Math.PI]);
  });
  it.each([
    ['1,2\n3\n', /line 2 has 1 values but the first row has 2/],
    ['1,x\n3,4\n', /line 1, value 2: "x" is not a number/],
    ['1,,2\n3,4,5\n', /is not a number/],
    ['', /holds no numbers/],
    ['1,2\n', /at least 2 × 2 samples/],
    ['1,Infinity\n1,2\n', /not a number/],
  ])('refuses %j', (text, message) => {
    const result = parsePhaseCsv(text, { pitchX: 1, unit: 'rad' });
    expect(result.ok).toBe(false);
    expect(!result.ok && result.error).toMatch(message);
  });
  it('refuses bad pitches and oversized grids', () => {
    expect(parsePhaseCsv('1,2\n3,4\n', { pitchX: 0, unit: 'rad' })).toEqual({ ok: false, error: 'the pitch along x must be a positive number of µm' });
    expect(parsePhaseCsv('1,2\n3,4\n', { pitchX: 5000, unit: 'rad' }).ok).toBe(false);
    const wide = Array(PHASE_MAP_LIMITS.maxColumns + 1).fill('0').join(',');
    expect(parsePhaseCsv(`${wide}\n${wide}\n`, { pitchX: 1, unit: 'rad' })).toMatchObject({ ok: false, error: expect.stringMatching(/at most 4096 × 4096/) });
  });
});

describe('16-bit grayscale PNG phase maps', () => {
  it('maps gray values to phase with the full scale 65536 = phaseRange', () => {
    const result = parsePhasePng(png(2, 2, 16, 0, [0, 16384, 32768, 65535]), { pitchX: 4 });
    if (!result.ok) throw new Error(result.error);
    const m = result.map;
    expect([m.columns, m.rows, m.originX, m.originY]).toEqual([2, 2, -2, -2]);
    // bottom row first: the second image row (32768, 65535), then the top (0, 16384)
    const expected = [32768, 65535, 0, 16384].map((g) => (g / 65536) * 2 * Math.PI);
    Array.from(m.values).forEach((v, i) => expect(v).toBeCloseTo(expected[i], 12));
    const half = parsePhasePng(png(2, 2, 16, 0, [0, 0, 0, 32768]), { pitchX: 1, phaseRange: Math.PI });
    expect(half.ok && half.map.values[1]).toBeCloseTo(Math.PI / 2, 12);
  });
  it.each([
    ['8-bit grayscale', png(2, 2, 8, 0, [0, 1, 2, 3]), /8-bit grayscale; a phase map must be 16-bit grayscale/],
    ['colour', png(2, 2, 8, 2, Array(12).fill(0)), /colour/],
    ['grayscale with alpha', png(2, 2, 16, 4, Array(8).fill(0)), /grayscale with alpha/],
    ['not a PNG', Buffer.from('hello, this is not an image at all, really'), /not a PNG/],
  ])('refuses %s', (_name, bytes, message) => {
    const result = parsePhasePng(bytes, { pitchX: 1 });
    expect(!result.ok && result.error).toMatch(message);
  });
  it('refuses a damaged or huge image before decoding it', () => {
    const good = png(3, 3, 16, 0, Array(9).fill(100));
    const damaged = Buffer.from(good);
    damaged[damaged.length - 20] ^= 0xff;
    expect(parsePhasePng(damaged, { pitchX: 1 }).ok).toBe(false);
    const huge = Buffer.from(good);
    huge.writeUInt32BE(100000, 16);
    expect(parsePhasePng(huge, { pitchX: 1 })).toMatchObject({ ok: false, error: expect.stringMatching(/100000 × 3 pixels/) });
  });
});
