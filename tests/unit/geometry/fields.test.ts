import { describe, expect, it } from 'vitest';
import { buildMask, MaskOptionsError, xorLayers } from '@/lib/geometry';
import { compileScript } from '@/lib/lang';
import type { PhaseField, Quantization } from '@/lib/design/types';
import { area, drawnTester, rng, selfIntersects, unionArea, zonePolygons } from './checks';
import { binary, combinedField, design, lensField, vortexField } from './fixtures';

const circle = (r: number) => ({ kind: 'circle' as const, cx: 0, cy: 0, r });

/** Fraction of sample points (away from edges) where the mask agrees with `rule` (true = drawn). */
function agreement(polygons: Int32Array[], rule: (x: number, y: number) => number, R: number, seed: number): number {
  const drawn = drawnTester(polygons);
  const random = rng(seed);
  let agree = 0;
  let total = 0;
  for (let k = 0; k < 1500; k++) {
    const x = R * (2 * random() - 1);
    const y = R * (2 * random() - 1);
    if (Math.hypot(x, y) > R - 0.05) continue;
    const m = rule(x, y);
    const slope = Math.hypot(rule(x + 1e-4, y) - m, rule(x, y + 1e-4) - m) / 1e-4;
    if (!(Math.abs(m) > 0.02 * slope)) continue;
    total++;
    if (drawn(x, y) === m > 0) agree++;
  }
  return agree / total;
}

function checkClean(polygons: Int32Array[]) {
  for (const p of polygons) {
    expect(area(p)).toBeGreaterThan(0);
    expect(selfIntersects(p)).toBe(false);
  }
  const sum = polygons.reduce((s, p) => s + area(p), 0);
  expect(Math.abs(unionArea(polygons) - sum)).toBeLessThanOrEqual(1e-9 * sum + 1);
}

/** The contract's binary test on a combined field: Re(u·e^(−iφ0)) − cos(π·d)·|u|. */
const binaryRule = (field: PhaseField, duty: number, offset: number) => {
  const out = new Float64Array(2);
  return (x: number, y: number) => {
    field.field(x, y, out);
    const re = out[0] * Math.cos(offset) + out[1] * Math.sin(offset);
    return re - Math.cos(Math.PI * duty) * Math.hypot(out[0], out[1]);
  };
};

describe('phase singularities and combined fields', () => {
  // φ0 = 0, π/2 and π put wedge edges on the aperture polygon's vertices and two of them on one
  // straight line through the singular point, which a trace must not follow across it
  it.each([0.3, 0, Math.PI / 2, Math.PI])('a charge-3 spiral phase (φ0 = %f) gives three closed wedges covering the duty fraction of the disc', (offset) => {
    const R = 100;
    const field = vortexField(3);
    const { library } = buildMask(design(field, circle(R), binary(0.5, offset)));
    const polygons = zonePolygons(library);
    checkClean(polygons);
    // by symmetry the wedges cover exactly half of the disc (the inscribed aperture polygon's area)
    const disc = Math.PI * R * R;
    expect(Math.abs(polygons.reduce((s, p) => s + area(p), 0) / 1e6 / disc - 0.5)).toBeLessThan(0.002);
    expect(agreement(polygons, binaryRule(field, 0.5, offset), R, 3)).toBe(1);
  });

  it('two off-axis lenses with weights 0.6 and 0.4 (isolated zeros of the field) follow the contract test', () => {
    const R = 120;
    const field = combinedField([
      { field: lensField(0.405, 800, -30, 0), weight: 0.6 },
      { field: lensField(0.405, 1200, 40, 20), weight: 0.4 },
    ]);
    const { library } = buildMask(design(field, circle(R), binary(0.5, 0)));
    const polygons = zonePolygons(library);
    checkClean(polygons);
    expect(agreement(polygons, binaryRule(field, 0.5, 0), R, 5)).toBeGreaterThan(0.995);
  });

  it('the two-focus off-axis benchmark script (1.4 mm aperture), whose boundaries graze seed lines, builds and follows the contract test', () => {
    // Near destructive interference arg u outruns the parts' frequency bound, so a seed line can find
    // one of two close crossings of a boundary running almost along it; the tracer passes that seed twice.
    const compiled = compileScript(`wavelength 633 nm
aperture circle(diameter: 1.4 mm)
near = lens(focal: 20 mm)
far = lens_to(focus: (1 mm, 0.5 mm, 25 mm))
profile superpose(wave(near, weight: 0.6), wave(far, weight: 0.4))
quantize binary(duty: 0.5, modulation: phase, index: 1.6)
`);
    if (!compiled.ok) throw new Error(compiled.diagnostics.map((d) => d.message).join('; '));
    const field = compiled.design.pieces[0].field;
    const { library } = buildMask(compiled.design, { chordTolerance: 0.005 });
    const polygons = zonePolygons(library);
    checkClean(polygons);
    expect(agreement(polygons, binaryRule(field, 0.5, compiled.design.quantization.phaseOffset), 700, 11)).toBeGreaterThan(0.995);
  });

  it('two coaxial lenses of equal weight (the field vanishes on whole circles) follow the contract test', () => {
    const R = 120;
    const field = combinedField([
      { field: lensField(0.405, 600), weight: 1 },
      { field: lensField(0.405, 900), weight: 1 },
    ]);
    const { library } = buildMask(design(field, circle(R), binary(0.5, 0), { symmetryCentre: { x: 0, y: 0 } }));
    const polygons = zonePolygons(library);
    checkClean(polygons);
    expect(agreement(polygons, binaryRule(field, 0.5, 0), R, 7)).toBeGreaterThan(0.995);
  });
});

