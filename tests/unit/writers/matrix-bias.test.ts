import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { exportDesign, resolveExportOptions } from '@/lib/export';
import { parseExportArgs } from '@/scripts/zw/export';
import { openZones } from './zone-plate-radii';

const font = readFileSync(path.resolve(__dirname, '../../../fonts/jetbrains-mono-latin-400-normal.woff'));

// A small plate: λ = 0.405 µm, f = 1000 µm, aperture radius 50 µm, open zones 4 µm wide and more.
const SOURCE = `wavelength 405 nm
aperture circle(diameter: 100 um)
profile lens(focal: 1 mm)
quantize binary(duty: 0.5, modulation: amplitude, tone: positive)
`;
const zones = openZones(0.405, 1000, 50);
// a zone survives a shrink while it is wider than |bias| (the central disc: its diameter)
const widths = zones.map((z) => (z.inner === 0 ? 2 * z.outer : z.outer - z.inner));
const gaps = zones.slice(1).map((z, i) => z.inner - zones[i].outer);

const biasMatrix = (...biases: number[]) => ({ columns: biases.map((bias) => ({ bias })), rows: ['D 100%'] });

describe('size-bias columns: options and command line', () => {
  it('refuses a bias that is not a finite length or not on the grid, with the reason', () => {
    expect(() => resolveExportOptions({ font, matrix: biasMatrix(Number.NaN) })).toThrow("a matrix column's size bias must be a finite length in µm, got NaN");
    expect(() => resolveExportOptions({ font, matrix: biasMatrix(Number.POSITIVE_INFINITY) })).toThrow('must be a finite length in µm, got Infinity');
    expect(() => resolveExportOptions({ font, matrix: biasMatrix(0.003) })).toThrow(
      "a matrix column's size bias of 0.003 µm moves each edge by 0.0015 µm, not a whole number of database grid steps (0.001 µm); use a multiple of 0.002 µm",
    );
    expect(resolveExportOptions({ font, matrix: biasMatrix(-0.1, 0, 0.1) }).matrix!.columns).toEqual([{ bias: -0.1 }, { bias: 0 }, { bias: 0.1 }]);
  });

  it('reads --matrix-bias alone and beside --matrix-duty of the same length', () => {
    expect(parseExportArgs(['a.zw', '--out', 'b.zip', '--matrix-bias', '-0.1,0,0.1']).options.matrix).toEqual({ columns: [{ bias: -0.1 }, { bias: 0 }, { bias: 0.1 }], rows: [''] });
    expect(parseExportArgs(['a.zw', '--out', 'b.zip', '--matrix-duty=0.4,0.6', '--matrix-bias=-0.05,0.05']).options.matrix!.columns).toEqual([
      { duty: 0.4, bias: -0.05 },
      { duty: 0.6, bias: 0.05 },
    ]);
  });

  it('says what is wrong with a bad bias list', () => {
    expect(() => parseExportArgs(['a.zw', '--out', 'b.zip', '--matrix-duty', '0.4,0.5', '--matrix-bias', '0.1'])).toThrow(
      '--matrix-duty and --matrix-bias give one value per column, so they need the same length; got 2 duty cycles and 1 biases',
    );
    expect(() => parseExportArgs(['a.zw', '--out', 'b.zip', '--matrix-bias', '0.1,,0.2'])).toThrow('--matrix-bias needs numbers separated by commas; got "0.1,,0.2"');
    expect(() => parseExportArgs(['a.zw', '--out', 'b.zip', '--matrix-bias', '0.1um'])).toThrow('--matrix-bias needs numbers');
  });
});

describe('size-bias columns: zones lost and merged', () => {
  it('counts the zones a negative bias erases: those no wider than the bias (Fresnel zone radii)', async () => {
    const bias = -6;
    // no zone within 0.5 µm of the threshold, so chords and grid cannot change the count
    expect(widths.every((w) => Math.abs(w - Math.abs(bias)) > 0.5)).toBe(true);
    const result = await exportDesign(SOURCE, { font, matrix: biasMatrix(bias, 0) });
    const [biased, plain] = result.manifest.exposureMatrix!.variants;
    expect(biased.zonesLost).toBe(widths.filter((w) => w < Math.abs(bias)).length);
    expect(biased.zonesLost).toBeGreaterThan(0);
    expect(biased.warnings[0]).toMatch(new RegExp(`^a bias of -6.00 µm erases ${biased.zonesLost} of ${zones.length} zones on layer 1/0; the narrowest zone is`));
    expect(plain).toMatchObject({ zonesLost: 0, zonesMerged: 0, warnings: [] });
    expect(result.summary.some((l) => l.startsWith('warning: column "bias -6.00": a bias of -6.00 µm erases'))).toBe(true);
  });

  it('counts the gaps a positive bias closes: those narrower than the bias', async () => {
    const bias = 5.2;
    expect(gaps.every((g) => Math.abs(g - bias) > 0.5)).toBe(true);
    const result = await exportDesign(SOURCE, { font, matrix: biasMatrix(bias) });
    const [column] = result.manifest.exposureMatrix!.variants;
    expect(column.zonesMerged).toBe(gaps.filter((g) => g < bias).length);
    expect(column.zonesMerged).toBeGreaterThan(0);
    expect(column.warnings[0]).toMatch(/^a bias of \+5\.20 µm joins \d+ of \d+ zones on layer 1\/0 to a neighbour; the smallest gap between zones is/);
  });

  it('refuses a bias that erases every zone or merges them all, naming the column', async () => {
    const erasing = -2 * Math.ceil(Math.max(...widths) / 2 + 1);
    await expect(exportDesign(SOURCE, { font, matrix: biasMatrix(0, erasing) })).rejects.toThrow(
      new RegExp(`^matrix column "bias ${erasing}\\.00": a bias of ${erasing}\\.00 µm erases every zone on layer 1/0 \\(each zone narrows by ${-erasing}\\.0 µm; the narrowest zone is`),
    );
    const merging = 2 * Math.ceil(Math.max(...gaps) / 2 + 1);
    await expect(exportDesign(SOURCE, { font, matrix: biasMatrix(merging) })).rejects.toThrow(
      new RegExp(`^matrix column "bias \\+${merging}\\.00": a bias of \\+${merging}\\.00 µm merges all ${zones.length} zones on layer 1/0 into one shape`),
    );
  });
});
