import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import JSZip from 'jszip';
import { describe, expect, it } from 'vitest';
import { sha256Hex } from '@/lib/bundle';
import { exportDesign, ExportError } from '@/lib/export';
import { gdspySummary, klayoutCompare, scratchDirectory, writeScratch } from './tools';

const root = path.resolve(__dirname, '../..');
const font = readFileSync(path.join(root, 'fonts/jetbrains-mono-latin-400-normal.woff'));
const examples = readdirSync(path.join(root, 'examples')).filter((f) => f.endsWith('.zw')).sort();
const timestamp = new Date(Date.UTC(2026, 11, 1, 12, 0, 0));

async function unzip(zip: Uint8Array): Promise<Map<string, Uint8Array>> {
  const archive = await JSZip.loadAsync(zip);
  const files = new Map<string, Uint8Array>();
  for (const name of Object.keys(archive.files)) files.set(name, await archive.files[name].async('uint8array'));
  return files;
}

describe.each(examples)('export of examples/%s', (example) => {
  const source = readFileSync(path.join(root, 'examples', example), 'utf8');
  const exported = exportDesign(source, { font, timestamp, designName: example.replace(/\.zw$/, ''), revision: 1 });
  // each test awaits it; this handler only keeps a refusal from counting as unhandled before then
  exported.catch(() => undefined);

  it('gives a bundle whose manifest lists every other file with its size and SHA-256', async () => {
    const result = await exported;
    const files = await unzip(result.zip);
    const manifest = JSON.parse(new TextDecoder().decode(files.get('manifest.json')));
    expect(manifest.source).toBe(source);
    expect([...files.keys()].sort()).toEqual(['manifest.json', ...manifest.files.map((f: { name: string }) => f.name)].sort());
    for (const entry of manifest.files) {
      expect(files.get(entry.name)!.length).toBe(entry.bytes);
      expect(sha256Hex(files.get(entry.name)!)).toBe(entry.sha256);
    }
    expect(result.sha256).toBe(sha256Hex(result.zip));
    expect(manifest.foci).toEqual(result.design.foci);
    expect(manifest.layers.length).toBeGreaterThan(0);
  });

  it('is read by gdspy with the manifest layers and the vertex cap kept, and KLayout finds OASIS = GDSII', async () => {
    const result = await exported;
    const files = await unzip(result.zip);
    const directory = scratchDirectory();
    const gds = writeScratch(directory, 'mask.gds', files.get('mask.gds')!);
    const oas = writeScratch(directory, 'mask.oas', files.get('mask.oas')!);
    // gdspy, a general-purpose GDSII library (Debian python3-gdspy)
    const summary = gdspySummary(gds);
    const drawn = Object.keys(summary.layers).sort();
    const mapped = result.manifest.layers.map((l) => `${l.layer}/${l.datatype}`);
    for (const key of drawn) expect(mapped).toContain(key);
    for (const layer of Object.values(summary.layers)) {
      expect(layer.maxVertices).toBeLessThanOrEqual(4095);
      expect(layer.area).toBeGreaterThan(0);
    }
    // KLayout in batch mode (Debian klayout), a general-purpose layout reader
    const comparison = klayoutCompare(gds, oas);
    for (const [key, layer] of Object.entries(comparison.layers)) {
      expect(layer.xorEmpty, `XOR on ${key}`).toBe(true);
      expect(layer.oasArea).toBeCloseTo(layer.gdsArea, 9);
      // gdspy sums polygon areas, KLayout measures the merged region: they may differ by a few DBU² where fractured pieces meet
      expect(Math.abs(layer.gdsArea - summary.layers[key].area)).toBeLessThan(1e-4);
    }
  });
});

