import ClipperLib from 'clipper-lib';
import { describe, expect, it } from 'vitest';
import { sizeBias } from '@/lib/geometry/size-bias';
import { area } from './checks';

// Lengths in database units of 1 nm: 1 µm = 1000.
const SAG = 5;

/** A circle as a chord polygon with vertices on it (rounded to the grid), sagging at most SAG; clockwise for a hole. */
function circle(r: number, clockwise = false): Float64Array {
  const n = Math.ceil(Math.PI / Math.acos(1 - SAG / r));
  const out = new Float64Array(2 * n);
  for (let i = 0; i < n; i++) {
    const a = ((clockwise ? -2 : 2) * Math.PI * i) / n;
    out[2 * i] = Math.round(r * Math.cos(a));
    out[2 * i + 1] = Math.round(r * Math.sin(a));
  }
  return out;
}

/** The annulus r1..r2 as two hole-free halves (above and below y = 0) sharing their cut edges, as fractured masks are. */
function ringHalves(r1: number, r2: number): Float64Array[] {
  const half = (sign: 1 | -1) => {
    const n = 400;
    const points: number[] = [];
    for (let i = 0; i <= n; i++) points.push(Math.round(r2 * Math.cos((sign * Math.PI * i) / n)), Math.round(sign * r2 * Math.sin((Math.PI * i) / n)));
    for (let i = n; i >= 0; i--) points.push(Math.round(r1 * Math.cos((sign * Math.PI * i) / n)), Math.round(sign * r1 * Math.sin((Math.PI * i) / n)));
    const loop = Float64Array.from(points);
    return area(loop) > 0 ? loop : reverse(loop);
  };
  return [half(1), half(-1)];
}

function reverse(loop: Float64Array): Float64Array {
  const out = new Float64Array(loop.length);
  for (let i = 0; i < loop.length; i += 2) {
    out[loop.length - 2 - i] = loop[i];
    out[loop.length - 1 - i] = loop[i + 1];
  }
  return out;
}

const clipperPath = (loop: Float64Array): ClipperLib.Path => Array.from({ length: loop.length / 2 }, (_, i) => ({ X: loop[2 * i], Y: loop[2 * i + 1] }));
const square = (x0: number, y0: number, x1: number, y1: number): ClipperLib.Path[] => [[{ X: x0, Y: y0 }, { X: x1, Y: y0 }, { X: x1, Y: y1 }, { X: x0, Y: y1 }]];
const far = square(-1e7, -1e7, 1e7, 1e7);
const total = (loops: ArrayLike<number>[]) => loops.reduce((s, p) => s + area(p), 0);

/**
 * Chord polygons lie inside their circles: each boundary of radius r loses less than its length times
 * the sag, and grid rounding moves each edge by at most half a unit.
 */
const chordTolerance = (...radii: number[]) => radii.reduce((s, r) => s + 2 * Math.PI * r * (SAG + 0.5), 0);

