import type { LayerInfo } from '../layout/types';

/** Mask tones from the product's look: zones in chrome on open glass. */
export const CHROME = '#2b2d42';
export const OPEN = '#e9e6dc';
export const INK = '#14213d';

/**
 * Further layers take the Okabe–Ito colour-blind-safe palette (Okabe & Ito, "Color Universal Design", 2008),
 * leaving out its black and its yellow (too faint on the open tone).
 */
const COLOUR_BLIND_SAFE = ['#0072b2', '#e69f00', '#009e73', '#cc79a7', '#56b4e9', '#d55e00'];

export interface LayerStyle {
  fill: string;
  opacity: number;
}

/**
 * The first zone-bearing layer (zones, or level 1 of a multi-level mask) is drawn in chrome and opaque;
 * every other layer gets the next distinct hue, translucent so stacked levels stay readable.
 */
export function layerStyles(layers: readonly LayerInfo[]): Map<string, LayerStyle> {
  const styles = new Map<string, LayerStyle>();
  const primary = layers.find((l) => l.purpose === 'zones') ?? layers.find((l) => l.purpose === 'level');
  let next = 0;
  for (const layer of layers) {
    const key = layerKey(layer.layer, layer.datatype);
    if (layer === primary) styles.set(key, { fill: CHROME, opacity: 1 });
    else styles.set(key, { fill: COLOUR_BLIND_SAFE[next++ % COLOUR_BLIND_SAFE.length], opacity: layer.purpose === 'aperture' ? 0.25 : 0.7 });
  }
  return styles;
}

export function layerKey(layer: number, datatype: number): string {
  return `${layer}/${datatype}`;
}
