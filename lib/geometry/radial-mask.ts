import type { CompiledDesign } from '../design/types';
import { boundaryFunction, layerFunctionSpecs } from './boundary-function';
import type { MaskTileResult } from './build-tile';
import type { MaskOptions } from './options';
import { snapLoop } from './polygon-math';
import { scanSegment } from './scan-segment';

/** One drawn annulus inner ≤ r ≤ outer (µm) about the centre; inner = 0 is a disc. */
export interface DrawnBand {
  inner: number;
  outer: number;
  /** the band ends on the aperture's edge (inner or outer) */
  onApertureEdge: boolean;
}

/** Fewest chord segments on a full circle of radius r sagging at most `tolerance` (same rule as the aperture's inscribed polygon). */
export function chordCount(r: number, tolerance: number): number {
  return Math.ceil(Math.PI / Math.acos(Math.max(-1, 1 - tolerance / r)));
}

/**
 * The drawn bands along one radius: every sign change of g between the aperture's inner and outer
 * radius is found by scan-segment.ts (its sampling guarantee holds on the ray, for a combination down
 * to its floor beside zeros of u) and refined onto the zero of g, so each band edge is a radius of
 * the true level set.
 */
function drawnBands(g: (x: number, y: number) => number, design: CompiledDesign, phaseGap: number, innerRadius: number, outerRadius: number, tolerance: number): DrawnBand[] {
  const centre = design.symmetryCentre!;
  const field = design.pieces[0].field;
  const span = outerRadius - innerRadius;
  const found = scanSegment(g, field, phaseGap, centre.x + innerRadius, centre.y, centre.x + outerRadius, centre.y, tolerance);
  const edges = [innerRadius, ...found.t.map((t) => innerRadius + t * span), outerRadius];
  const bands: DrawnBand[] = [];
  for (let i = 0; i + 1 < edges.length; i++) {
    const a = edges[i];
    const b = edges[i + 1];
    // the state between two consecutive crossings is the sign of g in the middle
    if (!(b > a) || !(g(centre.x + 0.5 * (a + b), centre.y) > 0)) continue;
    const last = bands[bands.length - 1];
    if (last && last.outer === a) last.outer = b;
    else bands.push({ inner: a, outer: b, onApertureEdge: false });
  }
  for (const band of bands) band.onApertureEdge = band.outer === outerRadius || (innerRadius > 0 && band.inner === innerRadius);
  return bands;
}

/**
 * Cuts one band into `sectors` equal pieces (cuts along radii from angle 0, like the quadrant tiles
 * of the traced path) with `perSector` chords on each arc; a disc becomes pie slices, or one polygon
 * when it fits the vertex limit whole. Loops are counter-clockwise, in database units.
 */
function bandPolygons(cx: number, cy: number, band: DrawnBand, sectors: number, perSector: number, scale: number): Float64Array[] {
  const n = sectors * perSector;
  // Both arcs of a band share one table of directions; n is a multiple of 4, so one quadrant's
  // directions give the others by exact quarter turns (which also makes the pieces exactly symmetric).
  const cos = new Float64Array(n + 1);
  const sin = new Float64Array(n + 1);
  const quarter = n / 4;
  for (let i = 0; i <= quarter; i++) {
    const c = Math.cos((2 * Math.PI * i) / n);
    const s = Math.sin((2 * Math.PI * i) / n);
    for (let q = 0, cq = c, sq = s; q < 4; q++, [cq, sq] = [-sq, cq]) {
      cos[i + q * quarter] = cq;
      sin[i + q * quarter] = sq;
    }
  }
  const point = (r: number, i: number, out: Float64Array, at: number) => {
    out[at] = cx + r * cos[i];
    out[at + 1] = cy + r * sin[i];
  };
  const loops: Float64Array[] = [];
  if (band.inner === 0 && sectors === 1) {
    const loop = new Float64Array(2 * n);
    for (let i = 0; i < n; i++) point(band.outer, i, loop, 2 * i);
    loops.push(loop);
  } else {
    for (let s = 0; s < sectors; s++) {
      const first = s * perSector;
      const innerCount = band.inner === 0 ? 1 : perSector + 1;
      const loop = new Float64Array(2 * (perSector + 1 + innerCount));
      let k = 0;
      for (let i = 0; i <= perSector; i++, k += 2) point(band.outer, first + i, loop, k);
      if (band.inner === 0) {
        loop[k] = cx;
        loop[k + 1] = cy;
      } else {
        for (let i = perSector; i >= 0; i--, k += 2) point(band.inner, first + i, loop, k);
      }
      loops.push(loop);
    }
  }
  return loops.map((l) => snapLoop(l, scale)).filter((l): l is Float64Array => l !== null);
}

