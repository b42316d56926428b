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
 * Complex transmission of a spot where layer k covers the fraction drawn[k] of it, at wavelength λ,
 * written to out[0], out[1]. Layers combine as independent factors, which is exact wherever at most
 * one layer edge crosses the spot (an area average of exp(iθ) otherwise needs the overlap).
 */
export function mixedTransmission(mask: MaskModel, drawn: ArrayLike<number>, wavelength: number, out: Float64Array): void {
  if (mask.modulation === 'amplitude') {
    const layer = mask.layers[0];
    out[0] = layer.inverted ? 1 - drawn[0] : drawn[0];
    out[1] = 0;
    return;
  }
  let re = 1;
  let im = 0;
  const scale = mask.designWavelength / wavelength;
  for (let k = 0; k < mask.layers.length; k++) {
    const layer = mask.layers[k];
    const s = layer.inverted ? 1 - drawn[k] : drawn[k];
    if (s === 0) continue;
    const theta = layer.phaseStep * scale;
    const fRe = 1 - s + s * Math.cos(theta);
    const fIm = s * Math.sin(theta);
    const nextRe = re * fRe - im * fIm;
    im = re * fIm + im * fRe;
    re = nextRe;
  }
  out[0] = re;
  out[1] = im;
}
