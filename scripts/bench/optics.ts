/**
 * `npm run bench:optics`: time and memory of the optical check on this machine.
 *  1. A 2048 × 2048 angular-spectrum propagation (forward FFT, transfer function, inverse FFT), and the
 *     product's 2-D path on the same grid: rasterising the two-focus example's polygons, one axial scan,
 *     one focal map.
 *  2. The radial integral of a 10 mm zone plate (f 20 mm, λ 633 nm): the whole check.
 * Target from issue 5: each under 5 s and 1 GB. Mask building (lib/geometry) is not timed.
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { buildMask, defaultMaskOptions } from '../../lib/geometry';
import { compileScript } from '../../lib/lang';
import type { CompiledDesign } from '../../lib/design/types';
import { simulateMask } from '../../lib/optics';
import { buildEngine } from '../../lib/optics/build-engine';
import { fft2d } from '../../lib/optics/fft2d';
import { readMaskModel } from '../../lib/optics/mask-model';

const PLATE_10MM = `wavelength 633 nm
aperture circle(diameter: 10 mm)
profile lens(focal: 20 mm)
quantize binary(duty: 0.5, modulation: amplitude, tone: positive)
`;

function compile(source: string): CompiledDesign {
  const compiled = compileScript(source);
  if (!compiled.ok) throw new Error(compiled.diagnostics.map((d) => d.message).join('; '));
  return compiled.design;
}

function timed<T>(label: string, work: () => T): T {
  const start = process.hrtime.bigint();
  const value = work();
  const seconds = Number(process.hrtime.bigint() - start) / 1e9;
  const rss = process.memoryUsage().rss / 2 ** 20;
  console.log(`${label.padEnd(58)} ${seconds.toFixed(2).padStart(7)} s   RSS ${rss.toFixed(0).padStart(5)} MiB`);
  return value;
}

function plainPropagation(n: number, pitch: number, wavelength: number, z: number): void {
  const field = new Float64Array(2 * n * n);
  // a centred disc of half the grid width, as a stand-in transmission
  for (let j = 0; j < n; j++) for (let i = 0; i < n; i++) if ((i - n / 2) ** 2 + (j - n / 2) ** 2 < (n / 4) ** 2) field[2 * (j * n + i)] = 1;
  fft2d(field, n, false);
  for (let j = 0; j < n; j++) {
    const fy = (j < n / 2 ? j : j - n) / (n * pitch);
    for (let i = 0; i < n; i++) {
      const fx = (i < n / 2 ? i : i - n) / (n * pitch);
      const rest = 1 / wavelength ** 2 - fx * fx - fy * fy;
      const c = 2 * (j * n + i);
      if (rest <= 0) {
        field[c] = field[c + 1] = 0;
        continue;
      }
      const phase = 2 * Math.PI * Math.sqrt(rest) * z;
      const re = field[c] * Math.cos(phase) - field[c + 1] * Math.sin(phase);
      field[c + 1] = field[c] * Math.sin(phase) + field[c + 1] * Math.cos(phase);
      field[c] = re;
    }
  }
  fft2d(field, n, true);
}

function main(): void {
  console.log(`optics benchmark on Node ${process.version}, ${new Date().toISOString()}`);
  timed('2048² angular-spectrum propagation (FFT, H, inverse FFT)', () => plainPropagation(2048, 0.45, 0.405, 1000));

  const twoFocus = compile(readFileSync(path.resolve(__dirname, '../../examples/two-focus-offaxis.zw'), 'utf8'));
  // finer seed lines than the default, which the geometry engine needed for this design at the time of writing
  const { library } = buildMask(twoFocus, { ...defaultMaskOptions(), seedSpacing: 20, chordTolerance: 0.02 });
  const mask = readMaskModel(twoFocus, library);
  const built = timed('two-focus example: rasterise polygons, FFT, pixel correction', () => buildEngine(twoFocus, mask, { kind: 'plane' }, { maxGrid: 2048 }));
  console.log(`  grid ${built.engine.sampling.gridSize}², pitch ${built.engine.sampling.pitch_um?.toFixed(3)} µm`);
  const [focus] = twoFocus.foci;
  timed('  axial scan, 200 points', () => built.engine.axialIntensities(focus.x, focus.y, focus.z / 6, (1.6 * focus.z - focus.z / 6) / 199, 200));
  timed('  focal map, 41 × 41 points', () => built.engine.focalMap(focus.x, focus.y, focus.z, 0.1, 41));
  timed('  efficiency projection', () => built.engine.projectedPower({ x: focus.x, y: focus.y, z: focus.z, phasePerLength: (2 * Math.PI) / twoFocus.wavelength, withIncidentPhase: true }));

  const plate = compile(PLATE_10MM);
  const plateMask = buildMask(plate, defaultMaskOptions());
  const radial = buildEngine(plate, readMaskModel(plate, plateMask.library), { kind: 'plane' }, {});
  timed('10 mm plate, f 20 mm, λ 633 nm: radial axial scan, 600 points', () => radial.engine.axialIntensities(0, 0, 20000 / 6, (1.6 * 20000 - 20000 / 6) / 599, 600));
  timed('  focal map from the radial integral, 41 × 41 points', () => radial.engine.focalMap(0, 0, 20000, 0.2, 41));
  const result = timed('  whole check (foci, orders, maps, 7-point chromatic scan)', () => simulateMask(plate, plateMask.library));
  console.log(`  ${result.sampling.transitions} radial segments, focus at ${result.foci[0].found_um[2].toFixed(1)} µm, efficiency ${(100 * result.foci[0].efficiency).toFixed(2)} %`);
  console.log(`peak RSS ${(process.resourceUsage().maxRSS / 1024).toFixed(0)} MiB`);
}

main();
