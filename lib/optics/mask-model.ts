import type { CompiledDesign, Region } from '../design/types';
import type { LayoutLibrary } from '../layout/types';
import { flattenLayer } from './flatten-layer';

/** One drawn layer of the mask and what it does to light where it is (or, inverted, where it is not) drawn. */
export interface MaskLayer {
  name: string;
  polygons: Float64Array[];
  /** negative tone: the layer's polygons are where the state is 0 */
  inverted: boolean;
  /** phase added at the design wavelength where the state is 1 (0 for a chrome layer) */
  phaseStep: number;
}

/**
 * The fabricated mask as the optics reads it: the drawn layers and the illuminated aperture.
 * Transmission where layer k is in state s_k: amplitude masks t = s_1; phase masks
 * t = exp(i·Σ s_k·phaseStep_k·λ0/λ) (steps scale with 1/λ; material dispersion is neglected).
 */
export interface MaskModel {
  modulation: 'amplitude' | 'phase' | 'multilevel';
  designWavelength: number;
  layers: MaskLayer[];
  /** the aperture as drawn on an 'aperture' layer, or null to use the design's aperture region */
  aperturePolygons: Float64Array[] | null;
  apertureRegion: Region;
}

export function readMaskModel(design: CompiledDesign, library: LayoutLibrary): MaskModel {
  const q = design.quantization;
  const aperturePolygons = library.layers
    .filter((info) => info.purpose === 'aperture')
    .flatMap((info) => flattenLayer(library, info.layer, info.datatype));
  const base = {
    designWavelength: design.wavelength,
    aperturePolygons: aperturePolygons.length > 0 ? aperturePolygons : null,
    apertureRegion: design.aperture,
  };
  if (q.kind === 'binary') {
    const zoneLayers = library.layers.filter((info) => info.purpose === 'zones');
    if (zoneLayers.length === 0) throw new Error('the layout has no layer with purpose "zones", so there is no mask to simulate');
    const polygons = zoneLayers.flatMap((info) => flattenLayer(library, info.layer, info.datatype));
    return {
      ...base,
      modulation: q.modulation,
      layers: [{ name: zoneLayers.map((info) => info.name).join('+'), polygons, inverted: q.tone === 'negative', phaseStep: q.modulation === 'phase' ? Math.PI : 0 }],
    };
  }
  const layers: MaskLayer[] = [];
  for (let k = 1; k <= q.bits; k++) {
    const infos = library.layers.filter((info) => info.purpose === 'level' && info.levelIndex === k);
    if (infos.length === 0) throw new Error(`the layout has no layer for level mask ${k} of ${q.bits}, so the multi-level mask cannot be simulated`);
    layers.push({
      name: infos.map((info) => info.name).join('+'),
      polygons: infos.flatMap((info) => flattenLayer(library, info.layer, info.datatype)),
      inverted: false,
      phaseStep: (2 * Math.PI) / 2 ** k,
    });
  }
  return { ...base, modulation: 'multilevel', layers };
}

/**
 * Complex transmission where exactly the layers in `drawn` (bit k set = layer k drawn) are drawn, at
 * wavelength λ, written to out[0], out[1].
 */
export function stateTransmission(mask: MaskModel, drawn: number, wavelength: number, out: Float64Array): void {
  let phase = 0;
  let amplitude = 1;
  mask.layers.forEach((layer, k) => {
    const on = ((drawn >> k) & 1) === 1 !== layer.inverted;
    if (mask.modulation === 'amplitude') amplitude = on ? 1 : 0;
    else if (on) phase += layer.phaseStep;
  });
  const scaled = (phase * mask.designWavelength) / wavelength;
  out[0] = amplitude * Math.cos(scaled);
  out[1] = amplitude * Math.sin(scaled);
}