describe('multi-level masks', () => {
  it('mask k is drawn where bit (bits − k) of the phase level is set', () => {
    const R = 120;
    const field = lensField(0.405, 700);
    const q: Quantization = { kind: 'multilevel', bits: 2, phaseOffset: 0.3, refractiveIndex: 1.5 };
    const { library } = buildMask(design(field, circle(R), q, { symmetryCentre: { x: 0, y: 0 } }));
    expect(library.layers.map((l) => `${l.layer}/${l.datatype} ${l.purpose} ${l.levelIndex}`)).toEqual(['1/0 level 1', '2/0 level 2']);
    for (const k of [1, 2]) {
      const polygons = zonePolygons(library, k, 0);
      checkClean(polygons);
      // the contract's definition, written out: L = floor(mod(φ − φ0, 2π)·2^bits/2π); drawn where bit (bits − k) is set.
      // As a smooth test: distance of mod(φ − φ0, 2π) to the nearest level edge, signed by the bit.
      const rule = (x: number, y: number) => {
        const psi = (((field.phase(x, y) - 0.3) % (2 * Math.PI)) + 2 * Math.PI) % (2 * Math.PI);
        const level = Math.floor((psi * 4) / (2 * Math.PI));
        const set = ((level >> (2 - k)) & 1) === 1;
        const step = (2 * Math.PI) / 4;
        const toEdge = Math.min(psi - level * step, (level + 1) * step - psi);
        return set ? toEdge : -toEdge;
      };
      expect(agreement(polygons, rule, R, 11 + k)).toBeGreaterThan(0.995);
      // each mask covers half of the aperture (two of the four levels), to a fraction of the outer zone
      const fraction = polygons.reduce((s, p) => s + area(p), 0) / 1e6 / (Math.PI * R * R);
      expect(Math.abs(fraction - 0.5)).toBeLessThan(0.03);
    }
  });
});

describe('layer XOR', () => {
  it('is empty for identical masks and finds the analytic area a duty change adds', () => {
    const R = 150;
    const f = 1500;
    const lambda = 0.405;
    const make = (duty: number) => buildMask(design(lensField(lambda, f), circle(R), binary(duty, 0), { symmetryCentre: { x: 0, y: 0 } })).library;
    const a = make(0.5);
    const same = xorLayers(a, make(0.5)).perLayer[0];
    expect(same.addedArea + same.removedArea).toBe(0);
    const diff = xorLayers(a, make(0.6)).perLayer[0];
    // open where |wrap(φ)| < π·d; with φ = −2π·p/λ and r(p)² = p² + 2pf (textbook optics, from memory),
    // the drawn area is Σ π·(r(p_out)² − r(p_in)²) over the open path-difference intervals inside R.
    const drawnArea = (duty: number) => {
      const pMax = Math.sqrt(R * R + f * f) - f;
      const r2 = (p: number) => Math.min(R * R, p * p + 2 * p * f);
      let sum = 0;
      for (let k = 0; k * lambda <= pMax + lambda; k++) {
        const lo = Math.max(0, (k - duty / 2) * lambda);
        const hi = (k + duty / 2) * lambda;
        sum += Math.PI * (r2(hi) - r2(lo));
      }
      return sum;
    };
    const expected = drawnArea(0.6) - drawnArea(0.5);
    expect(Math.abs(diff.addedArea - expected) / expected).toBeLessThan(0.005);
    expect(diff.removedArea).toBeLessThan(1e-3 * expected);
  });
});

describe('options', () => {
  it('refuses vertex limits outside 199..8191 and tolerances finer than the grid allows, with a clear message', () => {
    const d = design(lensField(0.405, 1000), circle(50), binary());
    expect(() => buildMask(d, { maxVertices: 100 })).toThrow(MaskOptionsError);
    expect(() => buildMask(d, { maxVertices: 9000 })).toThrow(/199 to 8191/);
    expect(() => buildMask(d, { chordTolerance: 1e-5 })).toThrow(/finer than a tenth of the database grid/);
    expect(() => buildMask(design(lensField(0.405, 1000), circle(50), binary(1.2)))).toThrow(/duty cycle/);
  });
});
