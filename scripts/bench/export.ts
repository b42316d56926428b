/**
 * `npm run bench:export [-- --threads N]`: builds masks and writes GDSII + OASIS, one child process
 * per case and thread count so the peak memory printed is that run's own. Cases: a binary zone plate
 * (f = 20 mm, λ = 633 nm, 5 nm chord tolerance) and a two-focus off-axis design, each at three
 * aperture diameters so the growth with the vertex count shows. Each case runs the mask on one thread
 * (buildMask) and on N worker threads (lib/export/mask-threads.ts; default: the available
 * parallelism). Prints wall time (mask per thread count, files), the mask's CPU time over all threads
 * per thread count (other load on the machine slows the wall time, not this), peak RSS per thread count,
 * vertices, vertices per second on one thread and file sizes. The aims (10 mm plate under 1 s and
 * 600 MB) are in DEVELOPERS.md.
 */
import { spawnSync } from 'node:child_process';
import { availableParallelism, loadavg } from 'node:os';
import { buildMaskOnThreads } from '../../lib/export/mask-threads';
import { buildMask, resolveMaskOptions } from '../../lib/geometry';
import { compileScript } from '../../lib/lang';
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

async function runCase(name: string, diameterMm: number, threads: number): Promise<void> {
  const source = SCRIPTS[name](diameterMm);
  const compiled = compileScript(source);
  if (!compiled.ok) throw new Error(`the benchmark script does not compile: ${compiled.diagnostics.map((d) => d.message).join('; ')}`);
  const options = resolveMaskOptions({ chordTolerance: 0.005 });
  const cpu0 = process.cpuUsage();
  const t0 = performance.now();
  const { library, report } =
    threads === 1 ? buildMask(compiled.design, options) : await buildMaskOnThreads({ source, phaseMaps: new Map(), design: compiled.design, options, threads });
  const t1 = performance.now();
  // every thread of the process, so the threads' start-up and warm-up show against one thread
  const cpu = process.cpuUsage(cpu0);
  const gdsBytes = bytesOf(gdsiiChunks(library));
  const oasBytes = bytesOf(oasisChunks(library));
  const t2 = performance.now();
  const peakMb = process.resourceUsage().maxRSS / 1024;
  console.log(JSON.stringify({ name, diameterMm, maskMs: t1 - t0, maskCpuMs: (cpu.user + cpu.system) / 1000, writeMs: t2 - t1, peakMb, vertices: report.vertexCount, polygons: report.polygonCount, zones: report.zoneCount, gdsBytes, oasBytes }));
}

interface CaseFigures {
  maskMs: number;
  maskCpuMs: number;
  writeMs: number;
  peakMb: number;
  vertices: number;
  polygons: number;
  zones: number;
  gdsBytes: number;
  oasBytes: number;
}

/** One case at one thread count in its own process; its last stdout line is the JSON figures. */
function childRun(name: string, diameterMm: number, threads: number): CaseFigures | { error: string } {
  const r = spawnSync(process.execPath, [...process.execArgv, process.argv[1], '--case', name, String(diameterMm), String(threads)], { encoding: 'utf8', maxBuffer: 1 << 24 });
  const line = r.stdout.trim().split('\n').pop() ?? '';
  return line.startsWith('{') ? JSON.parse(line) : { error: (r.stderr || 'no output').trim().split('\n').slice(-1)[0] };
}

async function main(): Promise<void> {
  const child = process.argv.indexOf('--case');
  if (child >= 0) {
    try {
      await runCase(process.argv[child + 1], Number(process.argv[child + 2]), Number(process.argv[child + 3]));
    } catch (error) {
      console.log(JSON.stringify({ error: error instanceof Error ? error.message : String(error) }));
    }
    return;
  }
  const flag = process.argv.indexOf('--threads');
  const threads = flag >= 0 ? Number(process.argv[flag + 1]) : availableParallelism();
  if (!(Number.isInteger(threads) && threads >= 2)) throw new Error(`--threads needs a whole number of 2 or more; got ${process.argv[flag + 1]}`);
  const t = `${threads}t`.padStart(3);
  // other work on the machine takes cores from the threaded run first
  console.log(`mask s and peak MB on 1 thread (1t) and on ${threads} worker threads (${threads}t); load average at the start ${loadavg()[0].toFixed(1)} on ${availableParallelism()} cores`);
  console.log(`case                 diameter mask s 1t mask s ${t} cpu s 1t cpu s ${t}  files s peak MB 1t peak MB ${t}   vertices vertices/s 1t  polygons  zones  GDSII MB  OASIS MB`);
  for (const name of Object.keys(SCRIPTS)) {
    for (const d of DIAMETERS_MM) {
      const one = childRun(name, d, 1);
      const many = childRun(name, d, threads);
      if ('error' in one || 'error' in many) {
        console.log(`${name.padEnd(20)} ${String(d).padStart(5)} mm  failed: ${'error' in one ? one.error : 'error' in many ? many.error : ''}`);
        continue;
      }
      // the threaded mask must be the same mask
      const same = one.vertices === many.vertices && one.polygons === many.polygons && one.gdsBytes === many.gdsBytes;
      const secs = one.maskMs / 1000;
      console.log(
        `${name.padEnd(20)} ${String(d).padStart(5)} mm ${secs.toFixed(2).padStart(10)} ${(many.maskMs / 1000).toFixed(2).padStart(10)} ${(one.maskCpuMs / 1000).toFixed(2).padStart(8)} ${(many.maskCpuMs / 1000).toFixed(2).padStart(8)} ${(one.writeMs / 1000).toFixed(2).padStart(8)} ${one.peakMb.toFixed(0).padStart(10)} ${many.peakMb.toFixed(0).padStart(10)} ${String(one.vertices).padStart(10)} ${Math.round(one.vertices / secs).toString().padStart(13)} ${String(one.polygons).padStart(9)} ${String(one.zones).padStart(6)} ${(one.gdsBytes / 1e6).toFixed(1).padStart(9)} ${(one.oasBytes / 1e6).toFixed(1).padStart(9)}${same ? '' : '  threaded mask differs!'}`,
      );
    }
  }
}

void main();
