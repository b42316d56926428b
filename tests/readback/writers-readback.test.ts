import { execFileSync } from 'node:child_process';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { writeGdsii } from '@/lib/gdsii';
import type { LayoutLibrary } from '@/lib/layout/types';
import { writeOasis } from '@/lib/oasis';
import { handBuiltLibrary, transformedPlacementsLibrary } from '../unit/writers/fixtures';
import { gdspySummary, klayoutCompare, scratchDirectory, writeScratch } from './tools';

// Areas of the hand-built library worked by hand: UNIT holds a 4×2 rectangle (8 µm²), a triangle of base 3 and
// height 2.5 (3.75 µm²) and an L of 6×1 + 1×4 (10 µm²) on 1/0, a right triangle of legs 2 (2 µm²) on 10/0.
// TOP places UNIT once plainly, once rotated and as a 3×2 array (8 instances) and adds a 10×10 square on 1/0.
const ZONE_AREA = 8 * (8 + 3.75 + 10) + 100;
const LABEL_AREA = 8 * 2;

describe('hand-built library read back by gdspy and KLayout', () => {
  const directory = scratchDirectory();
  const library = handBuiltLibrary();
  const gds = writeScratch(directory, 'hand.gds', writeGdsii(library));
  const oas = writeScratch(directory, 'hand.oas', writeOasis(library));
  const oasCompressed = writeScratch(directory, 'hand-cblock.oas', writeOasis(library, { compress: true }));

  it('gdspy sees the units, cells, layers, polygon counts, vertex counts and areas', () => {
    // gdspy (Debian python3-gdspy), a general-purpose GDSII library
    const summary = gdspySummary(gds);
    expect(summary.name).toBe('HANDBUILT');
    expect(summary.unit).toBeCloseTo(1e-6, 15);
    expect(summary.precision).toBeCloseTo(1e-9, 18);
    expect(summary.cells).toEqual(['TOP', 'UNIT']);
    expect(summary.tops).toEqual(['TOP']);
    expect(summary.layers['1/0'].polygons).toBe(8 * 3 + 1);
    expect(summary.layers['1/0'].maxVertices).toBe(6);
    expect(summary.layers['1/0'].area).toBeCloseTo(ZONE_AREA, 9);
    expect(summary.layers['10/0'].area).toBeCloseTo(LABEL_AREA, 9);
    expect(summary.labels).toEqual(Array(8).fill('unit cell'));
  });

  it.each([
    ['plain', oas],
    ['CBLOCK-compressed', oasCompressed],
  ])('KLayout reads the %s OASIS file with the same area per layer as the GDSII file and an empty XOR', (_, file) => {
    // KLayout (Debian klayout), a general-purpose layout reader, in batch mode
    const comparison = klayoutCompare(gds, file);
    expect(comparison.oasTop).toBe('TOP');
    expect(comparison.oasDbu).toBeCloseTo(0.001, 12);
    expect(comparison.cells).toEqual(['TOP', 'UNIT']);
    expect(Object.keys(comparison.layers)).toEqual(['1/0', '10/0']);
    expect(comparison.layers['1/0'].oasArea).toBeCloseTo(ZONE_AREA, 9);
    expect(comparison.layers['10/0'].oasArea).toBeCloseTo(LABEL_AREA, 9);
    for (const layer of Object.values(comparison.layers)) {
      expect(layer.oasArea).toBe(layer.gdsArea);
      expect(layer.oasPolygons).toBe(layer.gdsPolygons);
      expect(layer.xorEmpty).toBe(true);
    }
    expect(comparison.oasTexts).toEqual(comparison.gdsTexts);
  });

  it('ends the OASIS file with a 256-byte END whose CRC32 matches zlib', () => {
    // SEMI P39: END is 256 bytes; validation scheme 1 = CRC32 over the file up to the scheme byte, signature
    // stored least significant byte first (from memory). zlib.crc32 in Debian's python is the outside reference.
    for (const file of [oas, oasCompressed]) {
      const check = execFileSync(
        '/usr/bin/python3',
        ['-c', 'import sys, zlib; b = open(sys.argv[1], "rb").read(); print(zlib.crc32(b[:-4]) == int.from_bytes(b[-4:], "little"), b[:13] == b"%SEMI-OASIS\\r\\n", b[-256], b[-5])', file],
        { encoding: 'utf8' },
      ).trim();
      expect(check).toBe('True True 2 1');
    }
  });
});