describe('single-focus-405 bundle against the Fresnel zone radii', () => {
  it('has an open area on the zone layer equal to the analytic sum of zone areas within 0.1%', async () => {
    // Fresnel zone radii r_n² = nλf + (nλ/2)² (Hecht, Optics, from memory); duty 0.5 centred on phase 0 puts the edges at
    // n = ½, 3/2, 5/2 …, the centre open. The open area is π Σ (outer² − inner²) over the open zones inside r = 230 µm.
    const result = await exportDesign(readFileSync(path.join(root, 'examples/single-focus-405.zw'), 'utf8'), { font, timestamp });
    const radius = (n: number) => Math.sqrt(n * 0.405 * 1000 + ((n * 0.405) / 2) ** 2);
    let area = 0;
    for (let k = 0; ; k += 2) {
      const inner = k === 0 ? 0 : radius(k - 0.5);
      if (inner >= 230) break;
      area += Math.PI * (Math.min(radius(k + 0.5), 230) ** 2 - inner ** 2);
    }
    const files = await unzip(result.zip);
    const summary = gdspySummary(writeScratch(scratchDirectory(), 'zp.gds', files.get('mask.gds')!));
    const zones = result.manifest.layers.find((l) => l.purpose === 'zones')!;
    expect(Math.abs(summary.layers[`${zones.layer}/${zones.datatype}`].area - area) / area).toBeLessThan(0.001);
    // the zone table in the bundle holds the same edges
    const csv = new TextDecoder().decode(files.get('zones.csv')).trim().split('\n');
    expect(csv[0]).toBe('mask,zone,inner_radius_um,outer_radius_um,width_um');
    expect(Number(csv[2].split(',')[2])).toBeCloseTo(radius(1.5), 3);
  });
});

describe('exposure matrix bundle', () => {
  it('writes 2 duty columns × 2 dose rows, each element labelled, and KLayout finds OASIS = GDSII', async () => {
    const source = readFileSync(path.join(root, 'examples/single-focus-405.zw'), 'utf8');
    const result = await exportDesign(source, {
      font,
      timestamp,
      designName: 'ZP405',
      revision: 2,
      matrix: { columns: [{ duty: 0.4 }, { duty: 0.6 }], rows: ['D 90%', 'D 110%'] },
    });
    expect(result.manifest.exposureMatrix).toMatchObject({ columns: ['duty 0.4', 'duty 0.6'], rows: ['D 90%', 'D 110%'] });
    const files = await unzip(result.zip);
    const directory = scratchDirectory();
    const gds = writeScratch(directory, 'm.gds', files.get('mask.gds')!);
    const summary = gdspySummary(gds);
    expect(summary.labels.filter((l) => l.startsWith('ZP405 r2 '))).toEqual(
      ['ZP405 r2 duty 0.4 D 110%', 'ZP405 r2 duty 0.4 D 90%', 'ZP405 r2 duty 0.6 D 110%', 'ZP405 r2 duty 0.6 D 90%'],
    );
    const comparison = klayoutCompare(gds, writeScratch(directory, 'm.oas', files.get('mask.oas')!));
    for (const layer of Object.values(comparison.layers)) expect(layer.xorEmpty).toBe(true);
    expect(new TextDecoder().decode(files.get('README.txt'))).toContain('EXPOSURE MATRIX');
  });
});

describe('export refusals', () => {
  it('reports script errors with line and column', async () => {
    const failure = exportDesign('wavelength 405 nm\naperture circle(diameter: -1 um)\n', { font });
    await expect(failure).rejects.toBeInstanceOf(ExportError);
    await expect(failure).rejects.toThrow(/^the script has errors:\n\d+:\d+ error: /);
  });

  it('reports a vertex budget exceeded and bad options in words', async () => {
    const source = readFileSync(path.join(root, 'examples/single-focus-405.zw'), 'utf8');
    await expect(exportDesign(source, { font, vertexBudget: 100 })).rejects.toThrow(/more than the budget of 100/);
    await expect(exportDesign(source, { font, maxVertices: 9000, chordTolerance: -1 })).rejects.toThrow(/the chord tolerance must be a positive length[^]*the vertex limit per polygon must be/);
  });
});
