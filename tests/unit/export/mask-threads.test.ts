import { readFileSync } from 'node:fs';
import { readFile } from 'node:fs/promises';
import { availableParallelism } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import type { CompiledDesign } from '@/lib/design/types';
import { exportDesign, ExportError } from '@/lib/export';
import { buildMaskOnThreads } from '@/lib/export/mask-threads';
import { buildMask, exactMaskTiles, planMaskTiles, QuantizationError, resolveMaskOptions, type MaskResult } from '@/lib/geometry';
import { threadedTask } from '@/lib/jobs/threaded-task';
import type { ExportInput, ExportOutcome } from '@/lib/jobs/export-job';
import { compileScript } from '@/lib/lang';
import { parsePhaseCsv, type PhaseMap } from '@/lib/phasemap';
import { parseExportArgs } from '@/scripts/zw/export';

// The reference for every comparison is buildMask: the same pure tile function run on the calling thread.
const root = path.resolve(__dirname, '../../..');
const font = readFileSync(path.join(root, 'fonts/jetbrains-mono-latin-400-normal.woff'));
const timestamp = new Date(Date.UTC(2026, 11, 1, 12, 0, 0));

function compiled(source: string, phaseMaps = new Map<string, PhaseMap>()): CompiledDesign {
  const result = compileScript(source, { phaseMaps: (name) => phaseMaps.get(name) });
  if (!result.ok) throw new Error(result.diagnostics.map((d) => d.message).join('; '));
  return result.design;
}

/** Polygons that differ between two masks (layer, datatype and every Int32 coordinate). */
function differences(a: MaskResult, b: MaskResult): string[] {
  const found: string[] = [];
  const [sa, sb] = [a.library.cells[0].shapes, b.library.cells[0].shapes];
  if (sa.length !== sb.length) return [`${sa.length} layers against ${sb.length}`];
  sa.forEach((shape, s) => {
    const other = sb[s];
    if (shape.layer !== other.layer || shape.datatype !== other.datatype) found.push(`layer ${s}: ${shape.layer}/${shape.datatype} against ${other.layer}/${other.datatype}`);
    if (shape.polygons.length !== other.polygons.length) found.push(`layer ${s}: ${shape.polygons.length} polygons against ${other.polygons.length}`);
    shape.polygons.forEach((p, i) => {
      const q = other.polygons[i];
      if (!(p instanceof Int32Array) || !(q instanceof Int32Array) || p.length !== q.length || p.some((v, k) => v !== q[k])) found.push(`layer ${s}, polygon ${i}`);
    });
  });
  return found;
}

const options = resolveMaskOptions({});

describe.each([
  ['two-focus-offaxis.zw', 2],
  ['twin-spot-splitter.zw', 2],
  ['bifocal-multiplexed.zw', 3],
])('examples/%s on %i threads', (example, threads) => {
  const source = readFileSync(path.join(root, 'examples', example), 'utf8');
  const design = compiled(source);

  it('gives buildMask’s polygons, Int32 for Int32, and its report', async () => {
    // several traced tiles, not an exact path, so the queue and the threads do the work
    expect(planMaskTiles(design, options.chordTolerance).length).toBeGreaterThan(threads);
    expect(exactMaskTiles(design, options)).toBeNull();
    const finished: number[] = [];
    const threaded = await buildMaskOnThreads({ source, phaseMaps: new Map(), design, options, threads, onTile: (done) => finished.push(done) });
    const single = buildMask(design, options);
    expect(differences(threaded, single)).toEqual([]);
    expect(threaded.report).toEqual(single.report);
    expect(finished).toEqual(planMaskTiles(design, options.chordTolerance).map((_, i) => i + 1));
  });
});

describe('errors inside a tile thread', () => {
  const source = readFileSync(path.join(root, 'examples', 'two-focus-offaxis.zw'), 'utf8');
  const design = compiled(source);

  it('reach the caller as the class and message the calling thread gives', async () => {
    // a duty cycle the script cannot produce, so only the tile function (in the threads) refuses it
    const bad: CompiledDesign = { ...design, quantization: { ...(design.quantization as Extract<CompiledDesign['quantization'], { kind: 'binary' }>), duty: 1.5 } };
    let expected: unknown;
    try {
      buildMask(bad, options);
    } catch (error) {
      expected = error;
    }
    expect(expected).toBeInstanceOf(QuantizationError);
    const threaded = buildMaskOnThreads({ source, phaseMaps: new Map(), design: bad, options, threads: 2 });
    await expect(threaded).rejects.toBeInstanceOf(QuantizationError);
    await expect(threaded).rejects.toThrow((expected as Error).message);
  });

  it('say so when the script given to the threads is not the design’s', async () => {
    const threaded = buildMaskOnThreads({ source: 'wavelength 405 nm\naperture circle(diameter: 1 mm)\n', phaseMaps: new Map(), design, options, threads: 2 });
    await expect(threaded).rejects.toThrow(/does not compile in the tile thread/);
  });
});