describe('size bias', () => {
  it('grows and shrinks a ring as the annulus area π((r2 + b/2)² − (r1 − b/2)²) says (elementary geometry)', () => {
    const r1 = 20_000;
    const r2 = 30_000;
    const pieces = ringHalves(r1, r2);
    for (const b of [-400, -100, 100, 400]) {
      const result = sizeBias(pieces, b, far, 4095);
      const expected = Math.PI * ((r2 + b / 2) ** 2 - (r1 - b / 2) ** 2);
      expect(Math.abs(total(result.polygons) - expected)).toBeLessThan(chordTolerance(r1, r2));
      expect(result).toMatchObject({ shapesBefore: 1, shapesAfter: 1, shapesLost: 0, shapesMerged: 0 });
    }
  });

  it('changes the area by b/2 times the outline length, to the grid, since both outlines sag alike', () => {
    // first-order change of an annulus: π b (r1 + r2) = (b/2)(2π r1 + 2π r2) (the b² terms cancel);
    // the offset vertices are rounded to the grid, so each edge moves by b/2 to within half a unit
    const r1 = 20_000;
    const r2 = 30_000;
    const pieces = ringHalves(r1, r2);
    const unbiased = total(sizeBias(pieces, 0, far, 4095).polygons);
    for (const b of [-200, 200]) {
      const changed = total(sizeBias(pieces, b, far, 4095).polygons);
      expect(Math.abs(changed - unbiased - Math.PI * b * (r1 + r2))).toBeLessThan(2 * Math.PI * (r1 + r2) * 0.5);
    }
  });

  it('moves square edges by exactly b/2 and keeps the corners square (mitred joins)', () => {
    // a 10 µm square grown by 1 µm is an 11 µm square: 121 µm² exactly, four corners
    const result = sizeBias([Float64Array.from([0, 0, 10_000, 0, 10_000, 10_000, 0, 10_000])], 1000, far, 4095);
    expect(result.polygons).toHaveLength(1);
    expect(result.polygons[0].length / 2).toBe(4);
    expect(area(result.polygons[0])).toBe(11_000 * 11_000);
    expect(Math.min(...result.polygons[0])).toBe(-500);
  });

  it('keeps a grown zone inside the aperture', () => {
    // the ring 20–30 µm grown by 2 µm would reach 31 µm; an aperture of 30.5 µm cuts it to π(30.5² − 19²)
    const r1 = 20_000;
    const r2 = 30_000;
    const aperture = 30_500;
    const clip = [clipperPath(circle(aperture))];
    const result = sizeBias(ringHalves(r1, r2), 2000, clip, 4095);
    const expected = Math.PI * (aperture ** 2 - (r1 - 1000) ** 2);
    expect(Math.abs(total(result.polygons) - expected)).toBeLessThan(chordTolerance(aperture, r1));
    for (const p of result.polygons) for (let i = 0; i < p.length; i += 2) expect(Math.hypot(p[i], p[i + 1])).toBeLessThanOrEqual(aperture + 1);
  });

  it('gives hole-free counter-clockwise pieces under the vertex cap', () => {
    const result = sizeBias([circle(30_000), circle(20_000, true)], 200, far, 300);
    expect(result.polygons.length).toBeGreaterThan(1);
    for (const p of result.polygons) {
      expect(p.length / 2).toBeLessThanOrEqual(300);
      expect(area(p)).toBeGreaterThan(0);
    }
  });

  it('reports a zone a negative bias erases, and keeps the others', () => {
    // rings 10–10.1 µm (0.1 µm wide) and 20–22 µm; a bias of −0.2 µm erases the first, leaves π(21.9² − 20.1²) of the second
    const pieces = [...ringHalves(10_000, 10_100), ...ringHalves(20_000, 22_000)];
    const result = sizeBias(pieces, -200, far, 4095);
    expect(result).toMatchObject({ shapesBefore: 2, shapesAfter: 1, shapesLost: 1 });
    expect(Math.abs(total(result.polygons) - Math.PI * (21_900 ** 2 - 20_100 ** 2))).toBeLessThan(chordTolerance(21_900, 20_100));
    const everything = sizeBias(pieces, -4000, far, 4095);
    expect(everything).toMatchObject({ polygons: [], shapesBefore: 2, shapesAfter: 0, shapesLost: 2 });
  });

  it('merges zones whose gap a positive bias closes', () => {
    // rings 10–11 µm and 11.1–12 µm (gap 0.1 µm); a bias of +0.2 µm joins them into the annulus 9.9–12.1 µm
    const result = sizeBias([...ringHalves(10_000, 11_000), ...ringHalves(11_100, 12_000)], 200, far, 4095);
    expect(result).toMatchObject({ shapesBefore: 2, shapesAfter: 1, shapesLost: 0, shapesMerged: 1 });
    expect(Math.abs(total(result.polygons) - Math.PI * (12_100 ** 2 - 9_900 ** 2))).toBeLessThan(chordTolerance(12_100, 9_900));
  });

  it('refuses a bias that is not a finite length', () => {
    for (const bad of [Number.NaN, Number.POSITIVE_INFINITY]) expect(() => sizeBias(ringHalves(1000, 2000), bad, far, 4095)).toThrow(/size bias must be a finite length/);
  });
});
