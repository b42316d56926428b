import type { CompiledDesign } from '../design/types';
import { fabReadme, radialZones, sha256Hex, zipBundle, zoneTableCsv, layerMeaning, type BundleEntry, type BundleFile, type BundleManifest } from '../bundle';
import { gdsiiChunks } from '../gdsii';
import { GeometryError, MaskOptionsError, QuantizationError, RegionError, resolveMaskOptions, type ManufacturabilityReport, type MaskResult } from '../geometry';
import { compileScript } from '../lang';
import { concatBytes } from '../layout/concat-bytes';
import { textBytes } from '../layout/text-bytes';
import { buildExposureMatrix } from '../layout/exposure-matrix';
import type { LayoutLibrary } from '../layout/types';
import { oasisChunks } from '../oasis';
import { svgChunks } from '../svg';
import { loadLabelFont, textPolygons } from '../text';
import { addLabels } from './add-labels';
import { countVertices } from './count-vertices';
import { ENGINE_VERSION } from './engine-version';
import { ExportError, formatDiagnostics } from './errors';
import { resolveExportOptions, type ExportOptions, type ResolvedExportOptions } from './export-options';
import { libraryName } from './library-name';
import { buildMaskOnThreads, phaseMapRecorder, type MaskThreadsInput } from './mask-threads';
import { BIAS_CONVENTION, defaultCaption, matrixColumn, matrixColumnLines } from './matrix-columns';
import { reportLines } from './report-lines';

export interface ExportResult {
  zip: Uint8Array;
  /** of the zip */
  sha256: string;
  manifest: BundleManifest;
  /** the manufacturability report of the design (of the first column for a matrix, before its size bias; manifest.exposureMatrix.variants has each column's figures) */
  report: ManufacturabilityReport;
  /** every file in the zip, manifest.json included */
  files: BundleFile[];
  /** the report in short lines, as the CLI prints it */
  summary: string[];
  design: CompiledDesign;
}

const MATRIX_GAP = 50;
const MATRIX_LABEL_HEIGHT = 20;

/**
 * Script to release bundle: compile → mask geometry → labels → exposure matrix → GDSII, OASIS, SVG,
 * zone table → manifest and README → zip. Used by the CLI and by the server's export worker.
 * Throws ExportError for anything the designer can fix; the message is complete.
 */
