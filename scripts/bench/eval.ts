/**
 * `npm run bench:eval`: evaluation speed of compiled profiles on one core, in samples per second.
 * Targets from issue 3: 20 M/s for a single lens, 5 M/s for a two-focus combination.
 */
import { compileScript } from '../../lib/lang';
import type { PhaseField } from '../../lib/design/types';

const SINGLE = `wavelength 405 nm
aperture circle(diameter: 460 um)
profile lens(focal: 1 mm)
quantize binary(duty: 0.5)
`;

const TWO_FOCI = `wavelength 405 nm
aperture circle(diameter: 460 um)
profile superpose(wave(lens(focal: 800 um, centre: (-40 um, 0 um)), weight: 0.6), wave(lens_to(focus: (60 um, 25 um, 1.2 mm)), weight: 0.4))
quantize binary(duty: 0.5)
`;

function fieldOf(source: string): PhaseField {
  const compiled = compileScript(source);
  if (!compiled.ok) throw new Error(compiled.diagnostics.map((d) => d.message).join('; '));
  return compiled.design.pieces[0].field;
}

/** CPU seconds used by this process so far: a rate per CPU second stays fair on a shared, busy machine. */
function cpuSeconds(): number {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1e6;
}

/** Samples per CPU second of `row` over rows of 4096 samples across the 460 µm aperture, best of 5 runs of ≥ 0.4 s. */
function measure(row: (y: number, xs: Float64Array) => void): number {
  const n = 4096;
  const xs = Float64Array.from({ length: n }, (_, i) => -230 + (460 * i) / (n - 1));
  let best = 0;
  for (let run = 0; run < 6; run++) {
    let samples = 0;
    const start = cpuSeconds();
    let elapsed = 0;
    for (let j = 0; elapsed < 0.4; j++) {
      row(-230 + (j % 4096) * (460 / 4095), xs);
      samples += n;
      if ((j & 15) === 15) elapsed = cpuSeconds() - start;
    }
    elapsed = cpuSeconds() - start;
    // the first run warms the JIT up
    if (run > 0) best = Math.max(best, samples / elapsed);
  }
  return best;
}

function report(name: string, field: PhaseField, target: number): void {
  const n = 4096;
  const re = new Float64Array(n);
  const im = new Float64Array(n);
  const out = new Float64Array(n);
  const phaseRow = field.phaseRow?.bind(field);
  const phase = phaseRow ? measure((y, xs) => phaseRow(y, xs, out)) : 0;
  const complex = measure((y, xs) => field.fieldRow(y, xs, re, im));
  const m = (v: number): string => `${(v / 1e6).toFixed(1)} M samples/s`;
  console.log(`${name.padEnd(22)} phaseRow ${m(phase).padStart(18)}   fieldRow ${m(complex).padStart(18)}   target ${m(target)}`);
}

console.log(`eval benchmark: samples per CPU second on one core, Node ${process.version}`);
report('single lens', fieldOf(SINGLE), 20e6);
report('two-focus combination', fieldOf(TWO_FOCI), 5e6);
