import { describe, expect, it } from 'vitest';
import { simulateMask, type SimulationResult } from '@/lib/optics';
import { binaryAmplitude, binaryPhase, binaryRings, lensDesign, multilevel, multilevelRings, ringLibrary, zoneRadii } from './fixtures';

// A low-NA plate with 64 Fresnel zones: λ 0.5 µm, f 5 mm, radius 400 µm (NA 0.08).
const lambda = 0.5;
const focal = 5000;
const radius = 400;

const order = (result: SimulationResult, m: number) => {
  const found = result.orders.find((o) => o.order === m && (m === 0 || o.focusIndex === 0));
  if (!found) throw new Error(`order ${m} missing`);
  return found;
};

describe('fixture zone radii', () => {
  it('follow r_n² = nλf + (nλ/2)²', () => {
    // the drawn rings run from r_(2j+1) to r_(2j+2) (Attwood, ch. 9, zone-plate radii)
    const radii = zoneRadii(lambda, focal, radius);
    const rings = binaryRings(lambda, focal, radius);
    rings.slice(0, -1).forEach(([a, b], j) => {
      expect(a).toBeCloseTo(radii[2 * j], 9);
      expect(b).toBeCloseTo(radii[2 * j + 1], 9);
    });
  });
});

describe('binary amplitude zone plate, 50 % duty (radial method)', () => {
  const result = simulateMask(lensDesign({ wavelength: lambda, focal, radius, quantization: binaryAmplitude }), ringLibrary([binaryRings(lambda, focal, radius)], 'zones'));

  it('simulates the polygons with the radial integral', () => {
    expect(result.sampling.method).toBe('radial');
    expect(result.sampling.transitions).toBeGreaterThan(60);
  });

  it('sends 1/π² into the first order, 25 % into the zero order, nothing into even orders', () => {
    // Goodman, Introduction to Fourier Optics (Fresnel zone plate); Attwood, Soft X-Rays and EUV Radiation, ch. 9:
    // η_m = 1/(m²π²) for odd m, 0 for even m ≠ 0, η_0 = 1/4
    expect(result.foci[0].efficiency).toBeGreaterThan(0.98 / Math.PI ** 2);
    expect(result.foci[0].efficiency).toBeLessThan(1.02 / Math.PI ** 2);
    expect(order(result, 0).efficiency).toBeCloseTo(0.25, 2);
    expect(order(result, 2).efficiency).toBeLessThan(1e-3);
    expect(order(result, 4).efficiency).toBeLessThan(1e-3);
    expect(order(result, -1).efficiency).toBeCloseTo(1 / Math.PI ** 2, 2);
    for (const m of [3, 5]) {
      expect(order(result, m).efficiency * m * m * Math.PI ** 2).toBeGreaterThan(0.96);
      expect(order(result, m).efficiency * m * m * Math.PI ** 2).toBeLessThan(1.03);
    }
  });

  it('finds the focus at f, and a peak-intensity ratio matching the efficiency', () => {
    const [x, y, z] = result.foci[0].found_um;
    expect(Math.hypot(x, y)).toBe(0);
    expect(Math.abs(z - focal) / focal).toBeLessThan(0.002);
    // the focal peak over a perfect lens's peak equals the first-order power (Fresnel approximation, as above)
    expect(result.foci[0].peakRatio / result.foci[0].efficiency).toBeCloseTo(1, 1);
  });

  it('has no focus to find in the even orders', () => {
    expect(order(result, 2).z_um).toBeNull();
  });
});

describe('binary π-phase zone plate', () => {
  it('sends 4/π² into the first order and nothing into the zero order', () => {
    // Swanson, Binary Optics Technology, MIT Lincoln Laboratory TR 854 (1989): two-level phase, η_1 = 4/π² ≈ 40.5 %, η_0 = 0
    const result = simulateMask(lensDesign({ wavelength: lambda, focal, radius, quantization: binaryPhase }), ringLibrary([binaryRings(lambda, focal, radius)], 'zones'));
    expect(result.modulation).toBe('phase');
    expect(result.foci[0].efficiency / (4 / Math.PI ** 2)).toBeGreaterThan(0.98);
    expect(result.foci[0].efficiency / (4 / Math.PI ** 2)).toBeLessThan(1.02);
    expect(order(result, 0).efficiency).toBeLessThan(1e-3);
  });
});

describe('multi-level phase lenses', () => {
  it.each([
    [2, 0.811],
    [3, 0.95],
  ])('%i masks (2^N levels) reach sinc²(1/2^N)', (bits, published) => {
    // Swanson, MIT Lincoln Laboratory TR 854 (1989): η = sinc²(1/2^N), 81.1 % for 4 levels, 95.0 % for 8
    const sinc2 = (Math.sin(Math.PI / 2 ** bits) / (Math.PI / 2 ** bits)) ** 2;
    expect(sinc2).toBeCloseTo(published, 3);
    const result = simulateMask(lensDesign({ wavelength: lambda, focal, radius, quantization: multilevel(bits) }), ringLibrary(multilevelRings(lambda, focal, radius, bits), 'level'));
    expect(result.modulation).toBe('multilevel');
    expect(result.warnings).toEqual([]);
    expect(Math.abs(result.foci[0].efficiency - published)).toBeLessThan(0.01);
  });
});

describe('negative tone', () => {
  it('draws the complement and keeps the first-order efficiency of the plate', () => {
    // the complementary amplitude plate has the same |c_m| for m ≠ 0 (Babinet's principle)
    const negative = { ...binaryAmplitude, tone: 'negative' as const };
    const result = simulateMask(lensDesign({ wavelength: lambda, focal, radius, quantization: negative }), ringLibrary([binaryRings(lambda, focal, radius)], 'zones'));
    expect(result.foci[0].efficiency * Math.PI ** 2).toBeCloseTo(1, 1);
    expect(order(result, 0).efficiency).toBeCloseTo(0.25, 2);
  });
});