export async function exportDesign(source: string, options: ExportOptions): Promise<ExportResult> {
  const settings = resolveExportOptions(options);
  const started = Date.now();
  settings.onProgress(0, 'compiling');
  // the maps the script reads go to the mask tile threads, which compile it again
  const phaseMaps = phaseMapRecorder(settings.phaseMaps);
  const compiled = compileScript(source, { phaseMaps: phaseMaps.lookup });
  if (!compiled.ok) {
    throw new ExportError('script', `the script has errors:\n${formatDiagnostics(compiled.diagnostics)}`, compiled.diagnostics);
  }
  const design = compiled.design;
  const font = loadLabelFont(settings.font);
  const name = libraryName(settings.designName, settings.revision);

  const variants = variantDesigns(design, settings);
  const built: MaskResult[] = [];
  for (const [index, variant] of variants.entries()) {
    const stage = variants.length > 1 ? `mask geometry, column ${index + 1} of ${variants.length}` : 'mask geometry';
    const progress = (done: number) => settings.onProgress(0.1 + (0.6 * (index + done)) / variants.length, stage);
    progress(0);
    const onTile = (tiles: number, total: number) => progress(tiles / total);
    built.push(await buildVariant({ source, phaseMaps: phaseMaps.used, design: variant, onTile }, settings, variants.length > 1 ? `${name.slice(0, 20)}_C${index + 1}` : name));
    requireTimeBudget(started, settings);
  }
  const columns = settings.matrix ? biasedColumns(built, design, settings, started) : null;
  const labelLayer = built[0].library.layers.find((l) => l.purpose === 'label') ?? settings.layers.labels;
  const labelled = (columns ?? built).map(({ library }) => addLabels(library, design.labels, font, labelLayer, settings.chordTolerance));

  settings.onProgress(0.75, 'labels and layout');
  const library = settings.matrix ? matrixLibrary(labelled, settings, name, font, labelLayer) : labelled[0];
  const { vertices } = countVertices(library);
  if (vertices > settings.vertexBudget) {
    throw new ExportError('budget', `the layout has ${vertices.toLocaleString('en')} vertices, more than the budget of ${settings.vertexBudget.toLocaleString('en')}; use a coarser chord tolerance or raise the budget`);
  }

  settings.onProgress(0.8, 'writing files');
  const title = `${settings.designName}${settings.revision === null ? '' : `, revision ${settings.revision}`}`;
  const contentFiles: BundleEntry[] = [
    { name: 'mask.gds', data: concatBytes(writerChunks(() => gdsiiChunks(library, { timestamp: settings.timestamp }))) },
    { name: 'mask.oas', data: concatBytes(writerChunks(() => oasisChunks(library, { compress: settings.compressOasis }))) },
    { name: 'preview.svg', data: concatBytes(textBytes(svgChunks(library, { title }))) },
  ];
  const zones = radialZones(design);
  if (zones) contentFiles.push({ name: 'zones.csv', data: zoneTableCsv(zones) });

  settings.onProgress(0.9, 'bundle');
  const report = built[0].report;
  const summary = [...reportLines(report, library, vertices), ...(columns ? matrixColumnLines(columns.map((c) => c.entry)) : [])];
  const manifestBody: Omit<BundleManifest, 'files'> = {
    format: 'zonewright-bundle/1',
    design: { name: settings.designName, id: settings.designId },
    revision: { number: settings.revision, id: settings.revisionId },
    createdAt: settings.timestamp.toISOString(),
    engineVersion: ENGINE_VERSION,
    source,
    wavelength: { micrometres: design.wavelength, nanometres: Number((design.wavelength * 1000).toPrecision(12)) },
    units: {
      lengthsIn: 'micrometres',
      userUnitMetres: library.userUnit,
      databaseUnitMetres: library.databaseUnit,
      databaseGridMicrometres: settings.databaseUnit,
    },
    settings: { chordToleranceMicrometres: settings.chordTolerance, maxVerticesPerPolygon: settings.maxVertices, minimumFeatureMicrometres: settings.minimumFeature },
    quantization: design.quantization,
    layers: library.layers.map((l) => ({ layer: l.layer, datatype: l.datatype, name: l.name, purpose: l.purpose, ...layerMeaning(l, design.quantization, design.wavelength) })),
    foci: design.foci,
    exposureMatrix:
      settings.matrix && columns ? { columns: columnCaptions(settings), rows: settings.matrix.rows, biasConvention: BIAS_CONVENTION, variants: columns.map((c) => c.entry) } : null,
    topCell: library.topCell,
    report,
  };
  const contentListing = contentFiles.map(describeFile);
  const readme: BundleEntry = { name: 'README.txt', data: fabReadme(manifestBody, contentListing, summary) };
  const manifest: BundleManifest = { ...manifestBody, files: [describeFile(readme), ...contentListing] };
  const manifestEntry: BundleEntry = { name: 'manifest.json', data: `${JSON.stringify(manifest, null, 2)}\n` };
  const entries = [readme, manifestEntry, ...contentFiles];
  const zip = zipBundle(entries, settings.timestamp);
  settings.onProgress(1, 'done');
  return { zip, sha256: sha256Hex(zip), manifest, report, files: entries.map(describeFile), summary, design };
}

/** A matrix column per duty variant; without a matrix, the design itself. */
function variantDesigns(design: CompiledDesign, settings: ResolvedExportOptions): CompiledDesign[] {
  if (!settings.matrix) return [design];
  const quantization = design.quantization;
  return settings.matrix.columns.map((column) => {
    if (column.duty === undefined) return design;
    if (quantization.kind !== 'binary') throw new ExportError('options', 'duty-cycle columns need a binary design; this design is multi-level');
    return { ...design, quantization: { ...quantization, duty: column.duty } };
  });
}

