import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import type { CompiledDesign } from '@/lib/design/types';
import { buildMask, defaultMaskOptions } from '@/lib/geometry';
import { compileScript } from '@/lib/lang';
import { simulateMask } from '@/lib/optics';

function compileExample(name: string): CompiledDesign {
  const compiled = compileScript(readFileSync(path.resolve(__dirname, '../../../examples', name), 'utf8'));
  if (!compiled.ok) throw new Error(compiled.diagnostics.map((d) => d.message).join('; '));
  return compiled.design;
}

describe('examples/single-focus-405.zw through the language, the geometry and the optics', () => {
  const design = compileExample('single-focus-405.zw');
  const { library } = buildMask(design, defaultMaskOptions());
  const result = simulateMask(design, library, { band: { from_um: 0.4, to_um: 0.41, samples: 3 } });
  const focal = 1000;

  it('finds the focus at 1 mm with a first-order efficiency near 1/π²', () => {
    // binary amplitude zone plate, η_1 = 1/π² (Goodman, Introduction to Fourier Optics; Attwood, ch. 9)
    expect(result.sampling.method).toBe('radial');
    expect(Math.abs(result.foci[0].found_um[2] - focal) / focal).toBeLessThan(0.002);
    expect(Math.abs(result.foci[0].efficiency * Math.PI ** 2 - 1)).toBeLessThan(0.03);
    expect(result.orders.find((o) => o.order === 0)?.efficiency).toBeCloseTo(0.25, 2);
  });

  it('shows the third-order focus near f/3 on the axial scan', () => {
    // third order at f/3 (same sources); at this plate's NA of 0.23 the third order is an NA 0.57 wave whose
    // spherical aberration pulls its best focus about 3 % short, so "near" is taken as within 5 %
    const { z_um, intensity } = result.axial;
    let best = -1;
    z_um.forEach((z, i) => {
      if (z > focal / 4 && z < focal / 2 && (best < 0 || intensity[i] > intensity[best])) best = i;
    });
    expect(Math.abs(z_um[best] - focal / 3) / (focal / 3)).toBeLessThan(0.05);
    const third = result.orders.find((o) => o.order === 3);
    expect(Math.abs((third?.z_um as number) - focal / 3) / (focal / 3)).toBeLessThan(0.05);
    expect((third?.efficiency as number) * 9 * Math.PI ** 2).toBeCloseTo(1, 1);
  });
});

describe('examples/four-level-lens.zw', () => {
  it('reaches sinc²(1/4) = 81.1 % at its 2 mm focus', () => {
    // Swanson, Binary Optics Technology, MIT Lincoln Laboratory TR 854 (1989)
    const design = compileExample('four-level-lens.zw');
    const { library } = buildMask(design, defaultMaskOptions());
    const result = simulateMask(design, library, { band: { from_um: 0.4, to_um: 0.41, samples: 2 } });
    expect(Math.abs(result.foci[0].found_um[2] - 2000) / 2000).toBeLessThan(0.002);
    expect(Math.abs(result.foci[0].efficiency - 0.811)).toBeLessThan(0.01);
  });
});

describe('examples/bifocal-multiplexed.zw', () => {
  it('gives each focus the 1/π² share of the half of the aperture its sectors cover', { timeout: 600_000 }, () => {
    // each lens is a 50 % binary amplitude zone plate over half the aperture (4 of 8 sectors):
    // 1/π² of half the light, 1/(2π²) ≈ 5.07 % (Goodman; Attwood ch. 9, applied per sector); its peak is a quarter
    // of a full lens's (half the amplitude), which peakRatio reports
    const design = compileExample('bifocal-multiplexed.zw');
    const { library } = buildMask(design, defaultMaskOptions());
    const result = simulateMask(design, library, { band: { from_um: 0.404, to_um: 0.406, samples: 2 } });
    for (const focus of result.foci) {
      expect(Math.abs(focus.efficiency * 2 * Math.PI ** 2 - 1)).toBeLessThan(0.03);
      expect(Math.abs(focus.peakRatio * 4 * Math.PI ** 2 - 1)).toBeLessThan(0.05);
      expect(Math.abs(focus.found_um[2] - focus.designed_um[2]) / focus.designed_um[2]).toBeLessThan(0.002);
    }
  });
});

/**
 * What the fabricated two-focus element should give. The mask is t = exp(iπ·s) with s = 1 where
 * Re(u·e^{−iθ0}) > cos(π·duty)·|u|, u = w1·e^{iφ1} + w2·e^{iφ2} (lib/design/types.ts). Over an aperture
 * holding many zones of both lenses, φ1 and φ2 cover the torus evenly, so the power sent into lens k's
 * wave is |c_k|², c_k the Fourier coefficient of t over (φ1, φ2) at that lens's phase — the usual
 * Fourier-series analysis of a phase grating (Swanson, TR 854), applied in two phases. For a linear element
 * (t = u) the powers would go as w_k²; the binary argument of the sum does not: with 0.6 and 0.4 it gives
 * about 31 % and 5 %, a ratio near 6 rather than 2.25.
 */
