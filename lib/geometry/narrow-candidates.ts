import type { CompiledDesign } from '../design/types';
import type { MaskOptions } from './options';
import { loopBounds } from './polygon-math';

/**
 * Which polygons of one layer the opening test must look at. Inside one zone the phase runs through
 * at least phaseGap, at most 2π·F per µm: the zone is at least phaseGap/(2π·F) wide. Only cut
 * polygons and those this bound cannot clear are opened.
 */
export function narrowCandidates(design: CompiledDesign, options: MaskOptions, phaseGap: number, clipped: Set<Float64Array>): (polygon: Float64Array) => boolean {
  const gridUm = options.databaseUnit / 1e-6;
  return (p) => {
    if (clipped.has(p)) return true;
    const b = loopBounds(p);
    const frequency = Math.max(...design.pieces.map((piece) => piece.field.maxSpatialFrequency(b.x0 * gridUm, b.y0 * gridUm, b.x1 * gridUm, b.y1 * gridUm)));
    return !(phaseGap / (2 * Math.PI * frequency) >= options.minimumFeature);
  };
}
