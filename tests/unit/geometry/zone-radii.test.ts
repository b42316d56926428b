import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { buildMask, type MaskResult } from '@/lib/geometry';
import { compileScript } from '@/lib/lang';
import type { CompiledDesign } from '@/lib/design/types';
import { area, traceMask, zonePolygons } from './checks';
import { binary, design, lensField } from './fixtures';

/**
 * Zone radii of a Fresnel zone plate: the edge where the path to the focus grows by m·λ/2 lies at
 * r_m² = m·λ·f + (m·λ/2)² (standard zone-plate construction, e.g. D. Attwood, Soft X-Rays and Extreme
 * Ultraviolet Radiation, ch. 9). With open zones of duty d centred on phase φ0, the edges sit at the
 * path differences where φ = −2π·p/λ meets φ0 ± π·d, i.e. m = −(φ0 ± π·d)/π + 2k.
 */
function edgeIndices(phaseOffset: number, duty: number, mMax: number): number[] {
  const out: number[] = [];
  for (const sign of [1, -1]) {
    const base = -(phaseOffset + sign * Math.PI * duty) / Math.PI;
    for (let k = -Math.ceil(mMax); k <= mMax; k++) {
      const m = base + 2 * k;
      if (m >= 0 && m <= mMax) out.push(m);
    }
  }
  return out.sort((a, b) => a - b);
}

const radius = (m: number, wavelength: number, f: number) => Math.sqrt(m * wavelength * f + (m * wavelength / 2) ** 2);

const PATHS: Array<[string, (d: CompiledDesign) => MaskResult]> = [
  ['circles written from the radii (buildMask)', (d) => buildMask(d)],
  ['contour tracer', (d) => traceMask(d)],
];

function checkRadiiAndArea(d: CompiledDesign, f: number, R: number, build: (d: CompiledDesign) => MaskResult) {
  if (d.quantization.kind !== 'binary') throw new Error('binary design expected');
  const { library } = build(d);
  const polygons = zonePolygons(library);
  const lambda = d.wavelength;
  const mMax = (2 * (Math.sqrt(R * R + f * f) - f)) / lambda + 2;
  const edges = edgeIndices(d.quantization.phaseOffset, d.quantization.duty, mMax).map((m) => radius(m, lambda, f));
  // every vertex: within 2 nm of a zone radius or of the aperture edge (the centre is r_0 = 0 of the quadrant cuts)
  let worst = 0;
  for (const p of polygons) {
    for (let i = 0; i < p.length; i += 2) {
      const r = Math.hypot(p[i], p[i + 1]) / 1000;
      let best = Math.min(Math.abs(r - R), r);
      for (const e of edges) best = Math.min(best, Math.abs(r - e));
      worst = Math.max(worst, best);
    }
  }
  expect(worst).toBeLessThan(0.002);
  // open area: the analytic sum of the open annuli inside the aperture
  const drawnAt = (r: number) => {
    const phase = (-2 * Math.PI * (Math.sqrt(r * r + f * f) - f)) / lambda;
    return Math.cos(phase - (d.quantization as { phaseOffset: number }).phaseOffset) > Math.cos(Math.PI * (d.quantization as { duty: number }).duty);
  };
  const bounds = [0, ...edges.filter((e) => e > 0 && e < R), R];
  let analytic = 0;
  for (let i = 0; i + 1 < bounds.length; i++) {
    if (drawnAt(0.5 * (bounds[i] + bounds[i + 1]))) analytic += Math.PI * (bounds[i + 1] ** 2 - bounds[i] ** 2);
  }
  const drawn = polygons.reduce((s, p) => s + area(p), 0) / 1e6;
  expect(Math.abs(drawn - analytic) / analytic).toBeLessThan(0.001);
  return { polygons, edges };
}

describe.each(PATHS)('zone radii against the zone-plate construction, %s', (_, build) => {
  it('single-focus-405.zw: every vertex on a zone radius or the aperture edge, open area as analytic', () => {
    const compiled = compileScript(readFileSync('examples/single-focus-405.zw', 'utf8'));
    expect(compiled.ok).toBe(true);
    if (!compiled.ok) return;
    // the example: λ = 405 nm, f = 1 mm, aperture diameter 460 µm (from its script)
    expect(compiled.design.wavelength).toBeCloseTo(0.405, 12);
    checkRadiiAndArea(compiled.design, 1000, 230, build);
  });

  it('a hand-built plate whose edges fall on whole-number zones (φ0 = −π/2) matches r_n² = nλf + (nλ/2)²', () => {
    const f = 5000;
    const R = 230;
    const d = design(lensField(0.405, f), { kind: 'circle', cx: 0, cy: 0, r: R }, binary(0.5, -Math.PI / 2), { symmetryCentre: { x: 0, y: 0 } });
    // with φ0 = −π/2 and duty ½ the edges are the whole-number zones n = 0, 1, 2, …
    expect(edgeIndices(-Math.PI / 2, 0.5, 4)).toEqual([0, 1, 2, 3, 4].map((n) => expect.closeTo(n, 12)));
    checkRadiiAndArea(d, f, R, build);
  });
});
