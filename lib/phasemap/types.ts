/**
 * A sampled phase map: `columns` × `rows` samples in row-major order, radians.
 * Sample (i, j) sits at (originX + i·pitchX, originY + j·pitchY) in µm on the mask.
 */
export interface PhaseMap {
  columns: number;
  rows: number;
  pitchX: number;
  pitchY: number;
  originX: number;
  originY: number;
  values: Float64Array;
}
