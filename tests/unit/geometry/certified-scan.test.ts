import { readFileSync } from 'node:fs';
import path from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { CompiledDesign, PhaseField } from '@/lib/design/types';
import { boundaryFunction, layerFunctionSpecs } from '@/lib/geometry/boundary-function';
import { combinationStep, scanSegment } from '@/lib/geometry/scan-segment';
import { compileScript } from '@/lib/lang';

/**
 * The scan's guarantee for combined fields, checked against a reference outside the algorithm:
 * g sampled every nanometre along the same segment, counting sign changes.
 */

const examples = path.resolve(__dirname, '../../../examples');

function compiled(source: string): CompiledDesign {
  const result = compileScript(source);
  if (!result.ok) throw new Error(result.diagnostics.map((d) => d.message).join('; '));
  return result.design;
}

const twoFocus = compiled(readFileSync(path.join(examples, 'two-focus-offaxis.zw'), 'utf8'));
/**
 * Three lenses whose weights 0.4, 0.35, 0.25 can cancel: u has isolated zeros (phase singularities).
 * Eight levels give three masks with boundaries every π, π/2 and π/4 of phase, so 2, 4 and 8
 * boundaries leave each zero.
 */
const threeLenses = compiled(`wavelength 405 nm
aperture circle(diameter: 300 um)
profile superpose(wave(lens(focal: 600 um, centre: (-20 um, 0 um)), weight: 0.4), wave(lens(focal: 900 um, centre: (30 um, 10 um)), weight: 0.35), wave(lens(focal: 700 um, centre: (0 um, 40 um)), weight: 0.25))
quantize multilevel(levels: 8)
`);

function layerOf(design: CompiledDesign, mask = 0) {
  const spec = layerFunctionSpecs(design.quantization)[mask];
  const field = design.pieces[0].field;
  return { field, g: boundaryFunction(field, spec).value, phaseGap: spec.phaseGap };
}

/** Sign changes of g between samples 1 nm apart, as positions in µm from A. */
function denseCrossings(g: (x: number, y: number) => number, ax: number, ay: number, bx: number, by: number): number[] {
  const length = Math.hypot(bx - ax, by - ay);
  const n = Math.ceil(length / 1e-3);
  const out: number[] = [];
  let previous = g(ax, ay) > 0;
  for (let i = 1; i <= n; i++) {
    const t = i / n;
    const now = g(ax + t * (bx - ax), ay + t * (by - ay)) > 0;
    if (now !== previous) out.push((t - 0.5 / n) * length);
    previous = now;
  }
  return out;
}

/** The same field with only the parts' frequency bound: the sampling used before the |u|-scaled step. */
const partsBoundOnly = (field: PhaseField) => ({ field: field.field, maxSpatialFrequency: field.maxSpatialFrequency });

/** Newton's method on u = 0 seen as two real equations, with a finite-difference Jacobian. */
function fieldZero(field: PhaseField, x: number, y: number): { x: number; y: number; modulus: number } {
  const out = new Float64Array(2);
  const at = (px: number, py: number) => {
    field.field(px, py, out);
    return [out[0], out[1]];
  };
  const h = 1e-6;
  for (let i = 0; i < 50; i++) {
    const [re, im] = at(x, y);
    const [rx, ix] = at(x + h, y).map((v, k) => (v - [re, im][k]) / h);
    const [ry, iy] = at(x, y + h).map((v, k) => (v - [re, im][k]) / h);
    const det = rx * iy - ry * ix;
    x -= (iy * re - ry * im) / det;
    y -= (rx * im - ix * re) / det;
  }
  const [re, im] = at(x, y);
  return { x, y, modulus: Math.hypot(re, im) };
}

