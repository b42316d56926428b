/** Mask geometry: from a compiled design to clean, clipped, fractured polygons on the database grid. */
export { buildMask, assembleMask, exactMaskTiles, maskLayers, validateDesign, type MaskResult } from './build-mask';
export { buildMaskTile, type MaskTileResult } from './build-tile';
export { planMaskTiles, type MaskTilePlan } from './tiles';
export { radialMaskTiles } from './radial-mask';
export { defaultMaskOptions, resolveMaskOptions, MaskOptionsError, type MaskOptions, type MaskLayerOptions, type LayerDatatype } from './options';
export type { ManufacturabilityReport, MeasuredWidth, FocusAperture, LayerSummary, NarrowFeature, ReportWarning } from './report-types';
export { xorLayers, type LayerXor, type XorResult } from './xor';
export { GeometryError } from './errors';
export { QuantizationError } from './boundary-function';
export { RegionError } from './region';
