import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { compiled, script } from './helpers';

const LAMBDA = 0.405; // µm
const out = new Float64Array(2);

describe('exact lens against the zone-plate construction', () => {
  // Standard zone-plate construction: the n-th zone boundary lies at r_n² = nλf + (nλ/2)²,
  // where the path to the focus is nλ/2 longer than on axis, so the exact phase there is −nπ
  // (e.g. D. Attwood, Soft X-Rays and Extreme Ultraviolet Radiation, ch. 9).
  it('has phase −nπ at every zone radius', () => {
    const f = 1000;
    const field = compiled(script('lens(focal: 1 mm)')).pieces[0].field;
    for (let n = 1; n <= 60; n++) {
      const rn = Math.sqrt(n * LAMBDA * f + (n * LAMBDA / 2) ** 2);
      expect(field.phase(rn, 0)).toBeCloseTo(-n * Math.PI, 9);
      expect(field.phase(rn * Math.cos(1), rn * Math.sin(1))).toBeCloseTo(-n * Math.PI, 9);
    }
  });

  it('follows an off-axis centre and a focal point given as (x0, y0, z0)', () => {
    const a = compiled(script('lens(focal: 800 um, centre: (-40 um, 10 um))')).pieces[0].field;
    const b = compiled(script('lens_to(focus: (-40 um, 10 um, 0.8 mm))')).pieces[0].field;
    const r1 = Math.sqrt(LAMBDA * 800 + (LAMBDA / 2) ** 2);
    expect(a.phase(-40 + r1, 10)).toBeCloseTo(-Math.PI, 9);
    expect(b.phase(-40, 10 + r1)).toBeCloseTo(-Math.PI, 9);
  });

  // Paraxial limit: √(r² + f²) − f = r²/(2f) − r⁴/(8f³) + … (binomial series, from memory), so the
  // exact phase tends to −πr²/(λf) with a relative difference of about r²/(4f²).
  it('tends to the paraxial phase −πr²/(λf) for r ≪ f', () => {
    const r = 50;
    for (const f of [1e3, 1e4, 1e5]) {
      const exact = compiled(script(`lens(focal: ${f} um)`)).pieces[0].field.phase(r, 0);
      const paraxial = -Math.PI * r * r / (LAMBDA * f);
      expect(Math.abs(exact / paraxial - 1)).toBeLessThan((r * r) / (4 * f * f) * 1.01);
      expect(Math.abs(exact / paraxial - 1)).toBeGreaterThan((r * r) / (4 * f * f) * 0.98);
      expect(compiled(script(`paraxial_lens(focal: ${f} um)`)).pieces[0].field.phase(r, 0)).toBeCloseTo(paraxial, 9);
    }
  });

  it('has the local frequency r/(λ√(r² + f²)) at the farthest point of a box (the bound geometry samples from)', () => {
    const field = compiled(script('lens(focal: 1 mm)')).pieces[0].field;
    const far = Math.hypot(230, 120);
    expect(field.maxSpatialFrequency(100, 50, 230, 120)).toBeCloseTo(far / (LAMBDA * Math.hypot(far, 1000)), 12);
  });
});

describe('grating and axicon against the grating equation', () => {
  // Grating equation at normal incidence: sin θ = mλ/Λ (first order m = 1).
  it('a grating given by angle has period λ/sin θ', () => {
    for (const deg of [1, 5, 10, 30]) {
      const field = compiled(script(`grating(angle: ${deg} deg)`)).pieces[0].field;
      const period = LAMBDA / Math.sin((deg * Math.PI) / 180);
      expect(field.phase(17 + period, 3) - field.phase(17, 3)).toBeCloseTo(2 * Math.PI, 9);
      expect(field.maxSpatialFrequency(-100, -100, 100, 100)).toBeCloseTo(1 / period, 12);
    }
  });
  it('a grating by period deflects along its direction', () => {
    const field = compiled(script('grating(period: 20 um, direction: 90 deg)')).pieces[0].field;
    expect(field.phase(5, 20) - field.phase(5, 0)).toBeCloseTo(2 * Math.PI, 9);
    expect(field.phase(25, 0) - field.phase(5, 0)).toBeCloseTo(0, 9);
  });
  it('an axicon given by angle has radial period λ/sin β', () => {
    const field = compiled(script('axicon(angle: 2 deg)')).pieces[0].field;
    const period = LAMBDA / Math.sin((2 * Math.PI) / 180);
    expect(field.phase(0, 10) - field.phase(0, 10 + period)).toBeCloseTo(2 * Math.PI, 9);
  });
});

