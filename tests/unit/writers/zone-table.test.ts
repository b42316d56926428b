import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { radialZones, zoneTableCsv } from '@/lib/bundle';
import { compileScript } from '@/lib/lang';

function compileExample(name: string) {
  const result = compileScript(readFileSync(path.resolve(__dirname, '../../../examples', name), 'utf8'));
  if (!result.ok) throw new Error(`example ${name} does not compile`);
  return result.design;
}

/** Radius where a lens of focal length f has optical path difference d: r² = 2fd + d² (exact geometry of the ray path). */
const radiusAtPath = (f: number, d: number) => Math.sqrt(2 * f * d + d * d);

describe('zone table', () => {
  it('single-focus-405: every zone edge lies on a Fresnel zone radius', () => {
    // Fresnel zone plate radii r_n² = nλf + (nλ/2)² (Hecht, Optics, from memory). Duty 0.5 centred on phase 0 puts
    // the edges at path differences (2k + 1)·λ/4, i.e. n = k + 1/2; the central disc is open.
    const design = compileExample('single-focus-405.zw');
    const rows = radialZones(design)!;
    const lambda = 0.405;
    const f = 1000;
    const edges = rows.flatMap((r) => [r.innerRadius, r.outerRadius]).filter((r) => r > 0 && r < 230);
    edges.forEach((r, index) => {
      const n = index + 0.5;
      expect(Math.abs(r - Math.sqrt(n * lambda * f + (n * lambda / 2) ** 2))).toBeLessThan(1e-5);
    });
    expect(rows[0].innerRadius).toBe(0);
    // the number of open zones within 230 µm: edges up to the aperture, half of them closing an open zone
    expect(rows.length).toBe(Math.ceil((edges.length + 1) / 2));
    expect(rows.every((r, i) => r.zone === i + 1 && r.mask === 1)).toBe(true);
  });

  it('axicon: rings of constant width, the period λ / sin θ', () => {
    // a linear (axicon) phase of angle θ has period Λ = λ / sin θ (grating equation, from memory); negative tone draws
    // the state-0 half of each period, between Λ/4 and 3Λ/4 past each multiple of Λ
    const design = compileExample('axicon.zw');
    const rows = radialZones(design)!;
    const period = 0.405 / Math.sin(Math.PI / 180);
    for (const row of rows) {
      expect(row.outerRadius - row.innerRadius).toBeCloseTo(period / 2, 5);
      const cycles = (row.innerRadius - period / 4) / period;
      expect(Math.abs(cycles - Math.round(cycles))).toBeLessThan(1e-6);
    }
    expect(rows[0].innerRadius).toBeGreaterThan(20);
  });

  it('four-level lens: mask 1 flips every λ/2 of path, mask 2 every λ/4', () => {
    // level L = floor(mod(φ, 2π)·4/2π); mask 1 is its high bit (step π), mask 2 its low bit (step π/2) (shared design contract)
    const design = compileExample('four-level-lens.zw');
    const rows = radialZones(design)!;
    const f = 2000;
    const lambda = 0.405;
    const mask1 = rows.filter((r) => r.mask === 1);
    const mask2 = rows.filter((r) => r.mask === 2);
    // the centre itself has φ = 0, exactly on a level edge: the first ring starts within the bisection resolution of it
    expect(mask1[0].innerRadius).toBeLessThan(1e-4);
    expect(mask1[0].outerRadius).toBeCloseTo(radiusAtPath(f, lambda / 2), 5);
    expect(mask1[1].innerRadius).toBeCloseTo(radiusAtPath(f, lambda), 5);
    expect(mask2[0].outerRadius).toBeCloseTo(radiusAtPath(f, lambda / 4), 5);
    expect(mask2[1].innerRadius).toBeCloseTo(radiusAtPath(f, lambda / 2), 5);
    expect(mask2[1].outerRadius).toBeCloseTo(radiusAtPath(f, (3 * lambda) / 4), 5);
  });

  it('gives no table for a design without rotational symmetry', () => {
    expect(radialZones(compileExample('two-focus-offaxis.zw'))).toBeNull();
  });

  it('writes CSV with a header and widths in µm', () => {
    expect(zoneTableCsv([{ mask: 1, zone: 1, innerRadius: 0, outerRadius: 14.23061 }])).toBe('mask,zone,inner_radius_um,outer_radius_um,width_um\n1,1,0.0000,14.2306,14.2306\n');
  });
});
