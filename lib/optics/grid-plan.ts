import type { CompiledDesign } from '../design/types';
import type { MaskModel } from './mask-model';
import type { Grid } from './raster-coverage';
import { regionBox } from '../design/region-box';
import { polygonsBounds, type Box } from './region';

export interface GridPlan {
  grid: Grid;
  /** the part of the mask that is simulated */
  region: Box;
  scaled: boolean;
  maxSpatialFrequency: number;
  note: string;
}

/**
 * Chooses the 2-D grid. The pixel pitch must meet Nyquist on the finest zone, p ≤ 1/(2·f_max), f_max
 * the profile's highest local spatial frequency; we aim at 1/(4·f_max) (but no finer than λ/2, the
 * finest propagating period) and zero-pad the simulated region to twice its width, which also keeps the
 * angular-spectrum band limit above f_max at every distance. When even Nyquist does not fit in
 * maxGrid, only a central square of the mask is simulated and the plan says so.
 */
export function planGrid(design: CompiledDesign, mask: MaskModel, maxGrid: number): GridPlan {
  const aperture = mask.aperturePolygons ? polygonsBounds(mask.aperturePolygons) : regionBox(mask.apertureRegion);
  const fmax = (box: Box) => Math.max(...design.pieces.map((piece) => piece.field.maxSpatialFrequency(box.x0, box.y0, box.x1, box.y1)));
  const lambda = design.wavelength;
  const sideFor = (box: Box, pitch: number) => nextPowerOfTwo(Math.ceil((2 * Math.max(box.x1 - box.x0, box.y1 - box.y0)) / pitch));
  const plan = (box: Box, f: number, pitch: number, scaled: boolean, note: string): GridPlan => {
    const n = sideFor(box, pitch);
    const width = Math.max(box.x1 - box.x0, box.y1 - box.y0);
    const p = (2 * width) / n;
    const cx = 0.5 * (box.x0 + box.x1);
    const cy = 0.5 * (box.y0 + box.y1);
    return { grid: { n, pitch: p, x0: cx - (n * p) / 2, y0: cy - (n * p) / 2 }, region: box, scaled, maxSpatialFrequency: f, note };
  };
  const f = fmax(aperture);
  const nyquist = 1 / (2 * f);
  const preferred = Math.min(nyquist, Math.max(lambda / 2, 1 / (4 * f)));
  if (sideFor(aperture, preferred) <= maxGrid) return plan(aperture, f, preferred, false, 'pitch at a quarter of the finest zone period (or λ/2)');
  if (sideFor(aperture, nyquist) <= maxGrid) return plan(aperture, f, nyquist, false, 'pitch at Nyquist on the finest zone period');
  // largest central square whose own finest zone fits the grid at Nyquist
  const cx = 0.5 * (aperture.x0 + aperture.x1);
  const cy = 0.5 * (aperture.y0 + aperture.y1);
  let lo = 0;
  let hi = 0.5 * Math.max(aperture.x1 - aperture.x0, aperture.y1 - aperture.y0);
  const square = (h: number): Box => ({ x0: cx - h, y0: cy - h, x1: cx + h, y1: cy + h });
  for (let i = 0; i < 40; i++) {
    const h = 0.5 * (lo + hi);
    if (sideFor(square(h), 1 / (2 * fmax(square(h)))) <= maxGrid) lo = h;
    else hi = h;
  }
  if (lo === 0) throw new Error('the zones are too fine to sample even a small central region; use the radial method on a symmetric design');
  const box = square(lo);
  const fBox = fmax(box);
  return plan(box, fBox, 1 / (2 * fBox), true, `only the central ${(2 * lo).toFixed(1)} µm square of the aperture fits a ${maxGrid}² grid at Nyquist`);
}

function nextPowerOfTwo(v: number): number {
  let n = 16;
  while (n < v) n *= 2;
  return n;
}