describe('placements with reflection, rotation and every array form', () => {
  it('gdspy and KLayout expand the same 11 instances from GDSII, and OASIS repetitions match them (empty XOR)', () => {
    // OASIS repetition types 3 (one column), 9 (one arbitrary vector) and 8 (two arbitrary vectors), and a reflected
    // and rotated placement, against GDSII SREF/AREF with STRANS and ANGLE
    const library = transformedPlacementsLibrary();
    const directory = scratchDirectory();
    const gds = writeScratch(directory, 'placements.gds', writeGdsii(library));
    const summary = gdspySummary(gds);
    expect(summary.layers["1/0"].polygons).toBe(33);
    expect(summary.layers['1/0'].area).toBeCloseTo(11 * (8 + 3.75 + 10), 9);
    const comparison = klayoutCompare(gds, writeScratch(directory, 'placements.oas', writeOasis(library)));
    for (const layer of Object.values(comparison.layers)) {
      expect(layer.xorEmpty).toBe(true);
      expect(layer.oasPolygons).toBe(layer.gdsPolygons);
    }
    expect(comparison.layers['1/0'].gdsArea).toBeCloseTo(11 * (8 + 3.75 + 10), 9);
  });
});

describe('random boundaries through OASIS and GDSII agree in KLayout', () => {
  it('an empty XOR on every layer for 300 random polygons (property, one file)', () => {
    const coordinate = fc.integer({ min: -1_000_000, max: 1_000_000 });
    const triangle = fc.tuple(coordinate, coordinate, coordinate, coordinate, coordinate, coordinate);
    const rectangle = fc.tuple(coordinate, coordinate, fc.integer({ min: 1, max: 50_000 }), fc.integer({ min: 1, max: 50_000 }));
    const [triangles, rectangles] = fc.sample(fc.tuple(fc.array(triangle, { minLength: 150, maxLength: 150 }), fc.array(rectangle, { minLength: 150, maxLength: 150 })), 1)[0];
    const library: LayoutLibrary = {
      name: 'RANDOM',
      databaseUnit: 1e-9,
      userUnit: 1e-6,
      layers: [],
      cells: [
        {
          name: 'TOP',
          shapes: [
            // zero-area triangles are not polygons any reader keeps; keep the proper ones
            { layer: 2, datatype: 0, polygons: triangles.filter(isProperTriangle).map((t) => Int32Array.from(t)) },
            { layer: 3, datatype: 1, polygons: rectangles.map(([x, y, w, h]) => Int32Array.from([x, y, x + w, y, x + w, y + h, x, y + h])) },
          ],
          texts: [],
          placements: [],
        },
      ],
      topCell: 'TOP',
    };
    const directory = scratchDirectory();
    const comparison = klayoutCompare(writeScratch(directory, 'r.gds', writeGdsii(library)), writeScratch(directory, 'r.oas', writeOasis(library, { compress: true })));
    expect(Object.keys(comparison.layers)).toEqual(['2/0', '3/1']);
    for (const layer of Object.values(comparison.layers)) {
      expect(layer.gdsArea).toBeGreaterThan(0);
      expect(layer.xorEmpty).toBe(true);
    }
  });
});

function isProperTriangle([ax, ay, bx, by, cx, cy]: number[]): boolean {
  return (bx - ax) * (cy - ay) - (by - ay) * (cx - ax) !== 0;
}