describe('unit conversions (SI prefixes; 180° = π rad; 1 wave = 2π rad)', () => {
  it('gives the same lens for 1 mm, 1000 um, 1000000 nm and 0.001 m', () => {
    const phases = ['1 mm', '1000 um', '1000000 nm', '0.001 m', '1000 µm'].map((f) => compiled(script(`lens(focal: ${f})`)).pieces[0].field.phase(123, 45));
    for (const p of phases) expect(p).toBeCloseTo(phases[0], 12);
  });
  it('converts angles and phases to radians', () => {
    const phaseOf = (text: string): number => compiled(script(text)).pieces[0].field.phase(0, 0);
    expect(phaseOf('180 deg')).toBeCloseTo(Math.PI, 15);
    expect(phaseOf('0.25 waves')).toBeCloseTo(Math.PI / 2, 15);
    expect(phaseOf('1500 mrad')).toBeCloseTo(1.5, 15);
    expect(phaseOf('2 * pi * 1 mm / 1000 um')).toBeCloseTo(2 * Math.PI, 15);
    expect(compiled(script('lens(focal: 1 mm)', '', 'circle(diameter: 460 um)', '0.405 um')).wavelength).toBeCloseTo(0.405, 15);
  });
});

describe('vortex and combinations', () => {
  it('a vortex of charge m winds by 2πm around its centre', () => {
    const field = compiled(script('vortex(charge: 3, centre: (10 um, 0 um))')).pieces[0].field;
    let total = 0;
    let last = field.phase(20, 0);
    for (let k = 1; k <= 360; k++) {
      const a = (k * Math.PI) / 180;
      const p = field.phase(10 + 10 * Math.cos(a), 10 * Math.sin(a));
      let d = p - last;
      d -= 2 * Math.PI * Math.round(d / (2 * Math.PI));
      total += d;
      last = p;
    }
    expect(total).toBeCloseTo(6 * Math.PI, 9);
  });

  it('bounds a spiral by |m|/ρ, capped at |m|/λ inside the core of radius λ/(2π)', () => {
    const field = compiled(script('vortex(charge: -2)')).pieces[0].field;
    expect(field.maxSpatialFrequency(-5, -5, 5, 5)).toBeCloseTo(2 / LAMBDA, 12);
    expect(field.maxSpatialFrequency(10, 0, 20, 0)).toBeCloseTo(2 / (2 * Math.PI * 10), 12);
    expect(compiled(script('3 * theta')).pieces[0].field.maxSpatialFrequency(-1, -1, 1, 1)).toBeCloseTo(3 / LAMBDA, 12);
  });

  it('a combination is the complex sum Σ w·exp(i(φ + c)) and its phase is the argument', () => {
    const design = compiled(script('superpose(wave(lens(focal: 800 um, centre: (-40 um, 0 um)), weight: 0.6, offset: 0.25 waves), wave(lens(focal: 1.2 mm), weight: 0.4))'));
    const one = compiled(script('lens(focal: 800 um, centre: (-40 um, 0 um))')).pieces[0].field;
    const two = compiled(script('lens(focal: 1.2 mm)')).pieces[0].field;
    const field = design.pieces[0].field;
    for (const [x, y] of [[0, 0], [55, -31], [-200, 90]]) {
      const re = 0.6 * Math.cos(one.phase(x, y) + Math.PI / 2) + 0.4 * Math.cos(two.phase(x, y));
      const im = 0.6 * Math.sin(one.phase(x, y) + Math.PI / 2) + 0.4 * Math.sin(two.phase(x, y));
      field.field(x, y, out);
      expect(out[0]).toBeCloseTo(re, 12);
      expect(out[1]).toBeCloseTo(im, 12);
      expect(field.phase(x, y)).toBeCloseTo(Math.atan2(im, re), 12);
    }
    expect(design.foci).toEqual([
      { x: -40, y: 0, z: 800, weight: 0.6 },
      { x: 0, y: 0, z: 1200, weight: 0.4 },
    ]);
  });

  it('fieldRow and phaseRow agree with the point forms', () => {
    for (const profile of ['lens(focal: 1 mm)', 'superpose(lens(focal: 1 mm), wave(lens(focal: 2 mm), weight: 2))']) {
      const field = compiled(script(profile)).pieces[0].field;
      const xs = Float64Array.from({ length: 33 }, (_, i) => -230 + i * 14);
      const re = new Float64Array(33);
      const im = new Float64Array(33);
      const ph = new Float64Array(33);
      field.fieldRow(12, xs, re, im);
      field.phaseRow!(12, xs, ph);
      xs.forEach((x, i) => {
        field.field(x, 12, out);
        expect(re[i]).toBeCloseTo(out[0], 12);
        expect(im[i]).toBeCloseTo(out[1], 12);
        expect(ph[i]).toBeCloseTo(field.phase(x, 12), 12);
      });
    }
  });
});

