import type { CompiledDesign, Region } from '../design/types';
import { boundaryFunction, layerFunctionSpecs } from './boundary-function';
import { regionPaths, clipLoops } from './clip-region';
import { makeDomain } from './domain';
import { GeometryError } from './errors';
import { fracture } from './fracture';
import { narrowCandidates } from './narrow-candidates';
import { pieceLosses } from './narrow-features';
import { seedSpacingFor, type MaskOptions } from './options';
import { loopBounds, signedArea, snapLoop, type Bounds } from './polygon-math';
import { regionSignedDistance } from './region';
import type { MaskTilePlan } from './tiles';
import { traceTile } from './trace-tile';

/** Polygons (integer database units) of one tile, per drawn mask layer in mask order. */
export interface MaskTileResult {
  piece: number;
  layers: Float64Array[][];
  /** polygons that were clipped by the aperture or a piece's region (candidates for narrow features) */
  clipped: Float64Array[][];
  /** polygons whose width the tile measured exactly and found no narrower than the minimum feature (no opening needed) */
  provenWide: Float64Array[][];
  /**
   * Per layer, null when the tile left the narrow-feature test to the assembly; else the tile decided
   * every piece: the candidates it opened, with what the opening takes from each (pieceLosses), and
   * any piece not listed is cleared. Opening is the report's dearest step, so it runs on the tile's thread.
   */
  opened: (Map<Float64Array, Float64Array[][]> | null)[];
}

export function clipRegionOf(design: CompiledDesign, piece: number): Region {
  const region = design.pieces[piece].region;
  return region ? { kind: 'intersection', parts: [design.aperture, region] } : design.aperture;
}

/** Every vertex deeper than half the longest edge (plus a grid step) proves the loop is inside. */
function insideRegion(region: Region, loop: Float64Array, gridUm: number): boolean {
  const n = loop.length / 2;
  let longest = 0;
  for (let i = 0, j = n - 1; i < n; j = i++) longest = Math.max(longest, Math.hypot(loop[2 * i] - loop[2 * j], loop[2 * i + 1] - loop[2 * j + 1]));
  const margin = 0.5 * longest * gridUm + gridUm;
  for (let i = 0; i < loop.length; i += 2) {
    if (regionSignedDistance(region, loop[i] * gridUm, loop[i + 1] * gridUm) <= margin) return false;
  }
  return true;
}

const within = (outer: Bounds, inner: Bounds) => outer.x0 <= inner.x0 && outer.y0 <= inner.y0 && outer.x1 >= inner.x1 && outer.y1 >= inner.y1;

/**
 * The loops that must go through the clipper: those reaching outside, and with them every hole that
 * may belong to a clipped outline and every outline that may own a clipped hole (by bounding box,
 * repeated until nothing changes), so no polygon is clipped without all its loops.
 */
function loopsToClip(loops: Float64Array[], crossesOutside: (l: Float64Array) => boolean): boolean[] {
  const send = loops.map(crossesOutside);
  const bounds = loops.map(loopBounds);
  const isHole = loops.map((l) => signedArea(l) < 0);
  for (let changed = send.some(Boolean); changed; ) {
    changed = false;
    for (let i = 0; i < loops.length; i++) {
      if (send[i]) continue;
      const related = loops.some((_, j) => send[j] && isHole[j] !== isHole[i] && (isHole[i] ? within(bounds[j], bounds[i]) : within(bounds[i], bounds[j])));
      if (related) {
        send[i] = true;
        changed = true;
      }
    }
  }
  return send;
}

/**
 * Said after a tracing error in a combined field. Where waves of nearly equal weight meet out of
 * phase, |u| nearly vanishes along lines and arg u swings by almost π across a band nanometres
 * wide, so the zone edges of any level other than arg u = ±π/2 crowd together there (measured on
 * two off-axis lenses: binary duty 0.3 and four levels failed at weights 0.5/0.48, worked at 0.5/0.45).
 */
