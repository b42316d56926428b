import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { xorLayers } from '@/lib/geometry';
import type { LayoutLibrary } from '@/lib/layout/types';
import { clipToBox } from '@/lib/workflow/clip-to-box';
import { tiledXor, tilesPerSide } from '@/lib/workflow/tiled-xor';

// Shoelace formula for the area of a simple polygon (from memory).
function area(p: Int32Array): number {
  let s = 0;
  for (let i = 0; i < p.length; i += 2) {
    const j = (i + 2) % p.length;
    s += p[i] * p[j + 1] - p[j] * p[i + 1];
  }
  return Math.abs(s) / 2;
}

/** Hole-free half annuli of a binary zone plate, r_n = sqrt(nλf) (standard zone-plate construction, from memory), 1 nm grid. */
function zonePlate(focalUm: number, apertureUm: number): LayoutLibrary {
  const polygons: Int32Array[] = [];
  for (let n = 1; ; n += 2) {
    const r0 = Math.sqrt(n * 0.405 * focalUm);
    const r1 = Math.sqrt((n + 1) * 0.405 * focalUm);
    if (r1 > apertureUm / 2) break;
    for (const side of [0, 1]) {
      const pts: number[] = [];
      for (let i = 0; i <= 48; i++) pts.push(Math.round(r1 * 1000 * Math.cos(Math.PI * (side + i / 48))), Math.round(r1 * 1000 * Math.sin(Math.PI * (side + i / 48))));
      for (let i = 48; i >= 0; i--) pts.push(Math.round(r0 * 1000 * Math.cos(Math.PI * (side + i / 48))), Math.round(r0 * 1000 * Math.sin(Math.PI * (side + i / 48))));
      polygons.push(Int32Array.from(pts));
    }
  }
  return {
    name: 'T',
    databaseUnit: 1e-9,
    userUnit: 1e-6,
    layers: [],
    cells: [{ name: 'TOP', shapes: [{ layer: 1, datatype: 0, polygons }], texts: [], placements: [] }],
    topCell: 'TOP',
  };
}

describe('clipToBox', () => {
  it('keeps the part of a rectangle inside the box', () => {
    const square = Int32Array.from([0, 0, 10, 0, 10, 10, 0, 10]);
    expect(area(clipToBox(square, { x0: 5, y0: -5, x1: 20, y1: 5 })!)).toBe(25);
    expect(clipToBox(square, { x0: 20, y0: 20, x1: 30, y1: 30 })).toBeNull();
  });

  it('never gives more area than the polygon or the box, and the quarters add up to the whole', () => {
    const point = fc.tuple(fc.integer({ min: -100, max: 100 }), fc.integer({ min: -100, max: 100 }));
    fc.assert(
      fc.property(fc.array(point, { minLength: 3, maxLength: 3 }), (pts) => {
        const triangle = Int32Array.from(pts.flat());
        const whole = area(triangle);
        const quarters = [
          { x0: -100, y0: -100, x1: 0, y1: 0 },
          { x0: 0, y0: -100, x1: 100, y1: 0 },
          { x0: -100, y0: 0, x1: 0, y1: 100 },
          { x0: 0, y0: 0, x1: 100, y1: 100 },
        ].map((b) => clipToBox(triangle, b));
        const sum = quarters.reduce((s, q) => s + (q ? area(q) : 0), 0);
        // crossing points are rounded to the grid: allow one unit per cut edge
        expect(Math.abs(sum - whole)).toBeLessThanOrEqual(4 * 100);
        for (const q of quarters) if (q) expect(area(q)).toBeLessThanOrEqual(whole + 100);
      }),
    );
  });
});

describe('tiledXor', () => {
  it('gives the same added and removed areas as one untiled XOR of two zone plates', () => {
    const a = zonePlate(800, 200);
    const b = zonePlate(900, 200);
    const whole = xorLayers(a, b).perLayer[0];
    const tiled = tiledXor(a, b, 6)[0];
    expect(whole.addedArea).toBeGreaterThan(100);
    expect(tiled.addedArea).toBeCloseTo(whole.addedArea, 1);
    expect(tiled.removedArea).toBeCloseTo(whole.removedArea, 1);
  });

  it('skips identical tiles and finds nothing between identical masks', () => {
    const a = zonePlate(800, 200);
    expect(tiledXor(a, zonePlate(800, 200), 6)[0]).toMatchObject({ addedArea: 0, removedArea: 0, added: [], removed: [] });
  });

  it('compares small masks in one pass and large ones on at most 16 × 16 boxes', () => {
    expect(tilesPerSide(3000)).toBe(1);
    expect(tilesPerSide(520_000)).toBe(16);
    expect(tilesPerSide(10_000_000)).toBe(16);
  });
});
