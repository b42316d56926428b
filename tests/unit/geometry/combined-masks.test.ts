import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import type { CompiledDesign } from '@/lib/design/types';
import { buildMask, GeometryError } from '@/lib/geometry';
import { compileScript } from '@/lib/lang';
import { area, drawnTester, rng, selfIntersects, unionArea, zonePolygons } from './checks';

/** Whole masks of combined fields: clean polygons, and the contract's binary test at random points. */

const dir = path.resolve(__dirname, '../../../examples');
const combinations = readdirSync(dir).filter((f) => f.endsWith('.zw') && /superpose\(/.test(readFileSync(path.join(dir, f), 'utf8')));

function compiled(source: string): CompiledDesign {
  const result = compileScript(source);
  if (!result.ok) throw new Error(result.diagnostics.map((d) => d.message).join('; '));
  return result.design;
}

/** Closed (at least three vertices, positive area), simple and non-overlapping. */
function expectClean(polygons: Int32Array[]) {
  expect(polygons.length).toBeGreaterThan(0);
  for (const p of polygons) {
    expect(p.length).toBeGreaterThanOrEqual(6);
    expect(area(p)).toBeGreaterThan(0);
    expect(selfIntersects(p)).toBe(false);
  }
  const sum = polygons.reduce((s, p) => s + area(p), 0);
  expect(Math.abs(unionArea(polygons) - sum)).toBeLessThanOrEqual(1e-9 * sum + 1);
}

/**
 * Points inside a circular aperture where the mask disagrees with the contract's binary test
 * Re(u·e^(−iφ0)) > cos(π·d)·|u| (lib/design/types.ts), skipping points within 2 % of a period of an edge.
 * `field` is the design's own unless given.
 */
function disagreements(design: CompiledDesign, polygons: Int32Array[], count: number, seed: number, field: (x: number, y: number, out: Float64Array) => void = design.pieces[0].field.field): number {
  const q = design.quantization;
  if (q.kind !== 'binary' || design.aperture.kind !== 'circle') throw new Error('binary designs on a disc only');
  const { cx, cy, r } = design.aperture;
  const out = new Float64Array(2);
  const sign = q.tone === 'negative' ? -1 : 1;
  const rule = (x: number, y: number) => {
    field(x, y, out);
    return sign * (out[0] * Math.cos(q.phaseOffset) + out[1] * Math.sin(q.phaseOffset) - Math.cos(Math.PI * q.duty) * Math.hypot(out[0], out[1]));
  };
  const drawn = drawnTester(polygons);
  const random = rng(seed);
  let wrong = 0;
  for (let k = 0; k < count; k++) {
    const x = cx + r * (2 * random() - 1);
    const y = cy + r * (2 * random() - 1);
    if (Math.hypot(x - cx, y - cy) > r - 0.05) continue;
    const m = rule(x, y);
    const slope = Math.hypot(rule(x + 1e-4, y) - m, rule(x, y + 1e-4) - m) / 1e-4;
    if (!(Math.abs(m) > 0.02 * slope)) continue;
    if (drawn(x, y) !== m > 0) wrong++;
  }
  return wrong;
}

describe('masks of combined fields', () => {
  it('the examples include a combination', () => {
    expect(combinations).toContain('two-focus-offaxis.zw');
  });

  it.each(combinations)('%s builds into clean polygons; with 10 µm seed lines it matches the contract at 4000 points', (name) => {
    const design = compiled(readFileSync(path.join(dir, name), 'utf8'));
    expectClean(zonePolygons(buildMask(design, { chordTolerance: 0.005 }).library));
    // Islands around critical points of arg u can fit between 50 µm seed lines (DEVELOPERS.md, Mask
    // geometry); at 10 µm none of this example's are lost (measured: 382 polygons at 50 µm, 519 at 10 µm).
    const fine = zonePolygons(buildMask(design, { chordTolerance: 0.005, seedSpacing: 10 }).library);
    expectClean(fine);
    expect(disagreements(design, fine, 4000, 17)).toBe(0);
  });

  it('three lenses whose field has isolated zeros: closed boundaries the finer scan finds near the zeros are traced once, so the polygons stay simple', () => {
    const design = compiled(`wavelength 405 nm
aperture circle(diameter: 300 um)
profile superpose(wave(lens(focal: 600 um, centre: (-20 um, 0 um)), weight: 0.4), wave(lens(focal: 900 um, centre: (30 um, 10 um)), weight: 0.35), wave(lens(focal: 700 um, centre: (0 um, 40 um)), weight: 0.25))
quantize binary(duty: 0.5)
`);
    expectClean(zonePolygons(buildMask(design, { chordTolerance: 0.005 }).library));
  });

  /** The two-focus example's lenses, both as `lens` so the test can write their phases down. */
  const twoLenses = (weights: string, quantize: string) => `wavelength 405 nm
aperture circle(diameter: 460 um)
profile superpose(wave(lens(focal: 800 um, centre: (-40 um, 0 um)), weight: ${weights.split('/')[0]}), wave(lens(focal: 1.2 mm, centre: (60 um, 25 um)), weight: ${weights.split('/')[1]}))
quantize ${quantize}
`;

  it('two off-axis lenses of equal weight, binary at duty ½: the field vanishes along lines, and the mask still matches the exact equal-weight sum', { timeout: 300_000 }, () => {
    const design = compiled(twoLenses('1/1', 'binary(duty: 0.5)'));
    const polygons = zonePolygons(buildMask(design, { chordTolerance: 0.005, seedSpacing: 10 }).library);
    expectClean(polygons);
    // u = e^(iφ1) + e^(iφ2) with the exact lens phase φ = −(2π/λ)(√(ρ² + f²) − f) (textbook optics,
    // from memory), written here rather than taken from the compiled design, which draws the second
    // weight 1e-4 lower (lib/lang/eval/distinct-weights.ts)
    const k = (2 * Math.PI) / 0.405;
    const phase = (x: number, y: number, x0: number, y0: number, f: number) => -k * (Math.sqrt((x - x0) ** 2 + (y - y0) ** 2 + f * f) - f);
    const exactSum = (x: number, y: number, out: Float64Array) => {
      const a = phase(x, y, -40, 0, 800);
      const b = phase(x, y, 60, 25, 1200);
      out[0] = Math.cos(a) + Math.cos(b);
      out[1] = Math.sin(a) + Math.sin(b);
    };
    expect(disagreements(design, polygons, 4000, 23, exactSum)).toBe(0);
  });

  it('two lenses of weights 0.6/0.4 at duty 0.3 give clean polygons that match the contract (a loop thinner than the grid is dropped, not turned over)', { timeout: 300_000 }, () => {
    const design = compiled(twoLenses('0.6/0.4', 'binary(duty: 0.3)'));
    const polygons = zonePolygons(buildMask(design, { chordTolerance: 0.005, seedSpacing: 10 }).library);
    expectClean(polygons);
    expect(disagreements(design, polygons, 4000, 29)).toBe(0);
  });

  it('says what to change when nearly cancelling waves crowd the zone edges of another duty', () => {
    const design = compiled(twoLenses('0.5/0.5', 'binary(duty: 0.3)'));
    const failure = (() => {
      try {
        buildMask(design, { chordTolerance: 0.005 });
      } catch (error) {
        return error;
      }
    })();
    expect(failure).toBeInstanceOf(GeometryError);
    expect((failure as Error).message).toMatch(/Make the weights differ by 10 % or more, or quantize with binary\(duty: 0\.5\)/);
  });
});

