import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { buildMask } from '@/lib/geometry';
import type { Region } from '@/lib/design/types';
import { area, drawnTester, rng, selfIntersects, unionArea, zonePolygons } from './checks';
import { binary, design, lensField } from './fixtures';

const apertures: fc.Arbitrary<Region> = fc.oneof(
  fc.record({ kind: fc.constant('circle' as const), cx: fc.double({ min: -20, max: 20, noNaN: true }), cy: fc.double({ min: -20, max: 20, noNaN: true }), r: fc.double({ min: 30, max: 80, noNaN: true }) }),
  fc.record({ kind: fc.constant('rectangle' as const), x0: fc.double({ min: -80, max: -30, noNaN: true }), y0: fc.double({ min: -80, max: -30, noNaN: true }), x1: fc.double({ min: 30, max: 80, noNaN: true }), y1: fc.double({ min: 30, max: 80, noNaN: true }) }),
  fc.record({ kind: fc.constant('ring' as const), cx: fc.constant(0), cy: fc.constant(0), rInner: fc.double({ min: 5, max: 25, noNaN: true }), rOuter: fc.double({ min: 40, max: 80, noNaN: true }) }),
);

const cases = fc.record({
  wavelength: fc.double({ min: 0.4, max: 0.7, noNaN: true }),
  focal: fc.double({ min: 150, max: 1500, noNaN: true }),
  x0: fc.double({ min: -60, max: 60, noNaN: true }),
  y0: fc.double({ min: -60, max: 60, noNaN: true }),
  duty: fc.double({ min: 0.3, max: 0.7, noNaN: true }),
  offset: fc.double({ min: -Math.PI, max: Math.PI, noNaN: true }),
  negative: fc.boolean(),
  maxVertices: fc.integer({ min: 199, max: 500 }),
  aperture: apertures,
  seed: fc.integer({ min: 1, max: 1e9 }),
});

describe('mask polygons for random lenses and apertures', () => {
  it('are simple, counter-clockwise, within the vertex cap, hole-free, non-overlapping, and match the quantization rule', () => {
    fc.assert(
      fc.property(cases, (c) => {
        const field = lensField(c.wavelength, c.focal, c.x0, c.y0);
        const d = design(field, c.aperture, binary(c.duty, c.offset, c.negative ? 'negative' : 'positive'), { wavelength: c.wavelength, foci: [{ x: c.x0, y: c.y0, z: c.focal, weight: 1 }] });
        const { library, report } = buildMask(d, { maxVertices: c.maxVertices });
        const polygons = zonePolygons(library);
        for (const p of polygons) {
          expect(p.length / 2).toBeLessThanOrEqual(c.maxVertices);
          expect(area(p)).toBeGreaterThan(0);
          expect(selfIntersects(p)).toBe(false);
        }
        // pieces tile the drawn region: no overlaps and no polygon standing for a hole
        const sum = polygons.reduce((s, p) => s + area(p), 0);
        expect(Math.abs(unionArea(polygons) - sum)).toBeLessThanOrEqual(1e-9 * sum + 1);
        expect(report.vertexCount).toBe(polygons.reduce((s, p) => s + p.length / 2, 0));
        // the contract's rule: s = 1 where cos(φ − φ0) > cos(π·duty); drawn = s (positive) or 1 − s (negative)
        const drawn = drawnTester(polygons);
        const random = rng(c.seed);
        const inAperture = (x: number, y: number) =>
          c.aperture.kind === 'circle'
            ? Math.hypot(x - c.aperture.cx, y - c.aperture.cy) < c.aperture.r - 0.01
            : c.aperture.kind === 'ring'
              ? Math.hypot(x, y) < c.aperture.rOuter - 0.01 && Math.hypot(x, y) > c.aperture.rInner + 0.01
              : c.aperture.kind === 'rectangle' && x > c.aperture.x0 + 0.01 && x < c.aperture.x1 - 0.01 && y > c.aperture.y0 + 0.01 && y < c.aperture.y1 - 0.01;
        let checked = 0;
        for (let k = 0; k < 1000; k++) {
          const x = -80 + 160 * random();
          const y = -80 + 160 * random();
          if (!inAperture(x, y)) continue;
          const rule = (u: number, v: number) => Math.cos(field.phase(u, v) - c.offset) - Math.cos(Math.PI * c.duty);
          const margin = rule(x, y);
          const slope = Math.hypot(rule(x + 1e-4, y) - margin, rule(x, y + 1e-4) - margin) / 1e-4;
          if (Math.abs(margin) < 0.02 * slope) continue; // within 20 nm of an edge: chord tolerance and grid

          expect(drawn(x, y)).toBe(margin > 0 !== c.negative);
          checked++;
        }
        expect(checked).toBeGreaterThan(30);
      }),
      { numRuns: 10, seed: 20261201, endOnFailure: true },
    );
  });
});
