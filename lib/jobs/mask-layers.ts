import { defaultMaskOptions, type MaskLayerOptions } from '../geometry';
import type { LayerAssignment } from '../schemas/designs';

/**
 * The design's layer map as the geometry's layer options. Rows for zones, labels, the aperture
 * outline and each multi-level mask set where that purpose is drawn; 'marker' rows are notes for
 * the fab and draw nothing. Purposes the map leaves out keep the geometry's defaults.
 */
export function maskLayersFromLayerMap(layerMap: LayerAssignment[]): Partial<MaskLayerOptions> {
  const layers: Partial<MaskLayerOptions> = {};
  const levels = [...defaultMaskOptions().layers.levels];
  for (const row of layerMap) {
    const target = { layer: row.layer, datatype: row.datatype };
    if (row.purpose === 'zones') layers.zones = target;
    else if (row.purpose === 'label') layers.labels = target;
    else if (row.purpose === 'aperture') layers.apertureMarker = target;
    else if (row.purpose === 'level' && row.levelIndex !== undefined && row.levelIndex <= levels.length) {
      levels[row.levelIndex - 1] = target;
      layers.levels = levels;
    }
  }
  return layers;
}
