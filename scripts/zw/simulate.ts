/**
 * `npm run zw -- simulate <script.zw> [--json] [options]`: compiles the script, builds the mask as it
 * would be fabricated and runs the optical check on its polygons. Prints a table, or with --json one
 * JSON document (the SimulationResult). Exit 0 on success, 1 when the script or mask cannot be
 * simulated, 2 for bad arguments.
 */
import { readFile } from 'node:fs/promises';
import { buildMask, defaultMaskOptions } from '../../lib/geometry';
import { compileScript } from '../../lib/lang';
import { simulateMask, type SimulationOptions, type SimulationResult } from '../../lib/optics';
import { parseLength } from './export';

const USAGE = `usage: npm run zw -- simulate <script.zw> [--json] [options]

options:
  --json                   print the whole result as one JSON document
  --point-source LENGTH    light the mask from a point source this far in front, e.g. 40mm (default: plane wave)
  --band FROM,TO           chromatic band, e.g. 420nm,680nm (default: white LED 420–680 nm for visible designs)
  --method NAME            radial or fft-2d (default: radial when the design is symmetric)
  --grid N                 largest 2-D grid side, a power of two 256–4096 (default 2048)

Lengths take a unit: nm, um (or µm), mm.`;

class UsageError extends Error {}

export function parseSimulateArgs(args: string[]): { script: string; json: boolean; options: SimulationOptions } {
  const positional: string[] = [];
  const options: SimulationOptions = {};
  let json = false;
  for (let i = 0; i < args.length; i++) {
    const arg = args[i];
    const value = () => {
      const v = args[++i];
      if (v === undefined) throw new UsageError(`${arg} needs a value`);
      return v;
    };
    if (arg === '--json') json = true;
    else if (arg === '--point-source') options.illumination = { kind: 'point', distance_um: parseLength(value(), arg) };
    else if (arg === '--band') {
      const parts = value().split(',');
      if (parts.length !== 2) throw new UsageError('--band needs two lengths separated by a comma, like 420nm,680nm');
      const [from, to] = parts.map((p) => parseLength(p, arg));
      if (!(to > from)) throw new UsageError('--band must run from the shorter to the longer wavelength');
      options.band = { from_um: from, to_um: to };
    } else if (arg === '--method') {
      const m = value();
      if (m !== 'radial' && m !== 'fft-2d') throw new UsageError(`--method is radial or fft-2d; got "${m}"`);
      options.method = m;
    } else if (arg === '--grid') {
      const n = Number(value());
      if (!Number.isInteger(n) || n < 256 || n > 4096 || (n & (n - 1)) !== 0) throw new UsageError('--grid must be a power of two from 256 to 4096');
      options.maxGrid = n;
    } else if (arg.startsWith('-')) throw new UsageError(`unknown option ${arg}`);
    else positional.push(arg);
  }
  if (positional.length !== 1) throw new UsageError('give exactly one script');
  return { script: positional[0], json, options };
}

export async function run(args: string[]): Promise<number> {
  let parsed: ReturnType<typeof parseSimulateArgs>;
  try {
    parsed = parseSimulateArgs(args);
  } catch (error) {
    // everything thrown while reading the arguments (ours or parseLength's) is a usage problem
    console.error(`zw simulate: ${error instanceof Error ? error.message : String(error)}\n\n${USAGE}`);
    return 2;
  }
  let source: string;
  try {
    source = await readFile(parsed.script, 'utf8');
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    console.error(`${parsed.script}: error: cannot read the file (${code === 'ENOENT' ? 'no such file' : code ?? 'unknown reason'})`);
    return 1;
  }
  const compiled = compileScript(source);
  if (!compiled.ok) {
    for (const d of compiled.diagnostics) console.error(`${parsed.script}:${d.start.line}:${d.start.column}: ${d.severity}: ${d.message}`);
    return 1;
  }
  let result: SimulationResult;
  try {
    const { library } = buildMask(compiled.design, defaultMaskOptions());
    result = simulateMask(compiled.design, library, parsed.options, parsed.json ? undefined : progressOnStderr());
  } catch (error) {
    console.error(`${parsed.script}: error: ${error instanceof Error ? error.message : String(error)}`);
    return 1;
  }
  // the dispatcher exits right after run(); wait until a piped stdout has taken the whole document
  await new Promise((resolve) => process.stdout.write(`${parsed.json ? JSON.stringify(result) : formatTable(parsed.script, result)}\n`, resolve));
  return 0;
}

