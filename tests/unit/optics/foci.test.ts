import { describe, expect, it } from 'vitest';
import { simulateMask } from '@/lib/optics';
import { binaryAmplitude, binaryRings, lensDesign, multilevel, multilevelRings, ringLibrary } from './fixtures';

describe('higher orders and the chromatic focal shift of a low-NA amplitude plate', () => {
  // λ 0.5 µm, f 5 mm, radius 200 µm: 16 zones, NA 0.04, so paraxial laws hold closely
  const lambda = 0.5;
  const focal = 5000;
  const radius = 200;
  const result = simulateMask(lensDesign({ wavelength: lambda, focal, radius, quantization: binaryAmplitude }), ringLibrary([binaryRings(lambda, focal, radius)], 'zones'), {
    band: { from_um: 0.42, to_um: 0.68, samples: 7 },
  });

  it('puts order m at f/m on the axial scan', () => {
    // zone plate foci at f/m for odd m (Attwood, ch. 9; Goodman, Fourier Optics)
    // higher orders see the plate's zones as an aberrated lens of NA m·0.04, so their best focus drifts slightly short of f/m
    for (const [m, tolerance] of [[1, 0.002], [3, 0.005], [5, 0.015]]) {
      const o = result.orders.find((entry) => entry.order === m);
      expect(o?.z_um).not.toBeNull();
      expect(Math.abs((o?.z_um as number) - focal / m) / (focal / m)).toBeLessThan(tolerance);
    }
    // and the axial scan itself shows the third-order peak: the scan's maximum between f/4 and f/2 lies near f/3
    const { z_um, intensity } = result.axial;
    let best = -1;
    z_um.forEach((z, i) => {
      if (z > focal / 4 && z < focal / 2 && (best < 0 || intensity[i] > intensity[best])) best = i;
    });
    expect(Math.abs(z_um[best] - focal / 3)).toBeLessThan(2 * (z_um[1] - z_um[0]));
  });

  it('moves the focus as f(λ) = f0·λ0/λ', () => {
    // diffractive lens dispersion, f ∝ 1/λ (Attwood, ch. 9; Swanson TR 854)
    const { wavelength_um, focus_z_um } = result.chromatic;
    wavelength_um.forEach((l, i) => expect(Math.abs(focus_z_um[i] - (focal * lambda) / l) / ((focal * lambda) / l)).toBeLessThan(0.003));
  });

  it('states the rule of thumb λ/Δλ ≳ number of zones', () => {
    // number of Fresnel zones N = r²/(λf) (Attwood, ch. 9); bandwidth Δλ/λ ≲ 1/N (same source)
    expect(result.chromatic.zones).toBeCloseTo(radius ** 2 / (lambda * focal), 0);
    expect(result.chromatic.maxBandwidth_um).toBeCloseTo(lambda / result.chromatic.zones, 9);
    expect(result.warnings.some((w) => w.includes('λ/Δλ'))).toBe(true);
  });
});

describe('diffraction-limited spot of a 64-level lens', () => {
  // λ 0.5 µm, f 2 mm, D 200 µm: close to a uniformly filled aperture with a perfect lens
  const lambda = 0.5;
  const focal = 2000;
  const diameter = 200;
  const result = simulateMask(lensDesign({ wavelength: lambda, focal, radius: diameter / 2, quantization: multilevel(6) }), ringLibrary(multilevelRings(lambda, focal, diameter / 2, 6), 'level'));
  const focus = result.foci[0];
  const map = result.focalMaps[0];

  it('has its first dark ring at 1.22 λf/D and FWHM 1.03 λf/D', () => {
    // Airy pattern (Born & Wolf, Principles of Optics, §8.5.2): first zero at 1.22 λ/D·f; FWHM 1.029 λ/D·f (from memory)
    const centre = (map.size - 1) / 2;
    const row = map.intensity.slice(centre * map.size, (centre + 1) * map.size);
    // the deepest point between the central peak and the second ring (0.6 to 1.5 times 0.61 λ/NA)
    const from = centre + Math.round((0.6 * focus.encircledRadius_um) / map.step_um);
    const to = centre + Math.round((1.5 * focus.encircledRadius_um) / map.step_um);
    let min = from;
    for (let i = from; i <= to; i++) if (row[i] < row[min]) min = i;
    const d = row[min - 1] - 2 * row[min] + row[min + 1];
    const vertex = min + (0.5 * (row[min - 1] - row[min + 1])) / d;
    const darkRing = (vertex - centre) * map.step_um;
    expect(Math.abs(darkRing - (1.22 * lambda * focal) / diameter) / ((1.22 * lambda * focal) / diameter)).toBeLessThan(0.02);
    expect(Math.abs((focus.fwhm_um as number) - (1.029 * lambda * focal) / diameter) / ((1.029 * lambda * focal) / diameter)).toBeLessThan(0.02);
    expect(Math.abs(focus.diffractionLimitFwhm_um - (1.029 * lambda * focal) / diameter) / focus.diffractionLimitFwhm_um).toBeLessThan(0.01);
  });

  it('holds 83.8 % of the focused light inside the first dark ring', () => {
    // Born & Wolf, §8.5.2: fraction of the Airy pattern's energy inside the first dark ring ≈ 0.838
    expect(focus.encircledEnergy / focus.efficiency).toBeGreaterThan(0.82);
    expect(focus.encircledEnergy / focus.efficiency).toBeLessThan(0.86);
  });
});

describe('point-source illumination', () => {
  it('images an LED 40 mm in front of a 1 mm lens at the thin-lens distance, about 40× demagnified', () => {
    // thin-lens equation 1/z' = 1/f − 1/s (Born & Wolf, geometrical optics; from memory); an LED a few centimetres
    // below the lens imaged about 40× smaller (common practice, no source)
    const lambda = 0.405;
    const focal = 1000;
    const s = 40000;
    const result = simulateMask(lensDesign({ wavelength: lambda, focal, radius: 230, quantization: binaryAmplitude }), ringLibrary([binaryRings(lambda, focal, 230)], 'zones'), {
      illumination: { kind: 'point', distance_um: s },
    });
    const image = 1 / (1 / focal - 1 / s);
    expect(result.foci[0].expected_um[2]).toBeCloseTo(image, 6);
    expect(Math.abs(result.foci[0].found_um[2] - image) / image).toBeLessThan(0.003);
    expect(s / image).toBeGreaterThan(35);
    expect(s / image).toBeLessThan(45);
    expect(result.foci[0].efficiency * Math.PI ** 2).toBeCloseTo(1, 1);
  });
});
