import type { Bounds } from './flatten';

/** What the canvas shows: the mask-plane point at the canvas centre and the zoom in pixels per µm. */
export interface Viewport {
  cx: number;
  cy: number;
  pxPerUm: number;
}

/** The zoom range a view keeps to, in px/µm. */
export interface ZoomLimits {
  min: number;
  max: number;
}

export function clampZoom(pxPerUm: number, limits: ZoomLimits): number {
  return Math.min(limits.max, Math.max(limits.min, pxPerUm));
}

/** Screen pixels (y down, origin top-left) from mask-plane µm (y up). */
export function toScreen(v: Viewport, width: number, height: number, x: number, y: number): [number, number] {
  return [width / 2 + (x - v.cx) * v.pxPerUm, height / 2 - (y - v.cy) * v.pxPerUm];
}

/** Mask-plane µm from screen pixels. */
export function toMask(v: Viewport, width: number, height: number, sx: number, sy: number): [number, number] {
  return [v.cx + (sx - width / 2) / v.pxPerUm, v.cy - (sy - height / 2) / v.pxPerUm];
}

/** The whole of `bounds` with a margin of `marginPx` on every side. */
export function fitBounds(bounds: Bounds, width: number, height: number, marginPx = 24): Viewport {
  const w = Math.max(bounds.x1 - bounds.x0, 1e-6);
  const h = Math.max(bounds.y1 - bounds.y0, 1e-6);
  const pxPerUm = Math.max(1e-9, Math.min((width - 2 * marginPx) / w, (height - 2 * marginPx) / h));
  return { cx: (bounds.x0 + bounds.x1) / 2, cy: (bounds.y0 + bounds.y1) / 2, pxPerUm };
}

/** Zooms by `factor` keeping the mask point under the screen point (sx, sy) fixed. */
export function zoomAt(
  v: Viewport,
  width: number,
  height: number,
  sx: number,
  sy: number,
  factor: number,
  limits: ZoomLimits,
): Viewport {
  const pxPerUm = clampZoom(v.pxPerUm * factor, limits);
  const [mx, my] = toMask(v, width, height, sx, sy);
  return {
    pxPerUm,
    cx: mx - (sx - width / 2) / pxPerUm,
    cy: my + (sy - height / 2) / pxPerUm,
  };
}

/** The view after dragging the picture by (dx, dy) screen pixels: the grabbed mask point follows the pointer. */
export function panBy(v: Viewport, dx: number, dy: number): Viewport {
  return { ...v, cx: v.cx - dx / v.pxPerUm, cy: v.cy + dy / v.pxPerUm };
}

/** How far a view may zoom (px/µm): out to half the fit, in to `maxPxPerUm` but never less than the fit. */
export function zoomLimits(fitPxPerUm: number, maxPxPerUm = fitPxPerUm * 1e5): ZoomLimits {
  return { min: fitPxPerUm / 2, max: Math.max(fitPxPerUm, maxPxPerUm) };
}

export const ZOOM_STEP = 1.5;
/** How far one arrow key moves the picture, in screen pixels. */
export const KEY_PAN_PX = 60;

/**
 * What a key does to the view: + (or =) and − zoom about the centre, arrows move the view by
 * KEY_PAN_PX, 0 asks for the fitted view; null for every other key.
 */
export function viewForKey(v: Viewport, key: string, width: number, height: number, limits: ZoomLimits): Viewport | 'fit' | null {
  switch (key) {
    case '+':
    case '=':
      return zoomAt(v, width, height, width / 2, height / 2, ZOOM_STEP, limits);
    case '-':
      return zoomAt(v, width, height, width / 2, height / 2, 1 / ZOOM_STEP, limits);
    // An arrow shows more of the mask on its side, so the picture moves the other way.
    case 'ArrowLeft':
      return panBy(v, KEY_PAN_PX, 0);
    case 'ArrowRight':
      return panBy(v, -KEY_PAN_PX, 0);
    case 'ArrowUp':
      return panBy(v, 0, KEY_PAN_PX);
    case 'ArrowDown':
      return panBy(v, 0, -KEY_PAN_PX);
    case '0':
      return 'fit';
    default:
      return null;
  }
}

/**
 * The canvas transform [a, b, c, d, e, f] (as `setTransform` takes it) that draws mask-plane µm (y up)
 * into a backing store of `dpr` device pixels per screen pixel: device = dpr · toScreen(x, y).
 */
export function worldToCanvas(v: Viewport, width: number, height: number, dpr: number): [number, number, number, number, number, number] {
  const s = v.pxPerUm;
  return [dpr * s, 0, 0, -dpr * s, dpr * (width / 2 - s * v.cx), dpr * (height / 2 + s * v.cy)];
}

/** The mask-plane box visible on screen. */
export function visibleBounds(v: Viewport, width: number, height: number): Bounds {
  const hw = width / 2 / v.pxPerUm;
  const hh = height / 2 / v.pxPerUm;
  return { x0: v.cx - hw, y0: v.cy - hh, x1: v.cx + hw, y1: v.cy + hh };
}

/** A scale-bar length of 1, 2 or 5 × 10^n µm whose drawn length is at most `maxPx`. */
export function scaleBar(pxPerUm: number, maxPx = 120): { lengthUm: number; lengthPx: number; label: string } {
  const raw = maxPx / pxPerUm;
  const decade = Math.pow(10, Math.floor(Math.log10(raw)));
  const step = [5, 2, 1].find((s) => s * decade <= raw) ?? 1;
  const lengthUm = step * decade;
  return { lengthUm, lengthPx: lengthUm * pxPerUm, label: formatLength(lengthUm) };
}

/** A length in µm written with the unit that keeps the number between 1 and 1000. */
export function formatLength(um: number): string {
  const abs = Math.abs(um);
  if (abs >= 1000) return `${trim(um / 1000)} mm`;
  if (abs > 0 && abs < 1) return `${trim(um * 1000)} nm`;
  return `${trim(um)} µm`;
}

function trim(n: number): string {
  return String(Number(n.toPrecision(4)));
}
