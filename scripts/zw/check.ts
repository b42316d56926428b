/**
 * `npm run zw -- check <script...>`: prints each problem as `file:line:col: severity: message`
 * (with the hint indented below), and a one-line design summary for each clean script.
 * Exit code 1 when any script has an error, 0 otherwise.
 */
import { readFile } from 'node:fs/promises';
import { checkScript, compileScript, describeDesign } from '../../lib/lang';

export async function run(args: string[]): Promise<number> {
  const files = args.filter((a) => !a.startsWith('-'));
  if (files.length === 0) {
    console.error('usage: npm run zw -- check <script.zw> [more scripts…]');
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
    // Phase maps are not on disk for the checker; a script using one checks but is summarised without it.
    const compiled = compileScript(source, { phaseMaps: () => ({ columns: 2, rows: 2, pitchX: 1, pitchY: 1, originX: 0, originY: 0, values: new Float64Array(4) }) });
    console.log(`${file}: ok: ${compiled.ok ? describeDesign(compiled.design) : 'checks clean'}`);
  }
  return failed ? 1 : 0;
}
