/** Mask tones from the product's look. */
export const CHROME = '#2b2d42';
export const OPEN = '#e9e6dc';
export const PAPER = '#f7f7f2';
export const HAIRLINE = '#d9d6cc';
export const INK = '#14213d';
export const WARNING = '#d95f02';
/** Differences between revisions: added teal, removed amber (never red against green). */
export const ADDED = '#1b9e77';
export const REMOVED = '#d95f02';

/**
 * Hues for layers after the first, from the Okabe–Ito colour-blind-safe palette
 * (Okabe & Ito, "Color Universal Design", 2002), minus the yellow that vanishes on the open tone.
 */
export const EXTRA_LAYER_HUES = ['#0072b2', '#cc79a7', '#009e73', '#e69f00', '#56b4e9', '#d55e00'] as const;

export function layerColour(index: number): string {
  return index === 0 ? CHROME : EXTRA_LAYER_HUES[(index - 1) % EXTRA_LAYER_HUES.length];
}
