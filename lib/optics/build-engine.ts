import type { CompiledDesign } from '../design/types';
import type { OpticsEngine } from './engine';
import { createGridEngine } from './grid-engine';
import { planGrid } from './grid-plan';
import type { MaskModel } from './mask-model';
import { readRadialMask } from './radial-mask';
import { createRadialEngine } from './radial-engine';
import { polygonCoverage, regionCoverage, stateCoverage } from './raster-coverage';
import { polygonContains, regionContains } from '../design/region-contains';
import type { Box } from './region';
import type { Illumination, SimulationOptions } from './types';

export interface BuiltEngine {
  engine: OpticsEngine;
  /** where the illumination's axis meets the mask */
  axis: { x: number; y: number };
  /** largest distance from a point of the simulated aperture to (x, y), for zone counts */
  reach: (x: number, y: number) => number;
  warnings: string[];
}

/**
 * Picks the method: the radial integral for a design that declares a symmetry centre, has every focus on
 * that axis and an aperture of circles and rings about it; otherwise the 2-D angular spectrum on a
 * planned grid. Sampling is reported either way.
 */
export function buildEngine(design: CompiledDesign, mask: MaskModel, illumination: Illumination, options: SimulationOptions): BuiltEngine {
  const method = options.method ?? 'auto';
  const warnings: string[] = [];
  const pieceRegions = design.pieces.map((piece) => piece.region);
  const centre = design.symmetryCentre;
  const onAxis = centre !== null && design.foci.every((f) => Math.hypot(f.x - centre.x, f.y - centre.y) <= design.wavelength);
  if (method !== 'fft-2d' && centre && onAxis) {
    const radial = readRadialMask(mask, centre.x, centre.y);
    if (radial && radial.inner.length > 0) {
      const outer = radial.outer[radial.outer.length - 1];
      if (radial.agreeingRays < radial.rays) {
        warnings.push(`only ${radial.agreeingRays} of ${radial.rays} rays from the symmetry centre read the same zone sequence; the mask is not exactly symmetric (labels or fracturing inside the aperture?) and the majority reading was simulated`);
      }
      const region: Box = { x0: centre.x - outer, y0: centre.y - outer, x1: centre.x + outer, y1: centre.y + outer };
      const fmax = maxFrequency(design, region);
      const engine = createRadialEngine(mask, radial, centre, illumination, pieceRegions, {
        method: 'radial',
        note: `Exact radial (Rayleigh–Sommerfeld) integral over ${radial.inner.length} annular segments read off the polygons along ${radial.rays} rays from the symmetry centre; no 2-D grid, so no sampling limit on the zone width`,
        transitions: radial.inner.length,
        region_um: region,
        maxSpatialFrequency_per_um: fmax,
      });
      return { engine, axis: centre, reach: (x, y) => outer + Math.hypot(x - centre.x, y - centre.y), warnings };
    }
    if (method === 'radial') throw new Error('the radial method needs an aperture made of circles and rings about the symmetry centre');
  } else if (method === 'radial') {
    throw new Error('the radial method needs a design with a symmetry centre and every focus on its axis');
  }
  const plan = planGrid(design, mask, options.maxGrid ?? 2048);
  const states = stateCoverage(mask.layers.map((layer) => layer.polygons), plan.grid);
  const aperture = mask.aperturePolygons ? polygonCoverage(mask.aperturePolygons, plan.grid) : regionCoverage(mask.apertureRegion, plan.grid);
  if (plan.scaled) cropToBox(aperture, plan.grid, plan.region);
  const axis = { x: 0.5 * (plan.region.x0 + plan.region.x1), y: 0.5 * (plan.region.y0 + plan.region.y1) };
  if (plan.scaled) warnings.push(`the zones are too fine for the whole aperture on one grid: ${plan.note}; efficiencies are fractions of the light on that region and spots are wider than the full lens would give`);
  const engine = createGridEngine(mask, plan.grid, states, aperture, illumination, axis, pieceRegions, {
    method: plan.scaled ? 'scaled-region' : 'fft-2d',
    note: `Angular spectrum on a ${plan.grid.n}² grid of ${plan.grid.pitch.toPrecision(3)} µm pixels (${plan.note}), zero-padded to twice the simulated width, polygons rasterised with area coverage`,
    gridSize: plan.grid.n,
    pitch_um: plan.grid.pitch,
    region_um: plan.region,
    maxSpatialFrequency_per_um: plan.maxSpatialFrequency,
  });
  const inside = (x: number, y: number) =>
    x >= plan.region.x0 && x <= plan.region.x1 && y >= plan.region.y0 && y <= plan.region.y1 &&
    (mask.aperturePolygons ? mask.aperturePolygons.some((p) => polygonContains(p, x, y)) : regionContains(mask.apertureRegion, x, y));
  return { engine, axis, reach: (x, y) => farthestInside(plan.region, inside, x, y), warnings };
}

function maxFrequency(design: CompiledDesign, box: Box): number {
  return Math.max(...design.pieces.map((piece) => piece.field.maxSpatialFrequency(box.x0, box.y0, box.x1, box.y1)));
}

function cropToBox(coverage: Float32Array, grid: { x0: number; y0: number; pitch: number; n: number }, box: Box): void {
  for (let j = 0; j < grid.n; j++) {
    const y = grid.y0 + (j + 0.5) * grid.pitch;
    for (let i = 0; i < grid.n; i++) {
      const x = grid.x0 + (i + 0.5) * grid.pitch;
      if (x < box.x0 || x > box.x1 || y < box.y0 || y > box.y1) coverage[j * grid.n + i] = 0;
    }
  }
}

const REACH_SAMPLES = 129;

function farthestInside(box: Box, inside: (x: number, y: number) => boolean, x: number, y: number): number {
  let best = 0;
  for (let j = 0; j < REACH_SAMPLES; j++) {
    for (let i = 0; i < REACH_SAMPLES; i++) {
      const px = box.x0 + ((box.x1 - box.x0) * i) / (REACH_SAMPLES - 1);
      const py = box.y0 + ((box.y1 - box.y0) * j) / (REACH_SAMPLES - 1);
      if (inside(px, py)) best = Math.max(best, Math.hypot(px - x, py - y));
    }
  }
  return best;
}
