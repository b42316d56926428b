export { radialZones, zoneTableCsv, type ZoneRow } from './zone-table';
export { layerMeaning, type LayerMeaning } from './layer-meaning';
export { fabReadme } from './readme';
export { zipBundle, zipChunks, type BundleEntry } from './zip-bundle';
export { sha256Hex } from './sha256';
export type { BundleFile, BundleManifest, MatrixColumnManifest } from './manifest';
