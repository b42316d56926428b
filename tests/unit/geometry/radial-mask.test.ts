import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { CompiledDesign } from '@/lib/design/types';
import { buildMask, radialMaskTiles, resolveMaskOptions, xorLayers, type MaskResult } from '@/lib/geometry';
import { compileScript } from '@/lib/lang';
import { area, selfIntersects, traceMask, unionArea, zonePolygons } from './checks';
import { binary, combinedField, design, lensField } from './fixtures';

function compiled(source: string): CompiledDesign {
  const result = compileScript(source);
  if (!result.ok) throw new Error(result.diagnostics.map((d) => d.message).join('; '));
  return result.design;
}

/** Polygons that a pattern generator accepts: counter-clockwise, simple, within the cap, not overlapping. */
function expectClean(polygons: Int32Array[], maxVertices: number) {
  for (const p of polygons) {
    expect(area(p)).toBeGreaterThan(0);
    expect(p.length / 2).toBeLessThanOrEqual(maxVertices);
    expect(selfIntersects(p)).toBe(false);
  }
  const sum = polygons.reduce((s, p) => s + area(p), 0);
  expect(Math.abs(unionArea(polygons) - sum)).toBeLessThanOrEqual(1e-9 * sum + 1);
}

/**
 * Both masks sit inside the true boundaries by at most the sagitta (5 nm) plus a grid step (1 nm),
 * so per layer their XOR is a band at most 6 nm wide along the boundaries (cut edges coincide).
 */
function expectWithinToleranceBand(a: MaskResult, b: MaskResult) {
  for (const layer of xorLayers(a.library, b.library).perLayer) {
    const shapes = b.library.cells[0].shapes.find((s) => s.layer === layer.layer && s.datatype === layer.datatype)!;
    let length = 0;
    for (const p of shapes.polygons) {
      for (let i = 0, n = p.length / 2, j = n - 1; i < n; j = i++) length += Math.hypot(p[2 * i] - p[2 * j], p[2 * i + 1] - p[2 * j + 1]) / 1000;
    }
    expect(layer.addedArea + layer.removedArea).toBeLessThan(0.006 * length);
  }
}

/** Phase of a lens, −2π(√(r² + f²) − f)/λ (the ideal converging wave, textbook). */
const lensPhase = (r: number, lambda: number, f: number) => (-2 * Math.PI * (Math.sqrt(r * r + f * f) - f)) / lambda;

describe('the exact path for rotationally symmetric designs', () => {
  it('draws the same mask as the contour tracer: the XOR is no wider than the chord tolerance plus the grid along the boundaries', () => {
    const d = compiled(readFileSync('examples/single-focus-405.zw', 'utf8'));
    expect(radialMaskTiles(d, resolveMaskOptions())).not.toBeNull();
    const exact = buildMask(d);
    const traced = traceMask(d);
    expectWithinToleranceBand(traced, exact);
    expect(exact.report.zoneCount).toBe(traced.report.zoneCount);
  });

  it('keeps every piece within a 199-point cap, simple and hole-free, on a ring aperture in negative tone, with the analytic open area', () => {
    const lambda = 0.633;
    const f = 2000;
    const [r0, r1] = [150, 600];
    const d = design(lensField(lambda, f), { kind: 'ring', cx: 0, cy: 0, rInner: r0, rOuter: r1 }, binary(0.5, 0, 'negative'), { symmetryCentre: { x: 0, y: 0 } });
    const result = buildMask(d, { maxVertices: 199 });
    const polygons = zonePolygons(result.library);
    expectClean(polygons, 199);
    // negative tone draws where cos(φ) ≤ cos(π/2) = 0; integrate that annulus by annulus on a fine radial grid
    let analytic = 0;
    const steps = 2_000_000;
    for (let i = 0; i < steps; i++) {
      const r = r0 + ((i + 0.5) * (r1 - r0)) / steps;
      if (Math.cos(lensPhase(r, lambda, f)) <= 0) analytic += 2 * Math.PI * r * ((r1 - r0) / steps);
    }
    const drawn = polygons.reduce((s, p) => s + area(p), 0) / 1e6;
    expect(Math.abs(drawn - analytic) / analytic).toBeLessThan(1e-3);
  });

  it('writes every mask of a multi-level lens like the tracer does', () => {
    const d = compiled(`wavelength 405 nm
aperture circle(diameter: 300 um)
profile lens(focal: 800 um)
quantize multilevel(levels: 4, index: 1.5)
`);
    const exact = buildMask(d);
    const traced = traceMask(d);
    expect(exact.library.cells[0].shapes).toHaveLength(2);
    expectWithinToleranceBand(traced, exact);
  });

  it('finds the close pairs of edges beside the zero circles of two coaxial lenses of equal weight', () => {
    const field = combinedField([
      { field: lensField(0.405, 600), weight: 1 },
      { field: lensField(0.405, 900), weight: 1 },
    ]);
    const d = design(field, { kind: 'circle', cx: 0, cy: 0, r: 120 }, binary(0.5, 0), { symmetryCentre: { x: 0, y: 0 } });
    const tiles = radialMaskTiles(d, resolveMaskOptions());
    expect(tiles).not.toBeNull();
    // reference: the sign changes of g = Re(u) (duty ½, φ0 = 0) along the ray at 0.1 nm steps
    const out = new Float64Array(2);
    const g = (r: number) => (field.field(r, 0, out), out[0]);
    const reference: number[] = [];
    for (let i = 1, prev = g(0); i <= 1_200_000; i++) {
      const v = g(i * 1e-4);
      if (v > 0 !== prev > 0) reference.push(i * 1e-4);
      prev = v;
    }
    // every band edge of the exact path lies on the +x axis as a vertex at the edge's radius
    const radii = new Set<number>();
    for (const p of tiles![0].layers[0]) {
      for (let i = 0; i < p.length; i += 2) if (p[i + 1] === 0 && p[i] > 0 && p[i] < 120_000) radii.add(p[i]);
    }
    const edges = [...radii].sort((a, b) => a - b);
    expect(edges).toHaveLength(reference.length);
    edges.forEach((e, i) => expect(Math.abs(e / 1000 - reference[i])).toBeLessThan(0.0012));
  });
});
