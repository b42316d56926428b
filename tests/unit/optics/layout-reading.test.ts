import { describe, expect, it } from 'vitest';
import type { LayoutLibrary } from '@/lib/layout/types';
import { simulateMask } from '@/lib/optics';
import { flattenLayer } from '@/lib/optics/flatten-layer';
import { rayIntervals } from '@/lib/optics/ray-intervals';
import { polygonCoverage } from '@/lib/optics/raster-coverage';
import { binaryAmplitude, binaryRings, lensDesign, ringLibrary } from './fixtures';

const square = Int32Array.of(0, 0, 2000, 0, 2000, 1000, 0, 1000); // 2 × 1 µm at 1 nm DBU

function library(placement: LayoutLibrary['cells'][number]['placements'][number]): LayoutLibrary {
  return {
    name: 'T',
    databaseUnit: 1e-9,
    userUnit: 1e-6,
    layers: [{ layer: 1, datatype: 0, name: 'zones', purpose: 'zones' }],
    cells: [
      { name: 'LEAF', shapes: [{ layer: 1, datatype: 0, polygons: [square] }], texts: [], placements: [] },
      { name: 'TOP', shapes: [], texts: [], placements: [placement] },
    ],
    topCell: 'TOP',
  };
}

describe('flattening placements', () => {
  it('mirrors about x before rotating, then translates (GDSII STRANS order)', () => {
    // GDSII Stream Format manual, STRANS: reflection about the x axis is applied before the angular rotation (from memory)
    const [p] = flattenLayer(library({ cell: 'LEAF', x: 5000, y: 0, rotation: 90, mirrorX: true }), 1, 0);
    // (2, 1) → mirror (2, −1) → rotate 90° (1, 2) → translate (6, 2)
    expect(Array.from(p.slice(4, 6))).toEqual([6, 2]);
  });

  it('expands arrays by their column and row steps', () => {
    const polygons = flattenLayer(library({ cell: 'LEAF', x: 0, y: 0, columns: 3, rows: 2, columnStep: { x: 3000, y: 0 }, rowStep: { x: 0, y: 4000 } }), 1, 0);
    expect(polygons).toHaveLength(6);
    expect(polygons.map((p) => [p[0], p[1]])).toContainEqual([6, 4]);
  });

  it('refuses a library whose top cell is missing', () => {
    expect(() => flattenLayer({ ...library({ cell: 'LEAF', x: 0, y: 0 }), topCell: 'NONE' }, 1, 0)).toThrow(/no top cell "NONE"/);
  });
});

describe('rays and coverage', () => {
  it('reads a ring drawn as one keyhole polygon as a ring', () => {
    // outer square 10, inner square 4, joined by a cut along +y
    const keyhole = Float64Array.of(0, 10, -10, 10, -10, -10, 10, -10, 10, 10, 0, 10, 0, 4, 4, 4, 4, -4, -4, -4, -4, 4, 0, 4);
    const along = rayIntervals([keyhole], 0, 0, 0.1);
    expect(along).toHaveLength(2);
    expect(along[0]).toBeCloseTo(4 / Math.cos(0.1), 9);
    expect(along[1]).toBeCloseTo(10 / Math.cos(0.1), 9);
  });

  it('covers pixels by area, so a polygon edge across a pixel covers its share', () => {
    // a triangle over a 4 × 4 grid of 1 µm pixels: area 8 µm², split exactly among the pixels it crosses
    const triangle = Float64Array.of(0, 0, 4, 0, 0, 4);
    const coverage = polygonCoverage([triangle], { x0: 0, y0: 0, pitch: 1, n: 4 });
    expect(coverage.reduce((a, b) => a + b, 0)).toBeCloseTo(8, 5);
    expect(coverage[0]).toBeCloseTo(1, 5);
    expect(coverage[3]).toBeCloseTo(0.5, 5);
  });
});

describe('clear messages for what cannot be simulated', () => {
  const design = lensDesign({ wavelength: 0.5, focal: 500, radius: 60, quantization: binaryAmplitude });
  const rings = ringLibrary([binaryRings(0.5, 500, 60)], 'zones');

  it('needs a zones layer', () => {
    expect(() => simulateMask(design, { ...rings, layers: [] })).toThrow(/no layer with purpose "zones"/);
  });

  it('needs a level layer for every mask of a multi-level design', () => {
    expect(() => simulateMask({ ...design, quantization: { kind: 'multilevel', bits: 2, phaseOffset: 0, refractiveIndex: 1.5 } }, rings)).toThrow(/no layer for level mask 1 of 2/);
  });

  it('needs a focus, in front of nothing', () => {
    expect(() => simulateMask({ ...design, foci: [] }, rings)).toThrow(/declares no focus/);
    expect(() => simulateMask({ ...design, foci: [{ x: 0, y: 0, z: -5, weight: 1 }] }, rings)).toThrow(/behind the mask/);
  });

  it('needs a sensible source and band', () => {
    expect(() => simulateMask(design, rings, { illumination: { kind: 'point', distance_um: 0 } })).toThrow(/point source distance/);
    expect(() => simulateMask(design, rings, { band: { from_um: 0.6, to_um: 0.5 } })).toThrow(/chromatic band/);
  });

  it('refuses the radial method for a design that is not symmetric', () => {
    expect(() => simulateMask({ ...design, symmetryCentre: null }, rings, { method: 'radial' })).toThrow(/symmetry centre/);
  });

  it('returns plain JSON', () => {
    const result = simulateMask(design, rings, { band: { from_um: 0.49, to_um: 0.51, samples: 2 } });
    expect(JSON.parse(JSON.stringify(result))).toEqual(result);
  });
});