/** Each matrix column's size bias applied and its figures measured (see matrix-columns.ts). */
function biasedColumns(built: Array<{ library: LayoutLibrary; report: ManufacturabilityReport }>, design: CompiledDesign, settings: ResolvedExportOptions, started: number) {
  const captions = columnCaptions(settings);
  return built.map((mask, index) => {
    const column = settings.matrix!.columns[index];
    if (column.bias) settings.onProgress(0.7, `size bias, column ${index + 1} of ${built.length}`);
    const biased = matrixColumn(mask, column, captions[index], design, settings);
    requireTimeBudget(started, settings);
    return biased;
  });
}

function requireTimeBudget(started: number, settings: ResolvedExportOptions): void {
  if (Date.now() - started > settings.timeBudgetMs) {
    throw new ExportError('budget', `the geometry took longer than the time budget of ${(settings.timeBudgetMs / 1000).toFixed(0)} s; use a coarser chord tolerance or a smaller aperture`);
  }
}

/** One column's mask, its tiles on `settings.threads` threads. */
async function buildVariant(input: Omit<MaskThreadsInput, 'options' | 'threads'>, settings: ResolvedExportOptions, name: string): Promise<MaskResult> {
  try {
    const options = resolveMaskOptions({
      databaseUnit: settings.databaseUnit * 1e-6,
      userUnit: 1e-6,
      chordTolerance: settings.chordTolerance,
      maxVertices: settings.maxVertices,
      minimumFeature: settings.minimumFeature,
      layers: settings.layers,
      name,
    });
    return await buildMaskOnThreads({ ...input, options, threads: settings.threads });
  } catch (error) {
    if (error instanceof MaskOptionsError) throw new ExportError('options', error.message);
    if (error instanceof QuantizationError || error instanceof RegionError) throw new ExportError('script', error.message);
    if (error instanceof GeometryError) throw new ExportError('layout', error.message);
    throw error;
  }
}

function matrixLibrary(variants: LayoutLibrary[], settings: ResolvedExportOptions, name: string, font: ReturnType<typeof loadLabelFont>, labelLayer: { layer: number; datatype: number }): LayoutLibrary {
  const matrix = settings.matrix!;
  const captions = columnCaptions(settings);
  const tag = `${settings.designName.slice(0, 16)}${settings.revision === null ? '' : ` r${settings.revision}`}`;
  const databaseUnit = settings.databaseUnit;
  // identical columns (no duty or bias) share one cell, so the matrix becomes one array
  const same = matrix.columns.every((c) => c.duty === undefined && !c.bias);
  try {
    return buildExposureMatrix({
      name: `${name.slice(0, 21)}_MX`,
      columns: variants.map((library, c) => ({ library: same ? variants[0] : library, caption: captions[c] })),
      rows: matrix.rows,
      gap: MATRIX_GAP,
      labelHeight: MATRIX_LABEL_HEIGHT,
      labelLayer,
      labelFor: (c, r) => `${tag} ${captions[c]} ${matrix.rows[r]}`.trim(),
      drawLabel: (text, x, y) => textPolygons(font, { text, x, y, height: MATRIX_LABEL_HEIGHT }, { databaseUnit, chordTolerance: settings.chordTolerance }),
    });
  } catch (error) {
    throw new ExportError('layout', error instanceof Error ? error.message : String(error));
  }
}

function columnCaptions(settings: ResolvedExportOptions): string[] {
  return (settings.matrix?.columns ?? []).map((c, i) => c.caption ?? defaultCaption(c, i));
}

/** Runs a writer, turning its layout refusals (names, vertex limits) into export errors. */
function writerChunks(write: () => Generator<Uint8Array>): Uint8Array[] {
  try {
    return [...write()];
  } catch (error) {
    throw new ExportError('layout', error instanceof Error ? error.message : String(error));
  }
}

function describeFile(entry: BundleEntry): BundleFile {
  const bytes = typeof entry.data === 'string' ? new TextEncoder().encode(entry.data) : entry.data;
  return { name: entry.name, bytes: bytes.length, sha256: sha256Hex(bytes) };
}
