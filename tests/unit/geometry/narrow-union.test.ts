import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { compileScript } from '@/lib/lang';
import { buildMask } from '@/lib/geometry';
import { narrowPlaces, openingLoss } from '@/lib/geometry/narrow-features';
import { signedArea } from '@/lib/geometry/polygon-math';
import { splitByHorizontalLine, splitByVerticalLine } from '@/lib/geometry/split-by-line';

// Grid units of 1 nm, a process minimum of 1 µm and a 5 nm chord tolerance (the mask defaults).
const minimum = 1000;
const chord = 5;

/** A rectangle `length` × `width` (grid units) centred on (cx, cy), turned by `angle`, counter-clockwise, on the grid. */
function turnedRectangle(cx: number, cy: number, length: number, width: number, angle: number): Float64Array {
  const c = Math.cos(angle);
  const s = Math.sin(angle);
  const corners = [
    [-length / 2, -width / 2],
    [length / 2, -width / 2],
    [length / 2, width / 2],
    [-length / 2, width / 2],
  ];
  return Float64Array.from(corners.flatMap(([u, v]) => [Math.round(cx + u * c - v * s), Math.round(cy + u * s + v * c)]));
}

const lostAlone = (piece: Float64Array) => openingLoss([piece], minimum, chord).reduce((a, l) => a + Math.max(0, signedArea(l)), 0);

describe('narrow features are measured on the drawn pattern, not on fractured pieces', () => {
  it('a narrow zone cut in two by a fracture cut is one place, where the zone is', () => {
    // A strip 0.6 µm wide and 20 µm long, tilted by 20°: no disk of the minimum's diameter fits in
    // it, so the opening removes all of it (erosion by half the minimum leaves nothing), and its
    // area is length × width. Cut by the vertical line through its centre into two pieces.
    const strip = turnedRectangle(50_000, 30_000, 20_000, 600, (20 * Math.PI) / 180);
    const { left, right } = splitByVerticalLine([strip], 50_000);
    expect(left).toHaveLength(1);
    expect(right).toHaveLength(1);
    const places = narrowPlaces([...left, ...right], () => true, minimum, chord);
    expect(places).toHaveLength(1);
    // area 20 µm × 0.6 µm up to the rounding of the corners to the grid
    expect(places[0].area / 1e6).toBeCloseTo(12, 1);
    // the strip's centre, which its centroid is (a rectangle is symmetric about its centre)
    expect(Math.hypot(places[0].x - 50_000, places[0].y - 30_000)).toBeLessThan(10);
  });

  it('a wide zone crossed at a shallow angle by a cut gives no place, though each piece alone has a thin wedge', () => {
    // A 3 µm × 60 µm rectangle at 5° to a horizontal cut through its centre. The union is the
    // rectangle: every side is at least the minimum and its corners are right angles, which a
    // mitred opening gives back whole, so the opening removes nothing but grid rounding. Each piece
    // alone ends in a 5° wedge that stays narrower than 1 µm over 1/tan 5° ≈ 11 µm: about 5.7 µm²,
    // far over a quarter of the minimum squared.
    const wide = turnedRectangle(0, 0, 60_000, 3_000, (5 * Math.PI) / 180);
    const { below, above } = splitByHorizontalLine([wide], 0);
    expect(below).toHaveLength(1);
    expect(above).toHaveLength(1);
    for (const piece of [...below, ...above]) expect(lostAlone(piece)).toBeGreaterThan(0.25 * minimum * minimum);
    expect(narrowPlaces([...below, ...above], () => true, minimum, chord)).toHaveLength(0);
  });

  it('the same wide zone next to a narrow one cut by the same line reports the narrow one only, once', () => {
    // the wide rectangle above and a 0.5 µm strip parallel to it 2 µm away, both crossing y = 0
    const wide = turnedRectangle(0, 0, 60_000, 3_000, (5 * Math.PI) / 180);
    const narrow = turnedRectangle(-Math.sin((5 * Math.PI) / 180) * 3_750, Math.cos((5 * Math.PI) / 180) * 3_750, 60_000, 500, (5 * Math.PI) / 180);
    const { below, above } = splitByHorizontalLine([wide, narrow], 0);
    const places = narrowPlaces([...below, ...above], () => true, minimum, chord);
    expect(places).toHaveLength(1);
    expect(places[0].area / 1e6).toBeCloseTo(30, 0);
  });

  it("finds the single-focus example's outer zones under 1 µm, once per zone, on the zone", () => {
    // Zone radii of a lens of focal length f at wavelength λ: r_n² = nλf + (nλ/2)², n half-wave
    // steps of the optical path (the standard zone-plate construction, from memory). Drawn with
    // duty 0.5 centred on phase 0: zone j runs from n = 2j − ½ to 2j + ½ (the first from the centre),
    // cut by the 230 µm aperture.
    const lambda = 0.405;
    const f = 1000;
    const aperture = 230;
    const r = (n: number) => Math.sqrt(n * lambda * f + (n * lambda / 2) ** 2);
    const narrowZones: { inner: number; outer: number }[] = [];
    for (let j = 1; r(2 * j - 0.5) < aperture; j++) {
      const inner = r(2 * j - 0.5);
      const outer = Math.min(r(2 * j + 0.5), aperture);
      if (outer - inner < 1) narrowZones.push({ inner, outer });
    }
    expect(narrowZones.length).toBeGreaterThan(5);
    const compiled = compileScript(readFileSync('examples/single-focus-405.zw', 'utf8'));
    if (!compiled.ok) throw new Error('the example does not compile');
    const { report } = buildMask(compiled.design, { minimumFeature: 1 });
    expect(report.narrowFeatureCount).toBe(narrowZones.length);
    const hits = narrowZones.map(() => 0);
    for (const place of report.narrowFeatures) {
      const radius = Math.hypot(place.x_um, place.y_um);
      const zone = narrowZones.findIndex((z) => radius > z.inner - 0.01 && radius < z.outer + 0.01);
      expect(zone).toBeGreaterThanOrEqual(0);
      hits[zone]++;
      // the whole ring is lost: its area is π(outer² − inner²), up to the chords
      const { inner, outer } = narrowZones[zone];
      expect(Math.abs(place.area_um2 - Math.PI * (outer * outer - inner * inner)) / place.area_um2).toBeLessThan(0.01);
    }
    expect(hits.every((h) => h === 1)).toBe(true);
  });
});
