import { execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import JSZip from 'jszip';
import { describe, expect, it } from 'vitest';
import { exportDesign } from '@/lib/export';
import { openZones } from '../unit/writers/zone-plate-radii';
import { klayoutCompare, PYTHON, resultLine, scratchDirectory, writeScratch } from './tools';

const root = path.resolve(__dirname, '../..');
const font = readFileSync(path.join(root, 'fonts/jetbrains-mono-latin-400-normal.woff'));
const timestamp = new Date(Date.UTC(2026, 11, 1, 12, 0, 0));

interface CellAreas {
  cells: Record<string, Record<string, number>>;
  placed: Record<string, number>;
  labels: string[];
}

/** gdspy (a general-purpose GDSII library) reads each cell's own polygon areas and the top cell's placements. */
function gdspyCellAreas(gdsFile: string): CellAreas {
  const output = execFileSync(PYTHON, [path.join(__dirname, 'gdspy_cell_areas.py'), gdsFile], { encoding: 'utf8', maxBuffer: 64 << 20 });
  return resultLine(output) as CellAreas;
}

/** Annulus areas π((r_out + b/2)² − (r_in − b/2)²) (elementary geometry); the central disc has no inner edge. */
function biasedArea(zones: Array<{ inner: number; outer: number }>, bias: number): number {
  return zones.reduce((sum, z) => sum + Math.PI * ((z.outer + bias / 2) ** 2 - (z.inner === 0 ? 0 : (z.inner - bias / 2) ** 2)), 0);
}

describe('size-bias matrix read back by gdspy', () => {
  const biases = [-0.1, 0, 0.1];
  const source = readFileSync(path.join(root, 'examples/single-focus-405.zw'), 'utf8');
  const exported = exportDesign(source, { font, timestamp, designName: 'ZP405', revision: 3, matrix: { columns: biases.map((bias) => ({ bias })), rows: ['D 90%', 'D 110%'] } });
  exported.catch(() => undefined);

  it('changes each column’s zone area as the zone radii grown by b/2 predict', async () => {
    const result = await exported;
    const archive = await JSZip.loadAsync(result.zip);
    const gds = writeScratch(scratchDirectory(), 'bias.gds', await archive.files['mask.gds'].async('uint8array'));
    const read = gdspyCellAreas(gds);
    // one cell per column, each placed once per row (an AREF of 1 × 2)
    const columnCells = Object.keys(read.placed).sort();
    expect(columnCells).toHaveLength(3);
    for (const cell of columnCells) expect(read.placed[cell]).toBe(2);
    const areas = columnCells.map((cell) => read.cells[cell]['1/0']);

    // examples/single-focus-405.zw: λ = 0.405 µm, f = 1000 µm, aperture radius 230 µm, duty 0.5 centred on phase 0
    const zones = openZones(0.405, 1000, 230);
    expect(result.manifest.exposureMatrix!.variants[1].layers[0].polygons).toBeGreaterThan(zones.length);
    // unbiased: chord polygons lie inside the circles, each boundary loses < its length × (chord tolerance + half a grid step)
    const boundaryLength = zones.reduce((s, z) => s + 2 * Math.PI * (z.inner + z.outer), 0);
    expect(Math.abs(areas[1] - biasedArea(zones, 0))).toBeLessThan(boundaryLength * (0.005 + 0.0005));
    // biased: the change from the unbiased column, where the chord deficits cancel; the offset vertices are
    // rounded to the 1 nm grid, so each edge moves by b/2 to within half a grid step (about 1 % of the change)
    for (const c of [0, 2]) {
      const predicted = biasedArea(zones, biases[c]) - biasedArea(zones, 0);
      expect(Math.sign(areas[c] - areas[1])).toBe(Math.sign(biases[c]));
      expect(Math.abs(areas[c] - areas[1] - predicted)).toBeLessThan(boundaryLength * 0.0005);
    }
    // the manifest's figures are the same geometry gdspy read
    result.manifest.exposureMatrix!.variants.forEach((v, c) => expect(v.layers[0].drawnArea_um2).toBeCloseTo(areas[c], 3));
  });

  it('writes the same biased columns into OASIS as into GDSII (KLayout: empty XOR per layer)', async () => {
    const result = await exported;
    const archive = await JSZip.loadAsync(result.zip);
    const directory = scratchDirectory();
    const gds = writeScratch(directory, 'bias.gds', await archive.files['mask.gds'].async('uint8array'));
    const oas = writeScratch(directory, 'bias.oas', await archive.files['mask.oas'].async('uint8array'));
    const comparison = klayoutCompare(gds, oas);
    for (const layer of Object.values(comparison.layers)) expect(layer.xorEmpty).toBe(true);
    expect(comparison.oasTexts).toEqual(comparison.gdsTexts);
  });

  it('labels every element with its bias and lists the bias per column in the manifest and README', async () => {
    const result = await exported;
    const archive = await JSZip.loadAsync(result.zip);
    const gds = writeScratch(scratchDirectory(), 'bias.gds', await archive.files['mask.gds'].async('uint8array'));
    const labels = gdspyCellAreas(gds).labels.filter((l) => l.startsWith('ZP405 r3 '));
    expect(labels).toEqual(['-0.10', '+0.10', '0.00'].flatMap((b) => [`ZP405 r3 bias ${b} D 110%`, `ZP405 r3 bias ${b} D 90%`]).sort());
    const matrix = result.manifest.exposureMatrix!;
    expect(matrix.columns).toEqual(['bias -0.10', 'bias 0.00', 'bias +0.10']);
    expect(matrix.variants.map((v) => v.bias_um)).toEqual(biases);
    expect(matrix.variants.map((v) => [v.zonesLost, v.zonesMerged])).toEqual([[0, 0], [0, 0], [0, 0]]);
    expect(matrix.biasConvention).toMatch(/moves outward by bias\/2/);
    // the narrowest zone widens by the bias, the smallest gap narrows by it
    const narrowest = result.report.narrowestZone!.width_um;
    expect(matrix.variants.map((v) => v.narrowestZone_um)).toEqual(biases.map((b) => narrowest + b));
    expect(await archive.files['README.txt'].async('string')).toContain('Size bias (µm');
  });
});
