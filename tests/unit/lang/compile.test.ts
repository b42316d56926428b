import { describe, expect, it } from 'vitest';
import { compileScript, regionContains } from '@/lib/lang';
import type { Region } from '@/lib/design/types';
import { compiled, script } from './helpers';

/** Deterministic points over a square, for area checks. */
function* grid(half: number, step: number): Generator<[number, number]> {
  for (let y = -half + step / 2; y < half; y += step) for (let x = -half + step / 2; x < half; x += step) yield [x, y];
}

function expectTiling(aperture: Region, regions: Region[]): void {
  let inside = 0;
  for (const [x, y] of grid(240, 3.7)) {
    const owners = regions.filter((r) => regionContains(r, x, y)).length;
    if (regionContains(aperture, x, y)) {
      inside++;
      expect(owners, `point ${x}, ${y}`).toBe(1);
    } else expect(owners).toBe(0);
  }
  expect(inside).toBeGreaterThan(1000);
}

describe('spatial multiplexing', () => {
  it('sectors give one piece per part, tiling the aperture without overlap', () => {
    const design = compiled(script('sectors(lens(focal: 1 mm), lens(focal: 1.4 mm), lens(focal: 2 mm), count: 9)'));
    expect(design.pieces).toHaveLength(3);
    expectTiling(design.aperture, design.pieces.map((p) => p.region!));
    expect(design.foci.map((f) => f.z)).toEqual([1000, 1400, 2000]);
    expect(design.symmetryCentre).toBeNull();
    // each piece carries its own lens
    const [a, b] = design.pieces;
    expect(a.field.phase(100, 0)).not.toBeCloseTo(b.field.phase(100, 0), 3);
  });

  it('stripes tile a ring aperture, at any direction', () => {
    const design = compiled(script('stripes(lens(focal: 1 mm), grating(period: 5 um), period: 17 um, direction: 30 deg)', '', 'ring(inner: 30 um, outer: 220 um)'));
    expect(design.pieces).toHaveLength(2);
    expectTiling(design.aperture, design.pieces.map((p) => p.region!));
  });

  it('refuses stripes too fine to draw', () => {
    const result = compileScript(script('stripes(lens(focal: 1 mm), lens(focal: 2 mm), period: 1 nm)'));
    expect(result.ok).toBe(false);
    expect(result.diagnostics[0].message).toMatch(/stripes; at most/);
  });
});

describe('symmetry centre', () => {
  const centreOf = (profile: string, aperture?: string): unknown => compiled(script(profile, '', aperture)).symmetryCentre;
  it('is set for on-axis lenses, axicons and radial expressions in a centred disc or ring', () => {
    expect(centreOf('lens(focal: 1 mm)')).toEqual({ x: 0, y: 0 });
    expect(centreOf('axicon(angle: 1 deg)', 'ring(inner: 10 um, outer: 200 um)')).toEqual({ x: 0, y: 0 });
    expect(centreOf('superpose(lens(focal: 1 mm), wave(paraxial_lens(focal: 2 mm), weight: 0.5))')).toEqual({ x: 0, y: 0 });
    expect(centreOf('-pi * r^2 / (wavelength * 1 mm)')).toEqual({ x: 0, y: 0 });
    expect(centreOf('lens(focal: 1 mm, centre: (300 um, 0 um))', 'circle(radius: 100 um, centre: (300 um, 0 um))')).toEqual({ x: 300, y: 0 });
  });
  it('is null when anything breaks the symmetry', () => {
    expect(centreOf('lens(focal: 1 mm, centre: (10 um, 0 um))')).toBeNull();
    expect(centreOf('lens(focal: 1 mm) + vortex(charge: 1)')).toBeNull();
    expect(centreOf('lens(focal: 1 mm) + grating(period: 30 um)')).toBeNull();
    expect(centreOf('lens(focal: 1 mm)', 'rectangle(width: 300 um, height: 300 um)')).toBeNull();
    expect(centreOf('x / 1 um')).toBeNull();
    expect(centreOf('superpose(lens(focal: 1 mm), lens(focal: 2 mm, centre: (5 um, 0 um)))')).toBeNull();
  });
});

