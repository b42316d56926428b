import type { BundleFile, BundleManifest } from './manifest';

/**
 * README.txt for fab staff: what each file is, the layer map with polarity, units, the process minimum,
 * the checksums, and the usual safety cautions.
 */
export function fabReadme(manifest: Omit<BundleManifest, 'files'>, files: readonly BundleFile[], reportLines: readonly string[]): string {
  const rule = '-'.repeat(72);
  const revision = manifest.revision.number === null ? 'unsaved' : `revision ${manifest.revision.number}`;
  const lines = [
    `ZONEWRIGHT MASK BUNDLE: ${manifest.design.name}, ${revision}`,
    rule,
    `Created ${manifest.createdAt} by engine ${manifest.engineVersion}.`,
    `Top cell: ${manifest.topCell}`,
    '',
    'FILES',
    ...files.map((f) => `  ${f.name.padEnd(16)} ${String(f.bytes).padStart(12)} bytes  sha256 ${f.sha256}`),
    '  manifest.json    machine-readable description of everything here (layer map, units, foci, report)',
    '  Check a file with: sha256sum <file>',
    '',
    'UNITS',
    `  Coordinates are integers in database units of ${manifest.units.databaseGridMicrometres} µm (${manifest.units.databaseUnitMetres} m);`,
    `  user unit ${manifest.units.userUnitMetres} m (1 µm). The GDSII and OASIS files hold identical geometry.`,
    `  Wavelength ${manifest.wavelength.nanometres} nm. Chord tolerance ${manifest.settings.chordToleranceMicrometres} µm;`,
    `  at most ${manifest.settings.maxVerticesPerPolygon} points per polygon; polygons have no holes.`,
    '',
    'LAYERS AND POLARITY',
    ...manifest.layers.flatMap((l) => [`  ${`${l.layer}/${l.datatype}`.padEnd(7)} ${l.name} (${l.purpose}): ${l.meaning}`, `          polarity: ${l.tone}`]),
    '',
    'PROCESS',
    `  Process minimum feature: ${manifest.settings.minimumFeatureMicrometres} µm. Features narrower than this are listed as`,
    '  warnings in the report below and in manifest.json; check them before exposure.',
    ...(manifest.exposureMatrix
      ? [
          '',
          'EXPOSURE MATRIX',
          `  Columns: ${manifest.exposureMatrix.columns.join(' | ')}`,
          `  Rows:    ${manifest.exposureMatrix.rows.join(' | ')}`,
          '  Each element carries its label; expose each row at the dose its label names.',
          ...(manifest.exposureMatrix.variants.some((v) => v.bias_um !== null) ? [`  Size bias (µm, drawn in the columns' geometry): ${manifest.exposureMatrix.biasConvention}`] : []),
        ]
      : []),
    '',
    'REPORT',
    ...reportLines.map((l) => `  ${l}`),
    '',
    'CAUTIONS',
    '  Resists, developers, chrome etchants and solvents are hazardous. Handle them only under your',
    "  lab's safety rules, with the protective equipment and ventilation its procedures require, and",
    '  dispose of them as local regulations require.',
    '  A lens made from this mask concentrates light at its foci. Never look into a focused beam or along',
    "  the optical axis; use laser sources only within their class and your lab's laser-safety rules.",
    '  These notes do not replace local codes, the safety data sheets, or licensed practice.',
    '',
  ];
  return lines.join('\n');
}
