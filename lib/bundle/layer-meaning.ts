import type { Quantization } from '../design/types';
import type { LayerInfo } from '../layout/types';

export interface LayerMeaning {
  meaning: string;
  /** what a drawn polygon means on the plate */
  tone: string;
}

/**
 * The meaning and polarity of each layer in words for fab staff, from the quantization rule of the
 * shared design contract (binary: state 1 where cos(φ − φ0) > cos(π·duty); multi-level: mask k is bit
 * (bits − k) of the level and carries a step of 2π/2^k).
 */
export function layerMeaning(layer: LayerInfo, quantization: Quantization, wavelength: number): LayerMeaning {
  switch (layer.purpose) {
    case 'zones': {
      if (quantization.kind !== 'binary') return { meaning: 'zones', tone: 'drawn = zone' };
      const drawn = quantization.tone === 'positive' ? 'state 1' : 'state 0';
      if (quantization.modulation === 'amplitude') {
        const open = quantization.tone === 'positive';
        return {
          meaning: `binary amplitude zones, duty ${quantization.duty}`,
          tone: `${quantization.tone}: drawn polygons are the ${drawn} regions, ${open ? 'open (chrome removed, light passes)' : 'chrome (opaque)'}`,
        };
      }
      const depth = wavelength / (2 * (quantization.refractiveIndex - 1));
      return {
        meaning: `binary phase zones, duty ${quantization.duty}, step π = ${formatLength(depth)} at n = ${quantization.refractiveIndex}`,
        tone: `${quantization.tone}: drawn polygons are the ${drawn} regions${quantization.tone === 'positive' ? ', retarded by π relative to the rest' : ', the rest is retarded by π'}`,
      };
    }
    case 'level': {
      if (quantization.kind !== 'multilevel' || !layer.levelIndex) return { meaning: 'phase level mask', tone: 'drawn = step' };
      const k = layer.levelIndex;
      const depth = wavelength / (2 ** k * (quantization.refractiveIndex - 1));
      return {
        meaning: `mask ${k} of ${quantization.bits} of a ${2 ** quantization.bits}-level phase profile: step 2π/${2 ** k} = ${formatLength(depth)} at n = ${quantization.refractiveIndex}`,
        tone: `drawn polygons receive the step (bit ${quantization.bits - k} of the level is set)`,
      };
    }
    case 'label':
      return { meaning: 'text labels (design, revision, exposure parameters)', tone: 'drawn = written like the zones of the same plate' };
    case 'aperture':
      return { meaning: 'aperture outline (reference only)', tone: 'drawn = inside the aperture' };
    case 'marker':
      return { meaning: 'marker', tone: 'drawn = marker' };
  }
}

function formatLength(micrometres: number): string {
  return micrometres < 1 ? `${(micrometres * 1000).toFixed(1)} nm` : `${micrometres.toFixed(4)} µm`;
}
