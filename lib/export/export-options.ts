import { availableParallelism } from 'node:os';
import { defaultMaskOptions, type MaskLayerOptions } from '../geometry';
import type { PhaseMap } from '../phasemap/types';
import { ExportError } from './errors';

export interface ExposureMatrixRequest {
  /**
   * one entry per column; `duty` overrides the binary duty cycle of that column; `bias` (µm, signed) is
   * a size bias: every drawn edge moves outward by bias/2, so drawn features widen by `bias`
   */
  columns: Array<{ duty?: number; bias?: number; caption?: string }>;
  /** one caption per row, e.g. "D 100%" */
  rows: string[];
}

export interface ExportOptions {
  designName?: string;
  designId?: string | null;
  revision?: number | null;
  revisionId?: string | null;
  /** dates the files and the zip entries; fixed per revision so the bundle is reproducible */
  timestamp?: Date;
  /** µm; default 0.005 (5 nm) */
  chordTolerance?: number;
  /** database grid in µm; default 0.001 (1 nm) */
  databaseUnit?: number;
  /** most points per polygon; default 4095 */
  maxVertices?: number;
  /** refuse layouts with more vertices than this in total; default 20 million */
  vertexBudget?: number;
  /** refuse when the geometry took longer than this, ms; default 10 minutes */
  timeBudgetMs?: number;
  /** process minimum feature, µm; default 1 */
  minimumFeature?: number;
  /** label font bytes (the CLI and the server read fonts/jetbrains-mono-latin-400-normal.woff) */
  font: Uint8Array;
  /** wrap OASIS cells in CBLOCKs; off by default: the zip deflates the file anyway and CBLOCKs cost ~10x the write time */
  compressOasis?: boolean;
  matrix?: ExposureMatrixRequest;
  /** layer and datatype per purpose (the design's layer map); unset purposes keep the geometry's defaults */
  layers?: Partial<MaskLayerOptions>;
  phaseMaps?: (name: string) => PhaseMap | undefined;
  /** worker threads for the mask tiles, 1 to 64; default: the machine's available parallelism (at most 64) */
  threads?: number;
  onProgress?: (fraction: number, stage: string) => void;
}

export interface ResolvedExportOptions extends Required<Omit<ExportOptions, 'matrix' | 'phaseMaps' | 'onProgress' | 'layers'>> {
  matrix: ExposureMatrixRequest | null;
  layers: MaskLayerOptions;
  phaseMaps: ExportOptions['phaseMaps'];
  onProgress: (fraction: number, stage: string) => void;
}

const NAME = /^[\x20-\x7e]{1,120}$/;
/** each thread compiles the script and holds its own heap, so a mistyped count must not start thousands */
const MAX_THREADS = 64;

/** Fills defaults and refuses out-of-range values with one message listing every problem. */
export function resolveExportOptions(options: ExportOptions): ResolvedExportOptions {
  const resolved: ResolvedExportOptions = {
    designName: options.designName ?? 'design',
    designId: options.designId ?? null,
    revision: options.revision ?? null,
    revisionId: options.revisionId ?? null,
    timestamp: options.timestamp ?? new Date(),
    chordTolerance: options.chordTolerance ?? 0.005,
    databaseUnit: options.databaseUnit ?? 0.001,
    maxVertices: options.maxVertices ?? 4095,
    vertexBudget: options.vertexBudget ?? 20_000_000,
    timeBudgetMs: options.timeBudgetMs ?? 600_000,
    minimumFeature: options.minimumFeature ?? 1,
    font: options.font,
    compressOasis: options.compressOasis ?? false,
    matrix: options.matrix ?? null,
    layers: { ...defaultMaskOptions().layers, ...options.layers },
    phaseMaps: options.phaseMaps,
    threads: options.threads ?? Math.min(availableParallelism(), MAX_THREADS),
    onProgress: options.onProgress ?? (() => undefined),
  };
  const problems: string[] = [];
  if (!NAME.test(resolved.designName)) problems.push('the design name must be 1–120 printable ASCII characters');
  if (resolved.revision !== null && !(Number.isInteger(resolved.revision) && resolved.revision >= 0)) problems.push('the revision must be a whole number');
  if (Number.isNaN(resolved.timestamp.getTime())) problems.push('the timestamp is not a valid date');
  if (!(resolved.chordTolerance > 0)) problems.push('the chord tolerance must be a positive length');
  if (!(resolved.databaseUnit > 0 && resolved.databaseUnit <= 1)) problems.push('the database grid must be a length between 0 and 1 µm');
  if (!Number.isInteger(resolved.maxVertices) || resolved.maxVertices < 199 || resolved.maxVertices > 8190) {
    problems.push('the vertex limit per polygon must be a whole number from 199 to 8190 (GDSII holds at most 8191 points per boundary, the closing point included)');
  }
  if (!Number.isInteger(resolved.vertexBudget) || resolved.vertexBudget < 1) problems.push('the vertex budget must be a positive whole number');
  if (!(resolved.timeBudgetMs > 0)) problems.push('the time budget must be positive');
  if (!(resolved.minimumFeature > 0)) problems.push('the minimum feature must be a positive length');
  if (!Number.isInteger(resolved.threads) || resolved.threads < 1 || resolved.threads > MAX_THREADS) problems.push(`the thread count must be a whole number from 1 to ${MAX_THREADS}, got ${resolved.threads}`);
  if (!(resolved.font instanceof Uint8Array) || resolved.font.length === 0) problems.push('the label font is missing');
  if (resolved.matrix) {
    const { columns, rows } = resolved.matrix;
    if (columns.length < 1 || rows.length < 1 || columns.length * rows.length > 400) problems.push('an exposure matrix needs 1 or more columns and rows, at most 400 elements');
    for (const column of columns) {
      if (column.duty !== undefined && !(column.duty > 0 && column.duty < 1)) problems.push(`a matrix column's duty cycle must lie strictly between 0 and 1, got ${column.duty}`);
      if (column.bias !== undefined) {
        const steps = column.bias / 2 / resolved.databaseUnit;
        if (!Number.isFinite(column.bias)) problems.push(`a matrix column's size bias must be a finite length in µm, got ${column.bias}`);
        else if (Math.abs(steps - Math.round(steps)) > 1e-6) {
          problems.push(`a matrix column's size bias of ${column.bias} µm moves each edge by ${Number((column.bias / 2).toPrecision(12))} µm, not a whole number of database grid steps (${resolved.databaseUnit} µm); use a multiple of ${2 * resolved.databaseUnit} µm`);
        }
      }
    }
    for (const caption of [...rows, ...columns.map((c) => c.caption ?? '')]) {
      if (!/^[\x20-\x7e]{0,40}$/.test(caption)) problems.push(`matrix caption "${caption}" must be at most 40 printable ASCII characters`);
    }
  }
  if (problems.length > 0) throw new ExportError('options', `the export options are not usable:\n  ${problems.join('\n  ')}`);
  return resolved;
}
