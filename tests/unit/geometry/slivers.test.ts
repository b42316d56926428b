import { readFileSync, readdirSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { compileScript } from '@/lib/lang';
import { buildMask } from '@/lib/geometry';
import { fracture } from '@/lib/geometry/fracture';
import { averageWidth, signedArea } from '@/lib/geometry/polygon-math';
import { binary, design, lensField } from './fixtures';

/**
 * Area of the lens where two disks of radii r1, r2 with centres d apart overlap: each disk
 * contributes the circular segment cut off by the common chord, r²·acos(a/r) − a·√(r² − a²), with
 * a = (d² + r1² − r2²)/(2d) and d − a the chord's distances from the centres (circle–circle
 * intersection area, elementary geometry, from memory).
 */
function lensArea(r1: number, r2: number, d: number): number {
  const a1 = (d * d + r1 * r1 - r2 * r2) / (2 * d);
  const a2 = d - a1;
  const segment = (r: number, a: number) => r * r * Math.acos(a / r) - a * Math.sqrt(r * r - a * a);
  return segment(r1, a1) + segment(r2, a2);
}

// A lens of f = 1 mm at λ = 0.5 µm, binary with duty 0.5 and offset 0: drawn where |φ| < π/2, so the
// central zone is the disk where the optical path √(ρ² + f²) − f stays below λ/4 and the next drawn
// zone starts where it reaches 3λ/4 (exact lens phase, see fixtures.ts).
const wavelength = 0.5;
const focal = 1000;
const zoneRadius = (path: number) => Math.sqrt((focal + path) ** 2 - focal ** 2);
const rho1 = zoneRadius(wavelength / 4);
const rho2 = zoneRadius((3 * wavelength) / 4);
// A small aperture in the undrawn ring between them, reaching `depth` into the central zone: the
// only drawn piece is the thin lens-shaped overlap.
const apertureRadius = 5;
const depth = 0.15;
const apertureCentre = rho1 - depth + apertureRadius;
const sliverWidth = 0.2;

function tangentDesign() {
  return design(lensField(wavelength, focal), { kind: 'circle', cx: apertureCentre, cy: 0, r: apertureRadius }, binary(0.5, 0));
}

describe('slivers', () => {
  it('the construct holds exactly one drawn piece, the overlap', () => {
    expect(apertureCentre + apertureRadius).toBeLessThan(rho2);
    const kept = buildMask(tangentDesign(), { chordTolerance: 0.001, minSliverWidth: 0 });
    const polygons = kept.library.cells[0].shapes[0].polygons;
    expect(polygons).toHaveLength(1);
    expect(kept.report.sliverCount).toBe(0);
    const area = Math.abs(signedArea(polygons[0])) * 1e-6;
    expect(Math.abs(area - lensArea(rho1, apertureRadius, apertureCentre)) / lensArea(rho1, apertureRadius, apertureCentre)).toBeLessThan(0.03);
  });

  it('removes a sliver where the aperture is nearly tangent to a zone, with its lens-shaped area', () => {
    const { library, report } = buildMask(tangentDesign(), { chordTolerance: 0.001, minSliverWidth: sliverWidth });
    for (const p of library.cells[0].shapes[0].polygons) expect(averageWidth(p) * 1e-3).toBeGreaterThanOrEqual(sliverWidth);
    expect(library.cells[0].shapes[0].polygons).toHaveLength(0);
    expect(report.sliverCount).toBe(1);
    expect(report.sliverWidth_um).toBe(sliverWidth);
    const expected = lensArea(rho1, apertureRadius, apertureCentre);
    expect(Math.abs(report.sliverArea_um2 - expected) / expected).toBeLessThan(0.03);
    // the overlap is centred on the line of centres, half the depth inside the zone's edge
    expect(report.slivers[0].x_um).toBeCloseTo(rho1 - depth / 2, 1);
    expect(report.slivers[0].y_um).toBeCloseTo(0, 2);
    const warning = report.warnings.find((w) => w.kind === 'sliver');
    expect(warning?.message).toMatch(/1 sliver was removed from layer 1\/0/);
    // removed, so not counted again as a narrow feature
    expect(report.narrowFeatureCount).toBe(0);
  });

  it('keeps narrow zones wider than the sliver width and reports them as narrow features', () => {
    // the example's outer zones are about 0.9 µm wide, below the 1 µm minimum (λ/(2·NA) near the rim)
    const compiled = compileScript(readFileSync('examples/single-focus-405.zw', 'utf8'));
    if (!compiled.ok) throw new Error('the example does not compile');
    const removing = buildMask(compiled.design, { minSliverWidth: 0.05 });
    const keeping = buildMask(compiled.design, { minSliverWidth: 0 });
    expect(removing.report.narrowFeatureCount).toBeGreaterThan(0);
    expect(removing.report.narrowFeatureCount).toBe(keeping.report.narrowFeatureCount);
    expect(removing.report.sliverCount).toBe(0);
    expect(removing.report.polygonCount).toBe(keeping.report.polygonCount);
  });

  it('fracture moves a cut that would shave a sliver off a shoulder', () => {
    // A U: columns 300 wide, the left to y = 4000, the right to 2008, on a zigzag base of 250 points
    // (grid units). Halving the height cuts at y = 1999, just under the right column's top: a steep,
    // clean crossing that leaves a 300 × 9 piece, 2·area/perimeter ≈ 8.7, under a width of 50.
    const points: number[] = [];
    for (let x = 0; x <= 1000; x += 4) points.push(x, (x / 4) % 2 === 1 ? -3 : 0);
    points.push(1000, 2008, 700, 2008, 700, 500, 300, 500, 300, 4000, 0, 4000);
    const shape = Float64Array.from(points);
    const narrowest = (pieces: Float64Array[]) => Math.min(...pieces.map(averageWidth));
    expect(narrowest(fracture([shape], 199))).toBeLessThan(50);
    const pieces = fracture([shape], 199, 50);
    expect(narrowest(pieces)).toBeGreaterThanOrEqual(50);
    for (const p of pieces) expect(p.length / 2).toBeLessThanOrEqual(199);
    expect(pieces.reduce((s, p) => s + signedArea(p), 0)).toBe(signedArea(shape));
  });

  it('fracture cuts leave no piece under the sliver width on the examples', () => {
    const width = 50; // 0.05 µm in 1 nm grid units
    let cut = 0;
    for (const name of readdirSync('examples').filter((f) => f.endsWith('.zw'))) {
      const compiled = compileScript(readFileSync(`examples/${name}`, 'utf8'));
      if (!compiled.ok) throw new Error(`${name} does not compile`);
      const { library } = buildMask(compiled.design, { minSliverWidth: 0 });
      const loops = library.cells[0].shapes
        .flatMap((s) => s.polygons)
        .map((p) => Float64Array.from(p))
        .filter((p) => averageWidth(p) >= width);
      // the fewest vertices allowed, so nearly every polygon is cut, several times
      const pieces = fracture(loops, 199, width);
      cut += pieces.length - loops.length;
      for (const p of pieces) expect(averageWidth(p), `${name}: a piece near (${p[0]}, ${p[1]})`).toBeGreaterThanOrEqual(width);
      // cut points are rounded to the grid (half a step each), so the area holds to rounding only
      const areaBefore = loops.reduce((s, p) => s + signedArea(p), 0);
      expect(Math.abs(pieces.reduce((s, p) => s + signedArea(p), 0) / areaBefore - 1)).toBeLessThan(1e-6);
    }
    expect(cut).toBeGreaterThan(100);
  });
});
