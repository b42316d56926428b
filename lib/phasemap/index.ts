export type { PhaseMap } from './types';
export type { PhaseMapPlacement, PhaseMapResult } from './placement';
export type { CsvPhaseOptions } from './csv';
export type { PngPhaseOptions } from './png';
export { parsePhaseCsv } from './csv';
export { parsePhasePng } from './png';
export { PHASE_MAP_LIMITS } from './limits';
