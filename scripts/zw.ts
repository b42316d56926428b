/**
 * The Zonewright command line: `npm run zw -- <command> [arguments]`.
 * Each command lives in scripts/zw/<command>.ts and exports `run(args): Promise<number>` (the exit code).
 */
const commands: Record<string, { summary: string; load: () => Promise<{ run(args: string[]): Promise<number> }> }> = {
  check: { summary: 'check scripts and report errors with line:column', load: () => import('./zw/check') },
  export: { summary: 'export a script to a bundle (GDSII, OASIS, SVG, manifest)', load: () => import('./zw/export') },
  simulate: { summary: 'simulate the quantized mask (foci, orders, chromatic shift)', load: () => import('./zw/simulate') },
};

function usage(): string {
  const lines = Object.entries(commands).map(([name, c]) => `  ${name.padEnd(10)} ${c.summary}`);
  return ['usage: npm run zw -- <command> [arguments]', '', 'commands:', ...lines].join('\n');
}

async function main(): Promise<number> {
  const [name, ...args] = process.argv.slice(2);
  if (!name || name === '--help' || name === '-h') {
    console.log(usage());
    return name ? 0 : 2;
  }
  const command = commands[name];
  if (!command) {
    console.error(`zw: unknown command "${name}"\n\n${usage()}`);
    return 2;
  }
  try {
    return await (await command.load()).run(args);
  } catch (error) {
    console.error(`zw ${name}: ${error instanceof Error ? error.message : String(error)}`);
    return 1;
  }
}

main().then((code) => process.exit(code));
