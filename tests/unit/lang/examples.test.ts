import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { checkScript, compileScript } from '@/lib/lang';
import type { PhaseMap } from '@/lib/lang';
import { parsePhaseCsv } from '@/lib/phasemap';

const dir = path.resolve(__dirname, '../../../examples');
const examples = readdirSync(dir).filter((f) => f.endsWith('.zw'));
const load = (name: string): string => readFileSync(path.join(dir, name), 'utf8');

/** The sample maps shipped beside the examples, at the 5 µm pitch their scripts assume. */
function exampleMap(name: string): PhaseMap | undefined {
  const result = parsePhaseCsv(readFileSync(path.join(dir, 'maps', `${name}.csv`), 'utf8'), { pitchX: 5, unit: 'rad' });
  return result.ok ? result.map : undefined;
}

describe('examples', () => {
  it('include the ones the issue asks for', () => {
    expect(examples).toEqual(expect.arrayContaining(['single-focus-405.zw', 'two-focus-offaxis.zw', 'vortex-plate.zw', 'axicon.zw', 'four-level-lens.zw', 'bifocal-multiplexed.zw']));
  });

  it.each([...examples, 'maps/sampled-map.zw'])('%s checks clean and compiles, with a comment header', (name) => {
    const source = load(name);
    expect(source.startsWith('#')).toBe(true);
    expect(checkScript(source)).toEqual([]);
    expect(compileScript(source, { phaseMaps: exampleMap }).ok).toBe(true);
  });

  it('sampled-map adds the bilinear map from examples/maps to the lens', () => {
    const withMap = compileScript(load('maps/sampled-map.zw'), { phaseMaps: exampleMap });
    const lensOnly = compileScript(load('maps/sampled-map.zw').replace(' + phase_map("ramp-8x8")', ''));
    if (!withMap.ok || !lensOnly.ok) throw new Error('did not compile');
    // 8 samples at 5 µm centred on 0: x = -17.5 … 17.5 µm; the ramp rises 2π/8 per sample
    const at = (x: number) => withMap.design.pieces[0].field.phase(x, 3) - lensOnly.design.pieces[0].field.phase(x, 3);
    expect(at(-17.5)).toBeCloseTo(0, 5);
    expect(at(-15)).toBeCloseTo(Math.PI / 8, 5);
    expect(at(17.5)).toBeCloseTo((7 / 8) * 2 * Math.PI, 5);
  });

  it('single-focus-405 is the 405 nm, f = 1 mm, 460 µm binary amplitude zone plate', () => {
    const result = compileScript(load('single-focus-405.zw'));
    if (!result.ok) throw new Error('did not compile');
    const d = result.design;
    expect(d.wavelength).toBeCloseTo(0.405, 12);
    expect(d.aperture).toEqual({ kind: 'circle', cx: 0, cy: 0, r: 230 });
    expect(d.foci).toEqual([{ x: 0, y: 0, z: 1000, weight: 1 }]);
    expect(d.quantization).toMatchObject({ kind: 'binary', modulation: 'amplitude', duty: 0.5 });
    expect(d.symmetryCentre).toEqual({ x: 0, y: 0 });
    // about 1/6 mm² (common practice, no source)
    expect(Math.PI * 0.23 ** 2).toBeCloseTo(1 / 6, 1);
  });

  it('two-focus-offaxis has two foci at different positions, focal lengths and weights', () => {
    const result = compileScript(load('two-focus-offaxis.zw'));
    if (!result.ok) throw new Error('did not compile');
    const [a, b] = result.design.foci;
    expect(a.x).not.toBe(b.x);
    expect(a.z).not.toBe(b.z);
    expect(a.weight).not.toBe(b.weight);
  });

  it('four-level-lens writes 2 masks and bifocal-multiplexed has 2 pieces', () => {
    const four = compileScript(load('four-level-lens.zw'));
    const bifocal = compileScript(load('bifocal-multiplexed.zw'));
    expect(four.ok && four.design.quantization).toMatchObject({ kind: 'multilevel', bits: 2 });
    expect(bifocal.ok && bifocal.design.pieces.length).toBe(2);
  });
});
