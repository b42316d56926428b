import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { compiled, script } from './helpers';

const LAMBDA = 0.405; // µm

/**
 * maxFieldGradient bounds |∇u|/(2π) for a combination u = Σ w_k·exp(i(φ_k + c_k)). The reference is
 * outside the bound code: central differences of the complex field the compiler builds, at random
 * points of random boxes (|∇u|² = |∂u/∂x|² + |∂u/∂y|² for a complex function of two real variables).
 */
describe('maxFieldGradient of a combination', () => {
  const combinations = [
    'superpose(wave(lens(focal: 800 um, centre: (-40 um, 0 um)), weight: 0.6), wave(lens_to(focus: (60 um, 25 um, 1.2 mm)), weight: 0.4))',
    'superpose(lens(focal: 600 um), lens(focal: 900 um))',
    'superpose(wave(lens(focal: 600 um, centre: (-20 um, 0 um)), weight: 0.4), wave(lens(focal: 900 um, centre: (30 um, 10 um)), weight: 0.35), wave(lens(focal: 700 um, centre: (0 um, 40 um)), weight: 0.25))',
    'superpose(wave(grating(period: 6 um, direction: 30 deg), weight: 2, offset: 1 rad), wave(axicon(period: 15 um), weight: 0.5))',
    'superpose(wave(lens(focal: 1 mm) + vortex(charge: 2), weight: 0.7), wave(lens(focal: 1.3 mm), weight: 0.3), wave(3 * sin(2 * pi * x / 40 um), weight: 0.2))',
  ];
  const out = new Float64Array(2);
  const gradientModulus = (field: { field(x: number, y: number, out: Float64Array): void }, x: number, y: number, h: number) => {
    const d = (ax: number, ay: number, bx: number, by: number) => {
      field.field(ax, ay, out);
      const re = out[0];
      const im = out[1];
      field.field(bx, by, out);
      return [(re - out[0]) / (2 * h), (im - out[1]) / (2 * h)];
    };
    const [xr, xi] = d(x + h, y, x - h, y);
    const [yr, yi] = d(x, y + h, x, y - h);
    return Math.sqrt(xr * xr + xi * xi + yr * yr + yi * yi);
  };

  it.each(combinations)('never under-estimates |∇u| for %s', (profile) => {
    const field = compiled(script(profile)).pieces[0].field;
    expect(field.maxFieldGradient).toBeTypeOf('function');
    fc.assert(
      fc.property(
        fc.double({ min: -250, max: 250, noNaN: true }),
        fc.double({ min: -250, max: 250, noNaN: true }),
        fc.double({ min: 0.01, max: 200, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (x0, y0, size, s, t) => {
          const h = 1e-5;
          const x = x0 + h + s * (size - 2 * h);
          const y = y0 + h + t * (size - 2 * h);
          // inside the core λ/(2π) of a spiral the part's bound is capped by rule (DEVELOPERS.md, language)
          if (profile.includes('vortex') && Math.hypot(x, y) < LAMBDA / (2 * Math.PI) + 2 * h) return;
          const bound = 2 * Math.PI * field.maxFieldGradient!(x0, y0, x0 + size, y0 + size);
          expect(gradientModulus(field, x, y, h)).toBeLessThanOrEqual(bound * (1 + 1e-4) + 1e-9);
        },
      ),
      { numRuns: 400 },
    );
  });

  it('is the weighted sum of the parts’ frequencies for two gratings (|∇u| ≤ 2π·Σ w_k/Λ_k, reached where the parts are in phase)', () => {
    // Two plane waves exp(2πi·x/Λ1) and exp(2πi·x/Λ2) along x: ∂u/∂x = 2πi·(w1/Λ1·e1 + w2/Λ2·e2), whose
    // modulus is 2π·(w1/Λ1 + w2/Λ2) at x = 0, where both phases vanish (direct calculation).
    const field = compiled(script('superpose(wave(grating(period: 5 um), weight: 0.7), wave(grating(period: 8 um), weight: 0.3))')).pieces[0].field;
    const expected = 0.7 / 5 + 0.3 / 8;
    expect(field.maxFieldGradient!(-10, -10, 10, 10)).toBeCloseTo(expected, 12);
    expect(gradientModulus(field, 0, 0, 1e-5) / (2 * Math.PI)).toBeCloseTo(expected, 6);
  });

  it('is absent for a single wave, whose modulus is constant', () => {
    expect(compiled(script('lens(focal: 1 mm)')).pieces[0].field.maxFieldGradient).toBeUndefined();
    expect(compiled(script('wave(lens(focal: 1 mm), weight: 2)')).pieces[0].field.maxFieldGradient).toBeUndefined();
  });
});
