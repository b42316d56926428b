import { describe, expect, it } from 'vitest';
import { besselJ0 } from '@/lib/optics/bessel-j0';
import { GAUSS_NODES, GAUSS_WEIGHTS } from '@/lib/optics/gauss-legendre';
import { fft2d } from '@/lib/optics/fft2d';
import { radialField } from '@/lib/optics/radial-field';

describe('Bessel J0', () => {
  it('matches tabulated values and zeros', () => {
    // Abramowitz & Stegun, Table 9.1 (values) and Table 9.5 (zeros j0,1 … j0,3); from memory, cross-checked with scipy.special.j0
    expect(besselJ0(0)).toBe(1);
    expect(besselJ0(1)).toBeCloseTo(0.7651976866, 9);
    expect(besselJ0(5)).toBeCloseTo(-0.1775967713, 9);
    expect(besselJ0(10)).toBeCloseTo(-0.2459357645, 9);
    expect(besselJ0(20)).toBeCloseTo(0.1670246643, 9);
    expect(besselJ0(50)).toBeCloseTo(0.0558123277, 9);
    for (const zero of [2.404825557695773, 5.520078110286311, 8.653727912911013, 11.79153443901428, 14.93091770848779]) {
      expect(Math.abs(besselJ0(zero))).toBeLessThan(1e-10);
    }
  });

  it('is continuous where the series hands over to the asymptotic expansion', () => {
    expect(besselJ0(12 - 1e-9)).toBeCloseTo(besselJ0(12 + 1e-9), 9);
  });
});

describe('Gauss–Legendre six-point rule', () => {
  it('integrates polynomials up to degree 11 exactly on [−1, 1]', () => {
    // ∫ x^d dx over [−1, 1] = 2/(d + 1) for even d, 0 for odd d (elementary calculus)
    for (let d = 0; d <= 11; d++) {
      const sum = GAUSS_NODES.reduce((acc, x, i) => acc + GAUSS_WEIGHTS[i] * x ** d, 0);
      expect(sum).toBeCloseTo(d % 2 === 0 ? 2 / (d + 1) : 0, 13);
    }
  });
});

describe('2-D FFT', () => {
  it('transforms a single plane wave into one spike and back', () => {
    // discrete Fourier transform of exp(2πi(3x + 5y)/n) is n² at (3, 5) and 0 elsewhere (definition of the DFT)
    const n = 16;
    const data = new Float64Array(2 * n * n);
    for (let y = 0; y < n; y++) {
      for (let x = 0; x < n; x++) {
        const a = (2 * Math.PI * (3 * x + 5 * y)) / n;
        data[2 * (y * n + x)] = Math.cos(a);
        data[2 * (y * n + x) + 1] = Math.sin(a);
      }
    }
    const copy = data.slice();
    fft2d(data, n, false);
    expect(data[2 * (5 * n + 3)]).toBeCloseTo(n * n, 9);
    expect(Math.hypot(data[2 * (5 * n + 4)], data[2 * (5 * n + 4) + 1])).toBeLessThan(1e-9);
    fft2d(data, n, true);
    for (let i = 0; i < copy.length; i++) expect(data[i]).toBeCloseTo(copy[i], 10);
  });
});

describe('radial Rayleigh–Sommerfeld integral on the axis', () => {
  it('matches the closed form for an annulus', () => {
    // On-axis field of a uniformly lit circular aperture of radius a (Rayleigh–Sommerfeld, first kind):
    // U(z) = e^{ikz} − (z/√(z² + a²))·e^{ik√(z² + a²)}; an annulus is the difference of two discs
    // (Goodman, Introduction to Fourier Optics, problem on the on-axis field of a circular aperture; from memory).
    const lambda = 0.633;
    const k = (2 * Math.PI) / lambda;
    const disc = (a: number, z: number): [number, number] => {
      const R = Math.hypot(a, z);
      return [Math.cos(k * z) - (z / R) * Math.cos(k * R), Math.sin(k * z) - (z / R) * Math.sin(k * R)];
    };
    const t = { inner: Float64Array.of(20), outer: Float64Array.of(90), tRe: Float64Array.of(1), tIm: Float64Array.of(0) };
    const out = new Float64Array(2);
    for (const z of [15, 100, 777, 5000]) {
      radialField(t, { kind: 'plane' }, lambda, 0, z, out);
      const outer = disc(90, z);
      const inner = disc(20, z);
      expect(out[0]).toBeCloseTo(outer[0] - inner[0], 8);
      expect(out[1]).toBeCloseTo(outer[1] - inner[1], 8);
    }
  });
});