/** Sector count (1 for a whole disc, else a multiple of 4) and chords per sector arc (a multiple of 4 in all) keeping every piece within the vertex limit. */
function sectorLayout(band: DrawnBand, tolerance: number, maxVertices: number): { sectors: number; perSector: number } {
  // the outer arc sets the chord count; the inner arc reuses it, so its chords sag even less
  const chords = 4 * Math.ceil(Math.max(16, chordCount(band.outer, tolerance)) / 4);
  if (band.inner === 0 && chords <= maxVertices) return { sectors: 1, perSector: chords };
  for (let sectors = 4; ; sectors += 4) {
    const perSector = Math.ceil(chords / sectors);
    const vertices = band.inner === 0 ? perSector + 2 : 2 * (perSector + 1);
    if (vertices <= maxVertices) return { sectors, perSector };
  }
}

/**
 * The drawn bands of every mask layer (in mask order) of a rotationally symmetric design: one profile
 * symmetric about the centre of a disc or ring aperture. Null for any other design.
 */
export function radialBands(design: CompiledDesign, rootTolerance: number): DrawnBand[][] | null {
  const centre = design.symmetryCentre;
  const aperture = design.aperture;
  if (!centre || design.pieces.length !== 1 || design.pieces[0].region !== null) return null;
  if (aperture.kind !== 'circle' && aperture.kind !== 'ring') return null;
  if (aperture.cx !== centre.x || aperture.cy !== centre.y) return null;
  const innerRadius = aperture.kind === 'ring' ? aperture.rInner : 0;
  const outerRadius = aperture.kind === 'ring' ? aperture.rOuter : aperture.r;
  return layerFunctionSpecs(design.quantization).map((spec) =>
    drawnBands(boundaryFunction(design.pieces[0].field, spec).value, design, spec.phaseGap, innerRadius, outerRadius, rootTolerance),
  );
}

/**
 * The exact path for a rotationally symmetric design (radialBands): every zone boundary is a circle,
 * so its radius is found once along a ray and the polygons are written straight from it, vertices on
 * the circle and chords sagging at most the chord tolerance. The cost is the vertex count, with no
 * tracing and no clipping (the aperture edge is itself one of the circles). Null for any other
 * design, which goes to the tracer.
 */
export function radialMaskTiles(design: CompiledDesign, options: MaskOptions): MaskTileResult[] | null {
  const bandsPerLayer = radialBands(design, Math.min(1e-6, options.chordTolerance * 1e-3));
  if (!bandsPerLayer) return null;
  const centre = design.symmetryCentre!;
  const scale = 1e-6 / options.databaseUnit;
  // A band's pieces are at least its width less the sagitta and two grid steps wide, and their cuts
  // meet the arcs at right angles; only pie slices (a disc over the vertex limit) have sharp tips.
  const shortfall = options.chordTolerance + 2 * (options.databaseUnit / 1e-6);
  const layers: Float64Array[][] = [];
  const clipped: Float64Array[][] = [];
  const provenWide: Float64Array[][] = [];
  for (const bands of bandsPerLayer) {
    const drawn: Float64Array[] = [];
    const narrowOnEdge: Float64Array[] = [];
    const wide: Float64Array[] = [];
    for (const band of bands) {
      const { sectors, perSector } = sectorLayout(band, options.chordTolerance, options.maxVertices);
      const polygons = bandPolygons(centre.x, centre.y, band, sectors, perSector, scale);
      drawn.push(...polygons);
      const pieSlices = band.inner === 0 && sectors > 1;
      if (!pieSlices && (band.inner === 0 ? 2 * band.outer : band.outer - band.inner) - shortfall >= options.minimumFeature) wide.push(...polygons);
      else if (band.onApertureEdge) narrowOnEdge.push(...polygons);
    }
    layers.push(drawn);
    clipped.push(narrowOnEdge);
    provenWide.push(wide);
  }
  return [{ piece: 0, layers, clipped, provenWide, opened: layers.map(() => null) }];
}
