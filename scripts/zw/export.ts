/**
 * `npm run zw -- export <script.zw> --out <bundle.zip> [options]`: the same export the server runs,
 * printing the report summary. Exit 0 on success, 1 when the export is refused, 2 for bad arguments.
 */
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { ExportError, exportDesign, type ExportOptions } from '../../lib/export';

const FONT = path.resolve(__dirname, '../../fonts/jetbrains-mono-latin-400-normal.woff');

const USAGE = `usage: npm run zw -- export <script.zw> --out <bundle.zip> [options]

options:
  --out FILE               where to write the bundle (required)
  --tolerance LENGTH       chord tolerance, e.g. 5nm (default 5nm)
  --grid LENGTH            database grid, e.g. 1nm (default 1nm)
  --max-vertices N         most points per polygon, 199–8190 (default 4095)
  --vertex-budget N        refuse layouts with more vertices in total (default 20000000)
  --minimum-feature LENGTH process minimum feature, e.g. 1um (default 1um)
  --name TEXT              design name for the manifest and labels (default: the file name)
  --revision N             revision number for the manifest and labels
  --date ISO-DATE          date written into the files (default: now), for reproducible bundles
  --threads N              worker threads for the mask tiles, 1–64 (default: one per core)
  --matrix-duty LIST       exposure matrix: one column per duty cycle, e.g. 0.4,0.5,0.6
  --matrix-bias LIST       exposure matrix: one column per size bias in µm, signed, e.g. -0.1,0,0.1;
                           every drawn edge moves out by bias/2, so zones widen by the bias and gaps
                           narrow by it (the usual meaning); with --matrix-duty, one bias per duty
  --matrix-rows LIST       exposure matrix: one row per caption, e.g. "D 90%,D 100%,D 110%"
  --cblock                 compress the OASIS cells with CBLOCKs (raw DEFLATE)

Lengths take a unit: nm, um (or µm), mm.`;

class UsageError extends Error {}

const LENGTH_UNITS: Record<string, number> = { nm: 1e-3, um: 1, µm: 1, mm: 1e3 };

/** "5nm", "0.005 um", "1µm" → µm. */
export function parseLength(text: string, flag: string): number {
  const match = /^\s*([0-9]*\.?[0-9]+(?:e[-+]?[0-9]+)?)\s*(nm|um|µm|mm)\s*$/i.exec(text);
  if (!match) throw new UsageError(`${flag} needs a length with a unit, like 5nm or 0.005um; got "${text}"`);
  const value = Number(match[1]) * LENGTH_UNITS[match[2].toLowerCase()];
  if (!(value > 0)) throw new UsageError(`${flag} must be a positive length; got "${text}"`);
  return value;
}

function parseWhole(text: string, flag: string): number {
  if (!/^\d+$/.test(text)) throw new UsageError(`${flag} needs a whole number; got "${text}"`);
  return Number(text);
}

function numberList(text: string, flag: string): number[] {
  return text.split(',').map((item) => {
    const value = Number(item);
    if (item.trim() === '' || !Number.isFinite(value)) throw new UsageError(`${flag} needs numbers separated by commas; got "${text}"`);
    return value;
  });
}

interface Parsed {
  script: string;
  out: string;
  options: Omit<ExportOptions, 'font'>;
}

const VALUE_FLAGS = new Set(['--out', '--tolerance', '--grid', '--max-vertices', '--vertex-budget', '--minimum-feature', '--name', '--revision', '--date', '--threads', '--matrix-duty', '--matrix-bias', '--matrix-rows']);