describe('maxSpatialFrequency never under-estimates', () => {
  // Checked against finite differences of the phase at random points of random boxes.
  const profiles = [
    'lens(focal: 1 mm)',
    'lens(focal: 300 um, centre: (50 um, -20 um))',
    'paraxial_lens(focal: 2 mm)',
    'cylindrical_lens(focal: 700 um, axis: 30 deg)',
    'grating(period: 7 um, direction: 20 deg)',
    'axicon(period: 12 um)',
    'lens(focal: 1 mm) + vortex(charge: 2)',
    '3 * sin(2 * pi * x / 40 um) + x * y / (100 um)^2',
    'sqrt(x^2 + y^2 + (30 um)^2) / 1 um',
    'exp(r / 200 um) + atan2(y, x + 400 um) * 5',
    'if r < 100 um then lens(focal: 1 mm) else lens(focal: 2 mm)',
    'mod(lens(focal: 1 mm), 2 * pi) + abs(x) / 3 um',
    'hypot(x, y) / 1 um + min(x, y) / 2 um - max(x, 3 um) / 5 um',
  ];
  it.each(profiles)('%s', (profile) => {
    const field = compiled(script(profile)).pieces[0].field;
    fc.assert(
      fc.property(fc.double({ min: -250, max: 250, noNaN: true }), fc.double({ min: -250, max: 250, noNaN: true }), fc.double({ min: 0.5, max: 200, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), (x0, y0, size, u, v) => {
        const bound = field.maxSpatialFrequency(x0, y0, x0 + size, y0 + size);
        const h = 1e-4;
        const x = x0 + h + u * (size - 2 * h);
        const y = y0 + h + v * (size - 2 * h);
        // inside the core λ/(2π) of a phase singularity the bound is capped by rule (see DEVELOPERS.md)
        if (Math.hypot(x, y) < LAMBDA / (2 * Math.PI)) return;
        let gx = (field.phase(x + h, y) - field.phase(x - h, y)) / (2 * h);
        let gy = (field.phase(x, y + h) - field.phase(x, y - h)) / (2 * h);
        // steps across a wrap, a branch cut or an `if` boundary are edges, not frequency
        if (Math.abs(gx) * h > 1 || Math.abs(gy) * h > 1) return;
        gx = Math.abs(gx);
        gy = Math.abs(gy);
        expect(Math.hypot(gx, gy) / (2 * Math.PI)).toBeLessThanOrEqual(bound * (1 + 1e-5) + 1e-9);
      }),
      { numRuns: 300 },
    );
  });
});
