import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { readGdsii, writeGdsii, gdsiiChunks } from '@/lib/gdsii';
import type { LayoutLibrary } from '@/lib/layout/types';
import { handBuiltLibrary } from './fixtures';

const fixedDate = new Date(Date.UTC(2026, 11, 1, 22, 30, 5));
const hex = (bytes: Uint8Array) => Buffer.from(bytes).toString('hex');

/** Splits a file into [length, recordType, dataType] triples, checking the framing on the way. */
function frames(bytes: Uint8Array): Array<[number, number, number]> {
  const out: Array<[number, number, number]> = [];
  for (let offset = 0; offset < bytes.length; ) {
    const length = (bytes[offset] << 8) | bytes[offset + 1];
    out.push([length, bytes[offset + 2], bytes[offset + 3]]);
    offset += length;
  }
  return out;
}

function oneTriangle(): LayoutLibrary {
  return {
    name: 'ABC',
    databaseUnit: 1e-9,
    userUnit: 1e-6,
    layers: [{ layer: 1, datatype: 0, name: 'zones', purpose: 'zones' }],
    cells: [{ name: 'TOP', shapes: [{ layer: 1, datatype: 0, polygons: [Int32Array.from([0, 0, 1000, 0, 0, 1000])] }], texts: [], placements: [] }],
    topCell: 'TOP',
  };
}

// Record framing per the GDSII Stream Format Manual, release 6.0: a 2-byte length counting the 4-byte header,
// a record-type byte and a data-type byte, big-endian; HEADER 0x0002, BGNLIB 0x0102, LIBNAME 0x0206, UNITS 0x0305,
// BGNSTR 0x0502, STRNAME 0x0606, BOUNDARY 0x0800, LAYER 0x0D02, DATATYPE 0x0E02, XY 0x1003, ENDEL 0x1100,
// ENDSTR 0x0700, ENDLIB 0x0400.
describe('GDSII record framing', () => {
  const bytes = writeGdsii(oneTriangle(), { timestamp: fixedDate });

  it('starts with HEADER version 600 and ends with ENDLIB', () => {
    // HEADER: length 6, type 0x00, int16 0x02, value 600 = 0x0258
    expect(hex(bytes.subarray(0, 6))).toBe('000600020258');
    expect(hex(bytes.subarray(bytes.length - 4))).toBe('00040400');
  });

  it('writes BGNLIB with the modification and access dates as 12 int16 words', () => {
    // BGNLIB: length 4 + 24 = 28 = 0x1C, 0x0102; 2026 = 0x07EA, month 12, day 1, 22:30:05
    expect(hex(bytes.subarray(6, 6 + 16))).toBe('001c0102' + '07ea000c00010016001e0005');
  });

  it('pads an odd-length LIBNAME with a NUL to an even length', () => {
    // "ABC" + NUL: length 4 + 4 = 8, 0x0206
    expect(hex(bytes.subarray(34, 42))).toBe('0008020641424300');
  });

  it('writes UNITS as two 8-byte reals: 0.001 user units and 1e-9 m per database unit', () => {
    expect(hex(bytes.subarray(42, 46))).toBe('00140305');
    expect(hex(bytes.subarray(46, 54))).toBe('3e4189374bc6a7f0');
  });

  it('closes a BOUNDARY by repeating its first point (3 points written as 4)', () => {
    const sequence = frames(bytes).map(([length, type, data]) => `${type.toString(16)}:${data}:${length}`);
    expect(sequence).toEqual([
      '0:2:6', '1:2:28', '2:6:8', '3:5:20',
      '5:2:28', '6:6:8',
      '8:0:4', 'd:2:6', 'e:2:6', '10:3:36', '11:0:4',
      '7:0:4', '4:0:4',
    ]);
    // the XY payload: (0,0) (1000,0) (0,1000) (0,0) as big-endian int32
    const xyStart = bytes.indexOf(0x10, 100) - 2;
    expect(hex(bytes.subarray(xyStart, xyStart + 36))).toBe(
      '00241003' + '0000000000000000' + '000003e800000000' + '00000000000003e8' + '0000000000000000',
    );
  });

  it('gives every record an even length', () => {
    const library = handBuiltLibrary();
    for (const [length] of frames(writeGdsii(library, { timestamp: fixedDate }))) expect(length % 2).toBe(0);
  });

  it('streams the same bytes in small chunks as in one piece', () => {
    const library = handBuiltLibrary();
    const chunks = [...gdsiiChunks(library, { timestamp: fixedDate, chunkBytes: 64 })];
    expect(chunks.length).toBeGreaterThan(3);
    expect(Buffer.concat(chunks)).toEqual(Buffer.from(writeGdsii(library, { timestamp: fixedDate })));
  });

  it('refuses a polygon too long for one XY record, and a placement of an unknown cell', () => {
    const tooLong = oneTriangle();
    tooLong.cells[0].shapes[0].polygons = [new Int32Array(2 * 8191).map((_, i) => (i % 2 ? Math.floor(i / 2) % 2 : i))];
    expect(() => writeGdsii(tooLong)).toThrow(/exceeds GDSII's 8190-point limit/);
    const dangling = oneTriangle();
    dangling.cells[0].placements.push({ cell: 'NOPE', x: 0, y: 0 });
    expect(() => writeGdsii(dangling)).toThrow(/unknown cell "NOPE"/);
    const looped = handBuiltLibrary();
    looped.cells[0].placements.push({ cell: 'TOP', x: 0, y: 0 });
    expect(() => writeGdsii(looped)).toThrow(/place each other in a loop: UNIT → TOP → UNIT|TOP → UNIT → TOP/);
  });
});

describe('GDSII write → read', () => {
  it('reads back the hand-built library: cells, polygons, texts, SREF, AREF with rotation', () => {
    const library = handBuiltLibrary();
    const back = readGdsii(writeGdsii(library));
    expect(back.name).toBe('HANDBUILT');
    expect(back.databaseUnit).toBe(1e-9);
    expect(back.userUnit).toBeCloseTo(1e-6, 18);
    expect(back.topCell).toBe('TOP');
    expect(back.cells.map((c) => c.name)).toEqual(['UNIT', 'TOP']);
    expect(back.cells[0].shapes).toEqual(library.cells[0].shapes);
    expect(back.cells[0].texts).toEqual(library.cells[0].texts);
    expect(back.cells[1].placements).toEqual(library.cells[1].placements);
  });

  it('keeps random boundaries unchanged (property)', () => {
    const coordinate = fc.integer({ min: -2_000_000_000, max: 2_000_000_000 });
    const polygon = fc.array(fc.tuple(coordinate, coordinate), { minLength: 3, maxLength: 300 }).map((points) => Int32Array.from(points.flat()));
    fc.assert(
      fc.property(fc.array(polygon, { minLength: 1, maxLength: 20 }), fc.integer({ min: 0, max: 255 }), (polygons, layer) => {
        const library = oneTriangle();
        library.cells[0].shapes = [{ layer, datatype: 3, polygons }];
        const back = readGdsii(writeGdsii(library));
        expect(back.cells[0].shapes).toEqual([{ layer, datatype: 3, polygons }]);
      }),
      { numRuns: 100 },
    );
  });
});
