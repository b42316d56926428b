/**
 * `npm run bench:export`: builds masks and writes GDSII + OASIS, one child process per case so the
 * peak memory printed is that case's own. Cases: a binary zone plate (f = 20 mm, λ = 633 nm, 5 nm
 * chord tolerance) and a two-focus off-axis design, each at three aperture diameters so the growth
 * with the vertex count shows. Prints wall time (mask, files), peak RSS, vertices, vertices per
 * second and file sizes. The aims (10 mm plate under 1 s and 600 MB) are in DEVELOPERS.md.
 */
import { spawnSync } from 'node:child_process';
import { compileScript } from '../../lib/lang';
import { buildMask } from '../../lib/geometry';
import { gdsiiChunks } from '../../lib/gdsii';
import { oasisChunks } from '../../lib/oasis';

const DIAMETERS_MM = [2.5, 5, 10];

const SCRIPTS: Record<string, (diameterMm: number) => string> = {
  'zone plate': (d) => `wavelength 633 nm
aperture circle(diameter: ${d} mm)
profile lens(focal: 20 mm)
quantize binary(duty: 0.5, modulation: amplitude, tone: positive)
`,
  'two-focus off-axis': (d) => `wavelength 633 nm
aperture circle(diameter: ${d} mm)
near = lens(focal: 20 mm)
far = lens_to(focus: (1 mm, 0.5 mm, 25 mm))
profile superpose(wave(near, weight: 0.6), wave(far, weight: 0.4))
quantize binary(duty: 0.5, modulation: phase, index: 1.6)
`,
};

function bytesOf(chunks: Iterable<Uint8Array>): number {
  let n = 0;
  for (const c of chunks) n += c.length;
  return n;
}

function runCase(name: string, diameterMm: number): void {
  const compiled = compileScript(SCRIPTS[name](diameterMm));
  if (!compiled.ok) throw new Error(`the benchmark script does not compile: ${compiled.diagnostics.map((d) => d.message).join('; ')}`);
  const t0 = performance.now();
  const { library, report } = buildMask(compiled.design, { chordTolerance: 0.005 });
  const t1 = performance.now();
  const gdsBytes = bytesOf(gdsiiChunks(library));
  const oasBytes = bytesOf(oasisChunks(library));
  const t2 = performance.now();
  const peakMb = process.resourceUsage().maxRSS / 1024;
  console.log(JSON.stringify({ name, diameterMm, maskMs: t1 - t0, writeMs: t2 - t1, peakMb, vertices: report.vertexCount, polygons: report.polygonCount, zones: report.zoneCount, gdsBytes, oasBytes }));
}

function main(): void {
  const child = process.argv.indexOf('--case');
  if (child >= 0) {
    try {
      runCase(process.argv[child + 1], Number(process.argv[child + 2]));
    } catch (error) {
      console.log(JSON.stringify({ error: error instanceof Error ? error.message : String(error) }));
    }
    return;
  }
  console.log('case                 diameter   mask s  files s  peak MB   vertices  vertices/s  polygons  zones   GDSII MB  OASIS MB');
  for (const name of Object.keys(SCRIPTS)) {
    for (const d of DIAMETERS_MM) {
      const r = spawnSync(process.execPath, [...process.execArgv, process.argv[1], '--case', name, String(d)], { encoding: 'utf8', maxBuffer: 1 << 24 });
      const line = r.stdout.trim().split('\n').pop() ?? '';
      const m = line.startsWith('{') ? JSON.parse(line) : { error: (r.stderr || 'no output').trim().split('\n').slice(-1)[0] };
      if (m.error) {
        console.log(`${name.padEnd(20)} ${String(d).padStart(5)} mm  failed: ${m.error}`);
        continue;
      }
      const secs = m.maskMs / 1000;
      console.log(
        `${name.padEnd(20)} ${String(d).padStart(5)} mm ${secs.toFixed(2).padStart(8)} ${(m.writeMs / 1000).toFixed(2).padStart(8)} ${m.peakMb.toFixed(0).padStart(8)} ${String(m.vertices).padStart(10)} ${Math.round(m.vertices / secs).toString().padStart(11)} ${String(m.polygons).padStart(9)} ${String(m.zones).padStart(6)} ${(m.gdsBytes / 1e6).toFixed(1).padStart(10)} ${(m.oasBytes / 1e6).toFixed(1).padStart(9)}`,
      );
    }
  }
}

main();