function torusPowers(w1: number, w2: number, duty: number, theta0: number): [number, number] {
  const n = 512;
  let c1r = 0;
  let c1i = 0;
  let c2r = 0;
  let c2i = 0;
  for (let a = 0; a < n; a++) {
    const p1 = (2 * Math.PI * (a + 0.5)) / n;
    for (let b = 0; b < n; b++) {
      const p2 = (2 * Math.PI * (b + 0.5)) / n;
      const ur = w1 * Math.cos(p1) + w2 * Math.cos(p2);
      const ui = w1 * Math.sin(p1) + w2 * Math.sin(p2);
      const projected = ur * Math.cos(theta0) + ui * Math.sin(theta0);
      const t = projected > Math.cos(Math.PI * duty) * Math.hypot(ur, ui) ? -1 : 1;
      c1r += t * Math.cos(p1);
      c1i -= t * Math.sin(p1);
      c2r += t * Math.cos(p2);
      c2i -= t * Math.sin(p2);
    }
  }
  const m = n * n;
  return [(c1r ** 2 + c1i ** 2) / m ** 2, (c2r ** 2 + c2i ** 2) / m ** 2];
}

describe('examples/two-focus-offaxis.zw', () => {
  it('puts both foci where the script does, with the power split its quantized weights imply', { timeout: 600_000 }, () => {
    const design = compileExample('two-focus-offaxis.zw');
    // finer seed lines than the default: with the defaults the geometry engine could not close this
    // design's zones when this test was written (reported to its owner)
    const { library } = buildMask(design, { ...defaultMaskOptions(), seedSpacing: 20, chordTolerance: 0.02 });
    const result = simulateMask(design, library, { band: { from_um: 0.404, to_um: 0.406, samples: 2 } });
    expect(result.sampling.method).toBe('fft-2d');
    design.foci.forEach((focus, k) => {
      const [x, y, z] = result.foci[k].found_um;
      expect(Math.hypot(x - focus.x, y - focus.y)).toBeLessThan(0.1);
      expect(Math.abs(z - focus.z) / focus.z).toBeLessThan(0.002);
    });
    const q = design.quantization;
    if (q.kind !== 'binary') throw new Error('the example is a binary phase plate');
    const [p1, p2] = torusPowers(design.foci[0].weight, design.foci[1].weight, q.duty, q.phaseOffset);
    expect(p1).toBeGreaterThan(0.3);
    expect(p2).toBeLessThan(0.06);
    expect(Math.abs(result.foci[0].efficiency - p1) / p1).toBeLessThan(0.03);
    expect(Math.abs(result.foci[1].efficiency - p2) / p2).toBeLessThan(0.06);
    const ratio = result.foci[0].efficiency / result.foci[1].efficiency;
    expect(Math.abs(ratio - p1 / p2) / (p1 / p2)).toBeLessThan(0.08);
  });
});

describe('examples/twin-spot-splitter.zw', () => {
  it('puts two equal spots where the script does, each with (4/π²)² of the light', { timeout: 600_000 }, () => {
    const design = compileExample('twin-spot-splitter.zw');
    const { library } = buildMask(design, { ...defaultMaskOptions(), chordTolerance: 0.02 });
    const result = simulateMask(design, library, { band: { from_um: 0.404, to_um: 0.406, samples: 2 } });
    // Duty ½ of arg(e^(iφ1) + e^(iφ2)) is the π-phase mask t = sign(cos(Δ/2))·sign(cos(Σ/2)), Δ and Σ the
    // difference and sum of the phases. A square wave's fundamental is (4/π)·cos (Fourier series,
    // textbook), and cos(Δ/2)·cos(Σ/2) = (cos φ1 + cos φ2)/2, so e^(iφ1) comes with amplitude
    // (4/π)²/4 = 4/π²: each focus gets (4/π²)² = 16/π⁴ ≈ 16.4 % of the light (derived here).
    const expected = 16 / Math.PI ** 4;
    expect(result.foci).toHaveLength(2);
    design.foci.forEach((focus, k) => {
      const [x, y, z] = result.foci[k].found_um;
      expect(Math.hypot(x - focus.x, y - focus.y)).toBeLessThan(0.1);
      expect(Math.abs(z - focus.z) / focus.z).toBeLessThan(0.002);
      expect(Math.abs(result.foci[k].efficiency - expected) / expected).toBeLessThan(0.02);
    });
  });
});