describe('designed foci', () => {
  it('survive a constant phase or a spiral about the lens axis, not a tilt', () => {
    const foci = (profile: string) => compiled(script(profile)).foci;
    expect(foci('lens(focal: 1.5 mm) + vortex(charge: 2)')).toEqual([{ x: 0, y: 0, z: 1500, weight: 1 }]);
    expect(foci('vortex(charge: 1, centre: (5 um, 0 um)) + lens(focal: 1 mm, centre: (5 um, 0 um)) - 0.25 waves')).toEqual([{ x: 5, y: 0, z: 1000, weight: 1 }]);
    expect(foci('lens(focal: 1 mm) + vortex(charge: 1, centre: (5 um, 0 um))')).toEqual([]);
    expect(foci('lens(focal: 1 mm) + grating(period: 30 um)')).toEqual([]);
  });
});

describe('regions, quantization and labels', () => {
  it('builds apertures from shapes and set operations', () => {
    const design = compiled(script('lens(focal: 1 mm)', 'hole = circle(radius: 20 um)', 'difference(shift(rectangle(width: 200 um, height: 100 um), by: (10 um, 0 um)), hole)'));
    const a = design.aperture;
    expect(regionContains(a, 0, 0)).toBe(false);
    expect(regionContains(a, 50, 0)).toBe(true);
    expect(regionContains(a, 105, 0)).toBe(true);
    expect(regionContains(a, -95, 0)).toBe(false);
    const poly = compiled(script('lens(focal: 1 mm)', '', 'polygon((0 um, 0 um), (100 um, 0 um), (0 um, 100 um))')).aperture;
    expect(poly).toEqual({ kind: 'polygon', points: Float64Array.from([0, 0, 100, 0, 0, 100]) });
  });

  it('fills binary defaults and converts multi-level counts to masks', () => {
    const binary = compiled(script('lens(focal: 1 mm)')).quantization;
    expect(binary).toEqual({ kind: 'binary', duty: 0.5, phaseOffset: 0, modulation: 'amplitude', tone: 'positive', refractiveIndex: 1.5 });
    const source = 'wavelength 405 nm\naperture circle(radius: 1 mm)\nprofile lens(focal: 5 mm)\nquantize multilevel(levels: 8, offset: 0.5 waves, index: 1.46)\n';
    expect(compiled(source).quantization).toEqual({ kind: 'multilevel', bits: 3, phaseOffset: Math.PI, refractiveIndex: 1.46 });
    const phase = compiled(source.replace(/quantize .*/, 'quantize binary(duty: 0.3, modulation: phase, tone: negative, offset: 90 deg)')).quantization;
    expect(phase).toEqual({ kind: 'binary', duty: 0.3, phaseOffset: Math.PI / 2, modulation: 'phase', tone: 'negative', refractiveIndex: 1.5 });
  });

  it('collects labels in µm', () => {
    const design = compiled(script('lens(focal: 1 mm)') + 'label text("L1 f=1mm", at: (-0.2 mm, -280 um))\nlabel text("dose 3", at: (0 um, 260 um), height: 15 um)\n');
    expect(design.labels).toEqual([
      { text: 'L1 f=1mm', x: -200, y: -280, height: 10 },
      { text: 'dose 3', x: 0, y: 260, height: 15 },
    ]);
  });
});

describe('phase maps', () => {
  const map = { columns: 3, rows: 2, pitchX: 10, pitchY: 20, originX: -10, originY: 0, values: Float64Array.from([0, 1, 2, 3, 4, 5]) };
  it('interpolates bilinearly and holds the edge value outside', () => {
    const field = compiled(script('phase_map("test", scale: 2)'), { phaseMaps: (name) => (name === 'test' ? map : undefined) }).pieces[0].field;
    expect(field.phase(-10, 0)).toBeCloseTo(0, 12);
    expect(field.phase(-5, 0)).toBeCloseTo(1, 12);
    expect(field.phase(0, 10)).toBeCloseTo(2 * 2.5, 12);
    expect(field.phase(10, 20)).toBeCloseTo(10, 12);
    expect(field.phase(500, 500)).toBeCloseTo(10, 12);
    // steepest cell: 3 rad over 20 µm along y, 1 rad over 10 µm along x, times the scale
    expect(field.maxSpatialFrequency(-10, 0, 10, 20)).toBeCloseTo((2 * Math.hypot(1 / 10, 3 / 20)) / (2 * Math.PI), 12);
  });
  it('reports a map that is not there', () => {
    const result = compileScript(script('phase_map("nope")'), { phaseMaps: () => undefined });
    expect(result.ok).toBe(false);
    expect(result.diagnostics[0]).toMatchObject({ message: 'no phase map named "nope"', start: { line: 4, column: 19 } });
  });
});
