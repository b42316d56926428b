/**
 * `npm run zw -- check <script...> [--phase-map NAME=FILE@PITCH ...]`: prints each problem as
 * `file:line:col: severity: message` (with the hint indented below), and a one-line design
 * summary for each clean script. Phase maps come from CSV (radians) or 16-bit PNG files on disk,
 * PITCH in µm; without them a script using phase_map checks but is summarised without the map.
 * Exit code 1 when any script has an error, 0 otherwise.
 */
import { readFile } from 'node:fs/promises';
import type { PhaseMap } from '../../lib/lang';
import { checkScript, compileScript, describeDesign } from '../../lib/lang';
import { parsePhaseCsv, parsePhasePng } from '../../lib/phasemap';

const FLAT: PhaseMap = { columns: 2, rows: 2, pitchX: 1, pitchY: 1, originX: 0, originY: 0, values: new Float64Array(4) };

/** Reads `NAME=FILE@PITCH` into a named map, or says what is wrong. */
async function loadMap(spec: string): Promise<[string, PhaseMap] | string> {
  const match = /^([^=]+)=(.+)@([0-9.eE+-]+)$/.exec(spec);
  if (!match) return `--phase-map ${spec}: expected NAME=FILE@PITCH, e.g. logo=maps/logo.png@2`;
  const [, name, file, pitchText] = match;
  let bytes: Buffer;
  try {
    bytes = await readFile(file);
  } catch {
    return `--phase-map ${spec}: cannot read ${file}`;
  }
  const pitchX = Number(pitchText);
  const result = /\.png$/i.test(file) ? parsePhasePng(new Uint8Array(bytes), { pitchX }) : parsePhaseCsv(bytes.toString('utf8'), { pitchX, unit: 'rad' });
  return result.ok ? [name, result.map] : `${file}: error: ${result.error}`;
}

export async function run(args: string[]): Promise<number> {
  const files: string[] = [];
  const maps = new Map<string, PhaseMap>();
  for (let i = 0; i < args.length; i++) {
    if (args[i] === '--phase-map') {
      const loaded = await loadMap(args[++i] ?? '');
      if (typeof loaded === 'string') {
        console.error(loaded);
        return 1;
      }
      maps.set(...loaded);
    } else if (!args[i].startsWith('-')) files.push(args[i]);
  }
  if (files.length === 0) {
    console.error('usage: npm run zw -- check <script.zw> [more scripts…] [--phase-map NAME=FILE@PITCH]');
    return 2;
  }
  let failed = false;
  for (const file of files) {
    let source: string;
    try {
      source = await readFile(file, 'utf8');
    } catch (error) {
      const code = (error as NodeJS.ErrnoException).code;
      console.error(`${file}: error: cannot read the file (${code === 'ENOENT' ? 'no such file' : code ?? 'unknown reason'})`);
      failed = true;
      continue;
    }
    const diagnostics = checkScript(source);
    for (const d of diagnostics) {
      console.log(`${file}:${d.start.line}:${d.start.column}: ${d.severity}: ${d.message}`);
      if (d.hint) console.log(`    hint: ${d.hint}`);
    }
    if (diagnostics.some((d) => d.severity === 'error')) {
      failed = true;
      continue;
    }
    const compiled = compileScript(source, { phaseMaps: (name) => maps.get(name) ?? FLAT });
    console.log(`${file}: ok: ${compiled.ok ? describeDesign(compiled.design) : 'checks clean'}`);
  }
  return failed ? 1 : 0;
}