const CANCELLING_WAVES_HINT =
  'This profile combines waves: such a failure comes where they nearly cancel (weights close to each other), and zone edges crowd within nanometres there. Make the weights differ by 10 % or more, or quantize with binary(duty: 0.5), whose edges there are drawn.';

/** traceTile, with the hint above added to its errors when the field is a combination. */
function traceWithHint(...args: Parameters<typeof traceTile>): ReturnType<typeof traceTile> {
  try {
    return traceTile(...args);
  } catch (error) {
    if (error instanceof GeometryError && args[1].maxFieldGradient) throw new GeometryError(`${error.message} ${CANCELLING_WAVES_HINT}`);
    throw error;
  }
}

/**
 * A pure function of (design, options, plan), so tiles can run on separate workers: trace the zone
 * boundaries in the tile, snap to the grid, clip only the loops that reach outside the aperture (or
 * the piece's region), and fracture.
 */
export function buildMaskTile(design: CompiledDesign, options: MaskOptions, plan: MaskTilePlan): MaskTileResult {
  const scale = 1e-6 / options.databaseUnit;
  const gridUm = 1 / scale;
  const piece = design.pieces[plan.piece];
  const region = clipRegionOf(design, plan.piece);
  const domain = makeDomain(Float64Array.from(plan.domain));
  let clipPaths: ReturnType<typeof regionPaths> | null = null;
  const layers: Float64Array[][] = [];
  const clipped: Float64Array[][] = [];
  const opened: Map<Float64Array, Float64Array[][]>[] = [];
  const seedSpacing = seedSpacingFor(options, piece.field);
  for (const spec of layerFunctionSpecs(design.quantization)) {
    const g = boundaryFunction(piece.field, spec).value;
    const traced = traceWithHint(g, piece.field, spec, domain, {
      chordTolerance: options.chordTolerance,
      grid: gridUm,
      seedSpacing,
      anchorX: plan.anchorX + 0.5 * seedSpacing,
      anchorY: plan.anchorY + 0.5 * seedSpacing,
    });
    const snapped: Float64Array[] = [];
    for (const loop of traced) {
      const s = snapLoop(loop, scale);
      if (s) snapped.push(s);
    }
    if (plan.exact) {
      // Traced inside the clip region itself: loops that reach its edge are the ones it cuts.
      const fractured = fracture(snapped, options.maxVertices, options.minSliverWidth * scale);
      layers.push(fractured);
      clipped.push(fractured.filter((l) => !insideRegion(region, l, gridUm)));
      opened.push(openCandidates(design, options, spec.phaseGap, fractured, clipped[clipped.length - 1]));
      continue;
    }
    const toClip = loopsToClip(snapped, (l) => !insideRegion(region, l, gridUm));
    const kept = snapped.filter((_, i) => !toClip[i]);
    let clippedLoops: Float64Array[] = [];
    if (toClip.some(Boolean)) {
      clipPaths ??= regionPaths(region, scale, options.chordTolerance);
      clippedLoops = fracture(clipLoops(snapped.filter((_, i) => toClip[i]), clipPaths), options.maxVertices, options.minSliverWidth * scale);
    }
    layers.push(fracture(kept, options.maxVertices, options.minSliverWidth * scale).concat(clippedLoops));
    clipped.push(clippedLoops);
    opened.push(openCandidates(design, options, spec.phaseGap, layers[layers.length - 1], clippedLoops));
  }
  return { piece: plan.piece, layers, clipped, provenWide: layers.map(() => []), opened };
}

/** The pieces the narrow-feature test cannot clear, each opened alone (see MaskTileResult.opened). */
function openCandidates(design: CompiledDesign, options: MaskOptions, phaseGap: number, pieces: Float64Array[], clipped: Float64Array[]): Map<Float64Array, Float64Array[][]> {
  const scale = 1e-6 / options.databaseUnit;
  const out = new Map<Float64Array, Float64Array[][]>();
  for (const p of narrowCandidates(design, options, phaseGap, pieces, new Set(clipped))) out.set(p, pieceLosses(p, options.minimumFeature * scale, options.chordTolerance * scale));
  return out;
}
