import type { PhaseMap } from './types';
import { PHASE_MAP_LIMITS } from './limits';

/** How a grid of samples is placed on the mask and scaled to radians. */
export interface PhaseMapPlacement {
  /** sample spacing along x in µm */
  pitchX: number;
  /** sample spacing along y in µm; defaults to pitchX */
  pitchY?: number;
  /** mask position of the lower-left sample in µm; by default the map is centred on (0, 0) */
  originX?: number;
  originY?: number;
}

export type PhaseMapResult = { ok: true; map: PhaseMap } | { ok: false; error: string };

/**
 * Builds a PhaseMap from rows as read from a file, top row first (as a picture is seen), so the
 * map appears upright on the mask: file row 0 becomes the highest y.
 */
export function placeGrid(columns: number, rows: number, valueAt: (column: number, fileRow: number) => number, placement: PhaseMapPlacement): PhaseMapResult {
  const pitchX = placement.pitchX;
  const pitchY = placement.pitchY ?? placement.pitchX;
  for (const [name, pitch] of [
    ['pitch along x', pitchX],
    ['pitch along y', pitchY],
  ] as const) {
    if (!(Number.isFinite(pitch) && pitch > 0)) return { ok: false, error: `the ${name} must be a positive number of µm` };
    if (pitch > PHASE_MAP_LIMITS.maxPitch) return { ok: false, error: `the ${name} is ${pitch} µm; at most ${PHASE_MAP_LIMITS.maxPitch} µm is allowed (is the unit right?)` };
  }
  if (columns < 2 || rows < 2) return { ok: false, error: `a phase map needs at least 2 × 2 samples, this one has ${columns} × ${rows}` };
  if (columns > PHASE_MAP_LIMITS.maxColumns || rows > PHASE_MAP_LIMITS.maxRows) {
    return { ok: false, error: `the map is ${columns} × ${rows} samples; at most ${PHASE_MAP_LIMITS.maxColumns} × ${PHASE_MAP_LIMITS.maxRows} are allowed` };
  }
  const originX = placement.originX ?? (-(columns - 1) * pitchX) / 2;
  const originY = placement.originY ?? (-(rows - 1) * pitchY) / 2;
  if (!Number.isFinite(originX) || !Number.isFinite(originY)) return { ok: false, error: 'the origin must be a finite position in µm' };
  const values = new Float64Array(columns * rows);
  for (let fileRow = 0; fileRow < rows; fileRow++) {
    const j = rows - 1 - fileRow;
    for (let i = 0; i < columns; i++) values[j * columns + i] = valueAt(i, fileRow);
  }
  return { ok: true, map: { columns, rows, pitchX, pitchY, originX, originY, values } };
}