describe('a design reading a phase map', () => {
  // examples/maps/sampled-map.zw's map added to one of two lenses, so the first lens's centre cuts the
  // aperture into four tiles (the example itself has no focus to cut at and stays one tile)
  const source = `wavelength 405 nm
aperture rectangle(width: 60 um, height: 60 um)
profile superpose(wave(lens(focal: 500 um), weight: 0.6), wave(lens(focal: 700 um) + phase_map("ramp-8x8"), weight: 0.4))
quantize binary(duty: 0.5)
`;
  const parsed = parsePhaseCsv(readFileSync(path.join(root, 'examples/maps/ramp-8x8.csv'), 'utf8'), { pitchX: 5, unit: 'rad' });
  if (!parsed.ok) throw new Error(parsed.error);
  const maps = new Map([['ramp-8x8', parsed.map]]);
  const design = compiled(source, maps);

  it('gives the same polygons on threads, the map sent to them', async () => {
    expect(planMaskTiles(design, options.chordTolerance).length).toBeGreaterThan(1);
    const threaded = await buildMaskOnThreads({ source, phaseMaps: maps, design, options, threads: 2 });
    expect(differences(threaded, buildMask(design, options))).toEqual([]);
  });

  it('exports the same bundle bytes on 1 and on 2 threads', async () => {
    const exportWith = (threads: number) => exportDesign(source, { font, timestamp, designName: 'sampled-map', phaseMaps: (name) => maps.get(name), threads });
    const [one, two] = [await exportWith(1), await exportWith(2)];
    expect(two.sha256).toBe(one.sha256);
  });
});

describe('the thread option', () => {
  it('comes from zw export --threads as a whole number', () => {
    expect(parseExportArgs(['a.zw', '--out', 'b.zip', '--threads', '3']).options.threads).toBe(3);
    expect(parseExportArgs(['a.zw', '--out', 'b.zip']).options.threads).toBeUndefined();
    expect(() => parseExportArgs(['a.zw', '--out', 'b.zip', '--threads', 'two'])).toThrow('--threads needs a whole number; got "two"');
  });

  it.each([0, 1.5, 65])('refuses %s threads with the allowed range', async (threads) => {
    const result = exportDesign('wavelength 405 nm', { font, threads });
    await expect(result).rejects.toBeInstanceOf(ExportError);
    await expect(result).rejects.toThrow(`the thread count must be a whole number from 1 to 64, got ${threads}`);
  });
});

/** Threads of this process (Linux). */
async function threadCount(): Promise<number> {
  return Number(/Threads:\s+(\d+)/.exec(await readFile('/proc/self/status', 'utf8'))![1]);
}

/** The thread count once threads of earlier tests have finished ending: the lowest of 2 s of reads. */
async function settledThreadCount(): Promise<number> {
  let lowest = await threadCount();
  for (let waited = 0; waited < 2_000; waited += 100) {
    await new Promise((resolve) => setTimeout(resolve, 100));
    lowest = Math.min(lowest, await threadCount());
  }
  return lowest;
}

describe('an export job stopped by its time budget', () => {
  it('stops its tile threads with it', async () => {
    // libuv's thread pool is created on first use and stays: readFile starts it before the count
    const baseline = await settledThreadCount();
    const exporter = threadedTask<ExportInput, ExportOutcome>({ modulePath: path.join(root, 'lib/jobs/export-revision.ts'), exportName: 'exportRevision', budgetMs: 20_000, what: 'export' });
    // over a minute of tracing on one core: the tile threads are busy when the budget ends
    const source = readFileSync(path.join(root, 'examples', 'two-focus-offaxis.zw'), 'utf8').replace('460 um', '8 mm');
    let peak = baseline;
    const sampler = setInterval(() => void threadCount().then((n) => (peak = Math.max(peak, n))), 100);
    const input: ExportInput = { source, designId: 'd', designName: 'stopped', revisionId: 'r', revisionNumber: 1, savedAt: timestamp.toISOString(), processProfile: {}, phaseMaps: [] };
    await expect(exporter(input, () => undefined)).rejects.toThrow(/ran longer than its 20 s budget/);
    clearInterval(sampler);
    // the job thread and, on a machine of several cores, at least one tile thread were running (on a loaded machine the job thread
    // may still be starting the others when the budget ends, so not every core's thread is counted)
    expect(peak).toBeGreaterThanOrEqual(baseline + 1 + (availableParallelism() > 1 ? 1 : 0));
    let now = await threadCount();
    for (let waited = 0; now > baseline && waited < 10_000; waited += 100) {
      await new Promise((resolve) => setTimeout(resolve, 100));
      now = await threadCount();
    }
    expect(now).toBeLessThanOrEqual(baseline);
  });
});