describe('scanSegment on combined fields finds what 1 nm sampling finds', () => {
  const { field, g, phaseGap } = layerOf(twoFocus);
  // the example's aperture is a 460 µm disc; its foci lie over (−40, 0) and (60, 25) µm
  const lines: [string, number, number, number, number][] = [
    ['y = 0', -229, 0, 229, 0],
    ['y = −97 µm', -205, -97, 205, -97],
    ['x = 10 µm', 10, -229, 10, 229],
    ['the line through both foci', -40 - 4 * 50, -50, 60 + 4 * 35, 25 + 35],
  ];
  it.each(lines)('two-focus-offaxis.zw along %s', (_name, ax, ay, bx, by) => {
    const reference = denseCrossings(g, ax, ay, bx, by);
    const length = Math.hypot(bx - ax, by - ay);
    const found = scanSegment(g, field, phaseGap, ax, ay, bx, by, 1e-4).t.map((t) => t * length);
    expect(found.length).toBe(reference.length);
    found.forEach((s, i) => expect(Math.abs(s - reference[i])).toBeLessThan(1e-3));
  });

  it('while the parts’ frequency bound alone skips crossings on those lines (|∇arg u| reaches 5× it for weights 0.6/0.4)', () => {
    let reference = 0;
    let partsOnly = 0;
    for (const [, ax, ay, bx, by] of lines) {
      reference += denseCrossings(g, ax, ay, bx, by).length;
      partsOnly += scanSegment(g, partsBoundOnly(field), phaseGap, ax, ay, bx, by, 1e-4).t.length;
    }
    expect(partsOnly).toBeLessThan(reference);
  });

  it('near a zero of the field of three lenses, at 10 nm to 1 µm from it, on every mask', () => {
    let partsOnlyMissed = 0;
    for (const mask of [0, 1, 2]) {
      const three = layerOf(threeLenses, mask);
      const zero = fieldZero(three.field, 7.94, -128.84);
      expect(zero.modulus).toBeLessThan(1e-9);
      for (const distance of [0.01, 0.03, 0.1, 0.3, 1]) {
        for (const angle of [0.3, 1.9, 4]) {
          // a 20 µm segment whose closest point to the zero is `distance` away
          const cx = zero.x - distance * Math.sin(angle);
          const cy = zero.y + distance * Math.cos(angle);
          const [ax, ay, bx, by] = [cx - 10 * Math.cos(angle), cy - 10 * Math.sin(angle), cx + 10 * Math.cos(angle), cy + 10 * Math.sin(angle)];
          const reference = denseCrossings(three.g, ax, ay, bx, by);
          const found = scanSegment(three.g, three.field, three.phaseGap, ax, ay, bx, by, 1e-4).t.map((t) => t * 20);
          expect(found.length).toBe(reference.length);
          found.forEach((s, i) => expect(Math.abs(s - reference[i])).toBeLessThan(1e-3));
          partsOnlyMissed += reference.length - scanSegment(three.g, partsBoundOnly(three.field), three.phaseGap, ax, ay, bx, by, 1e-4).t.length;
        }
      }
    }
    expect(partsOnlyMissed).toBeGreaterThan(0);
  });
});

describe('combinationStep', () => {
  // Over one step from s, arg u (unwrapped along 2000 sub-samples) may turn by at most
  // SAFETY·phaseGap = 0.9·phaseGap, whatever |u(s)| is; reference: the sampled phase itself.
  const turnOverStep = (field: PhaseField, phaseGap: number, x: number, y: number, angle: number, box: number) => {
    const out = new Float64Array(2);
    field.field(x, y, out);
    const bound = field.maxFieldGradient!(x - box, y - box, x + box, y + box);
    const h = Math.min(box, combinationStep(phaseGap, Math.hypot(out[0], out[1]), bound));
    let previous = Math.atan2(out[1], out[0]);
    let phase = 0;
    let turn = 0;
    for (let i = 1; i <= 2000; i++) {
      const t = (h * i) / 2000;
      field.field(x + t * Math.cos(angle), y + t * Math.sin(angle), out);
      const now = Math.atan2(out[1], out[0]);
      phase += ((now - previous + 3 * Math.PI) % (2 * Math.PI)) - Math.PI;
      previous = now;
      turn = Math.max(turn, Math.abs(phase));
    }
    return turn;
  };

  it('keeps the turn of arg u below 0.9·phaseGap over random steps of the two-focus example', () => {
    const { field, phaseGap } = layerOf(twoFocus);
    fc.assert(
      fc.property(fc.double({ min: -160, max: 160, noNaN: true }), fc.double({ min: -160, max: 160, noNaN: true }), fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }), (x, y, angle) => {
        expect(turnOverStep(field, phaseGap, x, y, angle, 20)).toBeLessThanOrEqual(0.9 * phaseGap);
      }),
      { numRuns: 200 },
    );
  });

  it('and next to a zero of the three-lens field, where the step shrinks with |u|', () => {
    const { field, phaseGap } = layerOf(threeLenses, 2);
    const zero = fieldZero(field, 7.94, -128.84);
    fc.assert(
      fc.property(fc.double({ min: 1e-4, max: 2, noNaN: true }), fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }), fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }), (r, where, angle) => {
        const turn = turnOverStep(field, phaseGap, zero.x + r * Math.cos(where), zero.y + r * Math.sin(where), angle, 3);
        expect(turn).toBeLessThanOrEqual(0.9 * phaseGap);
      }),
      { numRuns: 200 },
    );
  });
});
