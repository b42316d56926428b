import { describe, expect, it } from 'vitest';
import type { CompiledDesign } from '@/lib/design/types';
import { buildMask, xorLayers } from '@/lib/geometry';
import { compileScript } from '@/lib/lang';
import { area, drawnTester, rng, selfIntersects, traceMask, unionArea, zonePolygons } from './checks';

/** Lens plus vortex about one centre: the spiral path (lib/geometry/spiral-mask.ts). */

const R = 150;
function vortexPlate(charge: number, quantize: string, aperture = `circle(diameter: ${2 * R} um)`): CompiledDesign {
  const result = compileScript(`wavelength 405 nm
aperture ${aperture}
profile lens(focal: 800 um) + vortex(charge: ${charge})
quantize ${quantize}
`);
  if (!result.ok) throw new Error(result.diagnostics.map((d) => d.message).join('; '));
  return result.design;
}

function perimeter(p: ArrayLike<number>): number {
  let s = 0;
  for (let i = 0, j = p.length - 2; i < p.length; j = i, i += 2) s += Math.hypot(p[i] - p[j], p[i + 1] - p[j + 1]);
  return s;
}

/** Simple, counter-clockwise, within the vertex cap and non-overlapping. */
function expectClean(polygons: Int32Array[], maxVertices = 4095) {
  expect(polygons.length).toBeGreaterThan(0);
  for (const p of polygons) {
    expect(p.length / 2).toBeLessThanOrEqual(maxVertices);
    expect(area(p)).toBeGreaterThan(0);
    expect(selfIntersects(p)).toBe(false);
  }
  const sum = polygons.reduce((s, p) => s + area(p), 0);
  expect(Math.abs(unionArea(polygons) - sum)).toBeLessThanOrEqual(1e-9 * sum + 1);
}

/**
 * Random points of the disc where a mask disagrees with the contract (lib/design/types.ts), written
 * out: L = floor(mod(φ − φ0, 2π)·2^bits/2π) and mask k drawn where bit (bits − k) of L is set; binary
 * drawn where |wrap(φ − φ0)| < π·d. Points within 2 % of a level step of an edge, or inside the
 * inner radius, are skipped.
 */
function disagreements(design: CompiledDesign, polygons: Int32Array[], mask: number, count: number, seed: number, inner = 1): number {
  const q = design.quantization;
  const field = design.pieces[0].field;
  const drawn = drawnTester(polygons);
  const random = rng(seed);
  let wrong = 0;
  for (let k = 0; k < count; k++) {
    const x = R * (2 * random() - 1);
    const y = R * (2 * random() - 1);
    if (Math.hypot(x, y) > R - 0.05 || Math.hypot(x, y) < inner + 0.05) continue;
    const psi = (((field.phase(x, y) - q.phaseOffset) % (2 * Math.PI)) + 2 * Math.PI) % (2 * Math.PI);
    let expected: boolean;
    let margin: number;
    if (q.kind === 'binary') {
      const wrapped = psi > Math.PI ? psi - 2 * Math.PI : psi;
      expected = Math.abs(wrapped) < Math.PI * q.duty;
      margin = Math.abs(Math.abs(wrapped) - Math.PI * q.duty);
      if (q.tone === 'negative') expected = !expected;
    } else {
      const levels = 2 ** q.bits;
      const step = (2 * Math.PI) / levels;
      const level = Math.floor(psi / step);
      expected = ((level >> (q.bits - mask)) & 1) === 1;
      margin = Math.min(psi - level * step, (level + 1) * step - psi);
    }
    if (margin < 0.02 * ((2 * Math.PI) / 2 ** (q.kind === 'binary' ? 1 : q.bits))) continue;
    if (drawn(x, y) !== expected) wrong++;
  }
  return wrong;
}

describe('vortex plates (lens plus vortex about one centre)', () => {
  it('are recognised by the compiler, with the charge of the sum', () => {
    expect(vortexPlate(3, 'binary(duty: 0.5)').spiral).toEqual({ x: 0, y: 0, charge: 3 });
    const minus = compileScript('wavelength 405 nm\naperture circle(diameter: 100 um)\nprofile lens(focal: 1 mm) - vortex(charge: 2) + 0.5\nquantize binary(duty: 0.5)\n');
    expect(minus.ok && minus.design.spiral).toEqual({ x: 0, y: 0, charge: -2 });
    const offCentre = compileScript('wavelength 405 nm\naperture circle(diameter: 100 um)\nprofile lens(focal: 1 mm) + vortex(charge: 2, centre: (5 um, 0 um))\nquantize binary(duty: 0.5)\n');
    expect(offCentre.ok && offCentre.design.spiral).toBeNull();
  });

  it.each([
    [3, 'binary(duty: 0.5)', 0.5],
    [5, 'binary(duty: 0.3)', 0.3],
    [-4, 'binary(duty: 0.5, tone: negative)', 0.5],
  ])('charge %i, %s: clean polygons, the contract at 3000 points, and the open area duty·πR²', (charge, quantize, open) => {
    const design = vortexPlate(charge, quantize);
    const chordTolerance = 0.005;
    const polygons = zonePolygons(buildMask(design, { chordTolerance }).library);
    expectClean(polygons);
    expect(disagreements(design, polygons, 1, 3000, 31)).toBe(0);
    // each circle of radius r is drawn on a fraction `open` of its length (elementary geometry), so
    // the drawn area is open·πR², up to chords sagging the tolerance along every edge, plus the grid
    const areaUm2 = polygons.reduce((s, p) => s + area(p), 0) / 1e6;
    const edgeLength = polygons.reduce((s, p) => s + perimeter(p), 0) / 1e3;
    expect(Math.abs(areaUm2 - open * Math.PI * R * R)).toBeLessThanOrEqual((chordTolerance + 0.001) * edgeLength);
  });

  it('charge 3 on four levels and on a ring: both masks follow the level bits', () => {
    const design = vortexPlate(3, 'multilevel(levels: 4, index: 1.47)', `ring(inner: 20 um, outer: ${R} um)`);
    const { library } = buildMask(design, { chordTolerance: 0.005 });
    for (const mask of [1, 2]) {
      const polygons = zonePolygons(library, mask, 0);
      expectClean(polygons);
      expect(disagreements(design, polygons, mask, 3000, 40 + mask, 20)).toBe(0);
      // nothing in the ring's hole
      const drawn = drawnTester(polygons);
      for (let a = 0; a < 2 * Math.PI; a += 0.1) for (const r of [1, 10, 19.9]) expect(drawn(r * Math.cos(a), r * Math.sin(a))).toBe(false);
    }
  });

  it('charge 2 gives the contour tracer’s mask: the XOR is no wider than the chord tolerance plus the grid along the edges', () => {
    const design = vortexPlate(2, 'binary(duty: 0.5)');
    const spiral = buildMask(design, { chordTolerance: 0.005 }).library;
    const traced = traceMask(design, { chordTolerance: 0.005 }).library;
    const xor = xorLayers(traced, spiral).perLayer[0];
    const edgeLength = zonePolygons(spiral).reduce((s, p) => s + perimeter(p), 0) / 1e3;
    expect(xor.addedArea + xor.removedArea).toBeLessThanOrEqual(2 * (0.005 + 0.001) * edgeLength);
  });
});
