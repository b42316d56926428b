import type { PhaseField } from '../design/types';
/** Options of the mask geometry engine. Lengths in µm unless the name says metres. */

export interface LayerDatatype {
  layer: number;
  datatype: number;
}

export interface MaskLayerOptions {
  /** binary designs: the zone layer */
  zones: LayerDatatype;
  /** multi-level designs: mask k (1-based) goes to levels[k − 1]; default k/0 */
  levels: LayerDatatype[];
  /** when set, the aperture outline is drawn on this layer as a marker */
  apertureMarker: LayerDatatype | null;
  /** text labels (drawn by the label writer) */
  labels: LayerDatatype;
}

export interface MaskOptions {
  /** size of one database unit in metres */
  databaseUnit: number;
  /** size of one user unit in metres */
  userUnit: number;
  /** largest distance (µm) a polygon edge may depart from the exact zone boundary, before grid snapping */
  chordTolerance: number;
  /** most points per polygon (GDSII boundary), 199..8191 */
  maxVertices: number;
  /** pieces narrower on average (2·area/perimeter, µm) than this are removed as slivers and listed in the report; 0 keeps all */
  minSliverWidth: number;
  /** process minimum feature (µm); narrower features are reported as warnings */
  minimumFeature: number;
  /**
   * spacing (µm) of the seed lines that find closed boundaries; see DEVELOPERS.md for the guarantee.
   * Null chooses per profile part (`seedSpacingFor`).
   */
  seedSpacing: number | null;
  layers: MaskLayerOptions;
  /** library and top-cell name */
  name: string;
}

export class MaskOptionsError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'MaskOptionsError';
  }
}

const MAX_MULTILEVEL_BITS = 8;

export function defaultMaskOptions(): MaskOptions {
  return {
    databaseUnit: 1e-9,
    userUnit: 1e-6,
    chordTolerance: 0.005,
    maxVertices: 4095,
    minSliverWidth: 0.05,
    minimumFeature: 1,
    seedSpacing: null,
    layers: {
      zones: { layer: 1, datatype: 0 },
      levels: Array.from({ length: MAX_MULTILEVEL_BITS }, (_, i) => ({ layer: i + 1, datatype: 0 })),
      apertureMarker: null,
      labels: { layer: 10, datatype: 0 },
    },
    name: 'ZONEWRIGHT',
  };
}

/**
 * Seed spacing when none is set: a single wave's closed boundaries surround its phase extremum, where
 * the tiles are cut, so 50 µm cells only cost time; a combination's small islands near pairs of field
 * zeros cross no seed line when they fit in one cell (two-focus-offaxis.zw loses a few at 50 µm and
 * none at 10 µm, for about a tenth more tracing time; see DEVELOPERS.md).
 */
export function seedSpacingFor(options: MaskOptions, field: PhaseField): number {
  return options.seedSpacing ?? (field.maxFieldGradient ? 10 : 50);
}

function requirePositive(value: number, what: string): void {
  if (!Number.isFinite(value) || value <= 0) throw new MaskOptionsError(`${what} must be a positive number, got ${value}.`);
}

function requireLayer(value: LayerDatatype, what: string): void {
  // GDSII stores layer and datatype as signed 16-bit integers.
  const ok = (n: number) => Number.isInteger(n) && n >= 0 && n <= 32767;
  if (!value || !ok(value.layer) || !ok(value.datatype)) {
    throw new MaskOptionsError(`${what} needs an integer layer and datatype between 0 and 32767.`);
  }
}

/** Fills defaults and rejects values the engine or the file formats cannot honour. */
export function resolveMaskOptions(partial: Partial<MaskOptions> = {}): MaskOptions {
  const defaults = defaultMaskOptions();
  const layers: MaskLayerOptions = { ...defaults.layers, ...(partial.layers ?? {}) };
  const options: MaskOptions = { ...defaults, ...partial, layers };
  requirePositive(options.databaseUnit, 'The database unit');
  requirePositive(options.userUnit, 'The user unit');
  if (options.userUnit < options.databaseUnit) throw new MaskOptionsError('The user unit must not be smaller than the database unit.');
  requirePositive(options.chordTolerance, 'The chord tolerance');
  const gridUm = options.databaseUnit / 1e-6;
  if (options.chordTolerance < gridUm / 10) {
    throw new MaskOptionsError(`The chord tolerance (${options.chordTolerance} µm) is finer than a tenth of the database grid (${gridUm} µm); use a finer grid or a larger tolerance.`);
  }
  if (!Number.isInteger(options.maxVertices) || options.maxVertices < 199 || options.maxVertices > 8191) {
    throw new MaskOptionsError(`The vertex limit per polygon must be a whole number from 199 to 8191, got ${options.maxVertices}.`);
  }
  if (!Number.isFinite(options.minSliverWidth) || options.minSliverWidth < 0) throw new MaskOptionsError('The sliver width must be zero or more.');
  requirePositive(options.minimumFeature, 'The minimum feature');
  if (options.seedSpacing !== null) requirePositive(options.seedSpacing, 'The seed spacing');
  requireLayer(layers.zones, 'The zone layer');
  requireLayer(layers.labels, 'The label layer');
  if (layers.apertureMarker) requireLayer(layers.apertureMarker, 'The aperture marker layer');
  layers.levels.forEach((l, i) => requireLayer(l, `Mask level ${i + 1}`));
  return options;
}