function progressOnStderr(): (fraction: number) => void {
  if (!process.stderr.isTTY) return () => {};
  return (fraction) => process.stderr.write(`\rsimulating… ${Math.round(fraction * 100)} %${fraction >= 1 ? '\r                 \r' : ''}`);
}

const um = (v: number | null, digits = 2) => (v === null || !Number.isFinite(v) ? '—' : v.toFixed(digits));
const pct = (v: number) => `${(100 * v).toFixed(2)} %`;
const triple = (p: [number, number, number]) => `(${um(p[0])}, ${um(p[1])}, ${um(p[2], 1)})`;

/** The readable report: foci, orders, chromatic shift, sampling and warnings. */
export function formatTable(name: string, r: SimulationResult): string {
  const lines: string[] = [];
  const light = r.illumination.kind === 'plane' ? 'plane wave' : `point source at ${um(r.illumination.distance_um / 1000, 1)} mm`;
  lines.push(`${name}: ${r.modulation} mask, λ ${(r.wavelength_um * 1000).toFixed(1)} nm, ${light}`);
  lines.push(`method: ${r.sampling.method} — ${r.sampling.note}`);
  lines.push(`aperture: ${um(r.aperture.area_um2, 0)} µm², equivalent diameter ${um(r.aperture.equivalentDiameter_um, 1)} µm`);
  lines.push('');
  lines.push('foci (µm)            designed (x, y, z)          found (x, y, z)             efficiency  peak/ideal  FWHM   limit  in Airy disc');
  r.foci.forEach((f, i) => {
    lines.push(`  ${String(i + 1).padEnd(18)} ${triple(f.designed_um).padEnd(27)} ${triple(f.found_um).padEnd(27)} ${pct(f.efficiency).padStart(10)}  ${pct(f.peakRatio).padStart(10)}  ${um(f.fwhm_um).padStart(5)}  ${um(f.diffractionLimitFwhm_um).padStart(5)}  ${pct(f.encircledEnergy).padStart(9)}`);
  });
  lines.push('');
  lines.push('orders               focus  expected z (µm)  found z (µm)  efficiency');
  for (const o of r.orders) {
    const label = o.order === 0 ? 'zero' : o.order < 0 ? `${o.order} (virtual)` : `+${o.order}`;
    lines.push(`  ${label.padEnd(18)} ${(o.focusIndex === null ? '—' : String(o.focusIndex + 1)).padEnd(6)} ${um(o.expectedZ_um, 1).padStart(15)}  ${um(o.z_um, 1).padStart(12)}  ${pct(o.efficiency).padStart(10)}${o.resolved ? '' : '  (finer than the grid resolves: aliased)'}`);
  }
  lines.push('');
  lines.push(`chromatic shift of focus ${r.chromatic.focusIndex + 1}   λ (nm)   focus z (µm)   f0·λ0/λ (µm)`);
  r.chromatic.wavelength_um.forEach((l, i) => {
    lines.push(`${''.padEnd(30)}${(l * 1000).toFixed(1).padStart(7)}   ${um(r.chromatic.focus_z_um[i], 1).padStart(12)}   ${um(r.chromatic.expected_z_um[i], 1).padStart(12)}`);
  });
  lines.push(`  ${r.chromatic.note}`);
  if (r.warnings.length > 0) {
    lines.push('');
    for (const w of r.warnings) lines.push(`warning: ${w}`);
  }
  lines.push('');
  lines.push('caution: a focusing element concentrates light; follow your laboratory\'s laser-safety rules (exposure classes per IEC 60825-1) and local codes.');
  return lines.join('\n');
}
