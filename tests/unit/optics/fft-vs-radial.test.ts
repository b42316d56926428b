import { describe, expect, it } from 'vitest';
import { simulateMask } from '@/lib/optics';
import { binaryAmplitude, binaryRings, lensDesign, multilevel, multilevelRings, ringLibrary } from './fixtures';

// λ 0.5 µm, f 500 µm, radius 60 µm: 14 zones, small enough for a 2-D grid
const lambda = 0.5;
const focal = 500;
const radius = 60;

describe.each([
  ['binary amplitude', binaryAmplitude, () => ringLibrary([binaryRings(lambda, focal, radius)], 'zones')],
  ['four-level phase', multilevel(2), () => ringLibrary(multilevelRings(lambda, focal, radius, 2), 'level')],
] as const)('%s plate: 2-D angular spectrum against the exact radial integral', (_, quantization, library) => {
  // Both are the scalar Rayleigh–Sommerfeld field of the same polygons: the angular-spectrum method is
  // exactly equivalent to it (Goodman, Introduction to Fourier Optics, ch. 3), so they must agree up to sampling.
  const design = lensDesign({ wavelength: lambda, focal, radius, quantization });
  const options = { axialSamples: 121, band: { from_um: 0.45, to_um: 0.55, samples: 3 } };
  const radial = simulateMask(design, library(), { ...options, method: 'radial' });
  const grid = simulateMask(design, library(), { ...options, method: 'fft-2d' });

  it('uses the two methods', () => {
    expect(radial.sampling.method).toBe('radial');
    expect(grid.sampling.method).toBe('fft-2d');
    expect(grid.sampling.pitch_um as number).toBeLessThanOrEqual(1 / (2 * grid.sampling.maxSpatialFrequency_per_um));
    // the 5th order's zones (5·f_max) are finer than the grid's Nyquist limit and are flagged; the radial method has no limit
    expect(grid.orders.find((o) => o.order === 5)?.resolved).toBe(false);
    expect(grid.orders.find((o) => o.order === 3)?.resolved).toBe(true);
    expect(radial.orders.every((o) => o.resolved)).toBe(true);
  });

  it('gives the same axial scan', () => {
    expect(grid.axial.z_um).toEqual(radial.axial.z_um);
    const peak = Math.max(...radial.axial.intensity);
    // nearer than f/4 the 5th and higher orders dominate, and their zone frequencies (≥ 5·0.24 /µm) exceed the
    // grid's Nyquist frequency 1/(2·pitch): the grid cannot carry them, so compare beyond
    radial.axial.z_um.forEach((z, i) => {
      if (z >= focal / 4) expect(Math.abs(grid.axial.intensity[i] - radial.axial.intensity[i]) / peak).toBeLessThan(0.02);
    });
  });

  it('gives the same focus, spot and efficiencies', () => {
    const a = radial.foci[0];
    const b = grid.foci[0];
    expect(Math.abs(b.found_um[2] - a.found_um[2]) / focal).toBeLessThan(0.002);
    expect(Math.hypot(b.found_um[0], b.found_um[1])).toBeLessThan(0.05);
    expect(Math.abs((b.fwhm_um as number) - (a.fwhm_um as number)) / (a.fwhm_um as number)).toBeLessThan(0.02);
    expect(Math.abs(b.efficiency - a.efficiency) / a.efficiency).toBeLessThan(0.015);
    expect(Math.abs(b.peakRatio - a.peakRatio) / a.peakRatio).toBeLessThan(0.02);
    expect(Math.abs(b.encircledEnergy - a.encircledEnergy) / a.encircledEnergy).toBeLessThan(0.03);
    for (const m of [0, -1, 3]) {
      const ea = radial.orders.find((o) => o.order === m)?.efficiency as number;
      const eb = grid.orders.find((o) => o.order === m)?.efficiency as number;
      expect(Math.abs(eb - ea)).toBeLessThan(0.01 * Math.max(ea, 0.1));
    }
  });

  it('gives the same chromatic focal positions', () => {
    radial.chromatic.focus_z_um.forEach((z, i) => expect(Math.abs(grid.chromatic.focus_z_um[i] - z) / z).toBeLessThan(0.002));
  });
});

describe('point-source illumination on both methods', () => {
  it('images a source 20 mm away at the same thin-lens distance with the same efficiency', () => {
    // thin-lens equation 1/z' = 1/f − 1/s (from memory); both methods carry the same spherical incident wave
    const design = lensDesign({ wavelength: lambda, focal, radius, quantization: binaryAmplitude });
    const options = { illumination: { kind: 'point' as const, distance_um: 20000 }, band: { from_um: 0.499, to_um: 0.501, samples: 2 } };
    const radial = simulateMask(design, ringLibrary([binaryRings(lambda, focal, radius)], 'zones'), { ...options, method: 'radial' });
    const grid = simulateMask(design, ringLibrary([binaryRings(lambda, focal, radius)], 'zones'), { ...options, method: 'fft-2d' });
    const image = 1 / (1 / focal - 1 / 20000);
    for (const r of [radial, grid]) expect(Math.abs(r.foci[0].found_um[2] - image) / image).toBeLessThan(0.003);
    expect(Math.abs(grid.foci[0].efficiency - radial.foci[0].efficiency) / radial.foci[0].efficiency).toBeLessThan(0.015);
  });
});

describe('off-axis lens on the 2-D grid', () => {
  it('finds the focus at the lens centre, 40 µm off the aperture centre, with 1/π² efficiency', () => {
    // an off-axis zone plate is a decentred part of an on-axis one: same order efficiencies (Goodman, as above)
    const design = lensDesign({ wavelength: lambda, focal, radius, quantization: binaryAmplitude, centre: [40, 0] });
    const library = ringLibrary([binaryRings(lambda, focal, 105)], 'zones', [40, 0]);
    const result = simulateMask(design, library, { band: { from_um: 0.495, to_um: 0.505, samples: 3 } });
    expect(result.sampling.method).toBe('fft-2d');
    const [x, y, z] = result.foci[0].found_um;
    expect(Math.abs(x - 40)).toBeLessThan(0.1);
    expect(Math.abs(y)).toBeLessThan(0.1);
    expect(Math.abs(z - focal) / focal).toBeLessThan(0.003);
    expect(result.foci[0].efficiency * Math.PI ** 2).toBeGreaterThan(0.9);
    expect(result.foci[0].efficiency * Math.PI ** 2).toBeLessThan(1.05);
    expect(result.warnings).toEqual([]);
  });
});