export function parseExportArgs(args: string[]): Parsed {
  const values = new Map<string, string>();
  const positional: string[] = [];
  let compress = false;
  for (let i = 0; i < args.length; i++) {
    const arg = args[i];
    if (arg === '--cblock') compress = true;
    else if (VALUE_FLAGS.has(arg)) {
      const value = args[++i];
      if (value === undefined) throw new UsageError(`${arg} needs a value`);
      values.set(arg, value);
    } else if (arg.startsWith('--') && arg.includes('=') && VALUE_FLAGS.has(arg.slice(0, arg.indexOf('=')))) {
      values.set(arg.slice(0, arg.indexOf('=')), arg.slice(arg.indexOf('=') + 1));
    } else if (arg.startsWith('-')) throw new UsageError(`unknown option ${arg}`);
    else positional.push(arg);
  }
  if (positional.length !== 1) throw new UsageError(positional.length === 0 ? 'name the script to export' : `one script at a time; got ${positional.join(', ')}`);
  const out = values.get('--out');
  if (!out) throw new UsageError('--out <bundle.zip> is required');
  const script = positional[0];
  const options: Omit<ExportOptions, 'font'> = { designName: path.basename(script).replace(/\.zw$/, ''), compressOasis: compress };
  const get = (flag: string) => values.get(flag);
  if (get('--tolerance')) options.chordTolerance = parseLength(get('--tolerance')!, '--tolerance');
  if (get('--grid')) options.databaseUnit = parseLength(get('--grid')!, '--grid');
  if (get('--minimum-feature')) options.minimumFeature = parseLength(get('--minimum-feature')!, '--minimum-feature');
  if (get('--max-vertices')) options.maxVertices = parseWhole(get('--max-vertices')!, '--max-vertices');
  if (get('--vertex-budget')) options.vertexBudget = parseWhole(get('--vertex-budget')!, '--vertex-budget');
  if (get('--revision')) options.revision = parseWhole(get('--revision')!, '--revision');
  if (get('--threads')) options.threads = parseWhole(get('--threads')!, '--threads');
  if (get('--name')) options.designName = get('--name');
  if (get('--date')) {
    const date = new Date(get('--date')!);
    if (Number.isNaN(date.getTime())) throw new UsageError(`--date needs an ISO date like 2026-12-01T12:00:00Z; got "${get('--date')}"`);
    options.timestamp = date;
  }
  const duties = get('--matrix-duty');
  const biases = get('--matrix-bias');
  const rows = get('--matrix-rows');
  if (duties || biases || rows) {
    const dutyList = duties ? numberList(duties, '--matrix-duty') : null;
    const biasList = biases ? numberList(biases, '--matrix-bias') : null;
    if (dutyList && biasList && dutyList.length !== biasList.length) {
      throw new UsageError(`--matrix-duty and --matrix-bias give one value per column, so they need the same length; got ${dutyList.length} duty cycles and ${biasList.length} biases`);
    }
    const count = dutyList?.length ?? biasList?.length ?? 1;
    const columns = Array.from({ length: count }, (_, i) => ({ ...(dutyList ? { duty: dutyList[i] } : {}), ...(biasList ? { bias: biasList[i] } : {}) }));
    options.matrix = { columns, rows: rows ? rows.split(',').map((r) => r.trim()) : [''] };
  }
  return { script, out, options };
}

export async function run(args: string[]): Promise<number> {
  if (args.includes('--help') || args.includes('-h')) {
    console.log(USAGE);
    return 0;
  }
  let parsed: Parsed;
  try {
    parsed = parseExportArgs(args);
  } catch (error) {
    if (!(error instanceof UsageError)) throw error;
    console.error(`zw export: ${error.message}\n\n${USAGE}`);
    return 2;
  }
  if (!existsSync(parsed.script)) {
    console.error(`zw export: no script at ${parsed.script}`);
    return 2;
  }
  const source = readFileSync(parsed.script, 'utf8');
  const started = performance.now();
  try {
    const result = await exportDesign(source, { ...parsed.options, font: readFileSync(FONT) });
    writeFileSync(parsed.out, result.zip);
    console.log(`${parsed.script} → ${parsed.out} (${result.zip.length.toLocaleString('en')} bytes, ${((performance.now() - started) / 1000).toFixed(2)} s)`);
    for (const line of result.summary) console.log(`  ${line}`);
    for (const file of result.files) console.log(`  ${file.name.padEnd(14)} ${String(file.bytes).padStart(11)} bytes  sha256 ${file.sha256}`);
    console.log(`  bundle sha256 ${result.sha256}`);
    return 0;
  } catch (error) {
    if (error instanceof ExportError) {
      console.error(`zw export: ${parsed.script}: ${error.message}`);
      return 1;
    }
    throw error;
  }
}
