import type { CompiledDesign } from '../design/types';
import { layerFunctionSpecs, type LayerFunctionSpec } from './boundary-function';
import type { MaskTileResult } from './build-tile';
import { fracture } from './fracture';
import type { MaskOptions } from './options';
import { snapLoop } from './polygon-math';
import { chordCount } from './radial-mask';

/** Largest change of the phase along the ray between two base samples, so unwrapping it is safe. */
const RAY_PHASE_STEP = 1;
/** Deepest halving of a spiral step while its chord is checked against the curve. */
const MAX_DEPTH = 40;

/**
 * Where layer `spec` is drawn, as an interval of m·(φ − φ0) modulo 2π: the boundary function of
 * boundary-function.ts is sign·(cos(m·ψ − rotation) − threshold)·|v|, positive for m·ψ within
 * acos(threshold) of the rotation (or outside it, in negative tone).
 */
function drawnInterval(spec: LayerFunctionSpec): { from: number; to: number } {
  const half = Math.acos(spec.threshold);
  return spec.sign > 0 ? { from: spec.rotation - half, to: spec.rotation + half } : { from: spec.rotation + half, to: spec.rotation - half + 2 * Math.PI };
}

/**
 * The spiral path for a lens plus a vortex about one centre (CompiledDesign.spiral): the phase is
 * φ = F(r) + c·θ, so at each radius layer k is drawn on m·|c| equal arcs whose ends turn with −F(r)/c.
 * Every zone is an arm between two copies of one spiral curve, r·(cos(−F(r)/c), sin(−F(r)/c)) turned
 * by a constant angle, closed by an arc of the aperture. F is read along the ray θ = 0 from the
 * compiled field itself (arg u, unwrapped in steps of at most RAY_PHASE_STEP by its frequency bound),
 * and the curve is sampled by halving until each chord's midpoint lies within the chord tolerance of
 * the curve. No tracing, no clipping: the arms end on the aperture's circles. Null for other designs.
 */
export function spiralMaskTiles(design: CompiledDesign, options: MaskOptions): MaskTileResult[] | null {
  const spiral = design.spiral;
  const aperture = design.aperture;
  if (!spiral || design.pieces.length !== 1 || design.pieces[0].region !== null) return null;
  if (aperture.kind !== 'circle' && aperture.kind !== 'ring') return null;
  const inner = aperture.kind === 'ring' ? aperture.rInner : 0;
  const outer = aperture.kind === 'ring' ? aperture.rOuter : aperture.r;
  const field = design.pieces[0].field;
  const tolerance = options.chordTolerance;
  const value = new Float64Array(2);
  const rayPhase = (r: number): number => {
    field.field(spiral.x + r, spiral.y, value);
    return Math.atan2(value[1], value[0]);
  };
  const unwrapNear = (phase: number, near: number): number => phase + 2 * Math.PI * Math.round((near - phase) / (2 * Math.PI));

  // F on base samples of the ray, each step short enough that F changes by at most RAY_PHASE_STEP
  const radii: number[] = [inner];
  const phases: number[] = [rayPhase(Math.max(inner, tolerance * 1e-3))];
  for (let r = inner, step = tolerance; r < outer; ) {
    step = Math.min(2 * step, outer - r);
    for (let k = 0; k < 60; k++) {
      const frequency = field.maxSpatialFrequency(spiral.x + r, spiral.y, spiral.x + r + step, spiral.y);
      if (2 * Math.PI * frequency * step <= RAY_PHASE_STEP) break;
      step = Math.max(RAY_PHASE_STEP / (2 * Math.PI * frequency), tolerance * 1e-3);
    }
    r = Math.min(outer, r + step);
    radii.push(r);
    phases.push(unwrapNear(rayPhase(r), phases[phases.length - 1]));
  }

  // one spiral curve, angle −F(r)/c, refined for the chord tolerance
  const curveR: number[] = [radii[0]];
  const curveA: number[] = [-phases[0] / spiral.charge];
  const refine = (r0: number, f0: number, r1: number, f1: number, depth: number): void => {
    const rm = 0.5 * (r0 + r1);
    const fm = unwrapNear(rayPhase(rm), 0.5 * (f0 + f1));
    const a0 = -f0 / spiral.charge;
    const a1 = -f1 / spiral.charge;
    const am = -fm / spiral.charge;
    const x0 = r0 * Math.cos(a0);
    const y0 = r0 * Math.sin(a0);
    const x1 = r1 * Math.cos(a1);
    const y1 = r1 * Math.sin(a1);
    const xm = rm * Math.cos(am);
    const ym = rm * Math.sin(am);
    const chord = Math.hypot(x1 - x0, y1 - y0);
    const off = chord > 0 ? Math.abs((x1 - x0) * (ym - y0) - (y1 - y0) * (xm - x0)) / chord : Math.hypot(xm - x0, ym - y0);
    if (depth < MAX_DEPTH && (off > tolerance || Math.abs(am - a0) > 0.25 || Math.abs(a1 - am) > 0.25)) {
      refine(r0, f0, rm, fm, depth + 1);
      refine(rm, fm, r1, f1, depth + 1);
      return;
    }
    curveR.push(r1);
    curveA.push(a1);
  };
  for (let i = 0; i + 1 < radii.length; i++) refine(radii[i], phases[i], radii[i + 1], phases[i + 1], 0);

  const scale = 1e-6 / options.databaseUnit;
  const { x: cx, y: cy, charge } = spiral;
  const arcStep = (2 * Math.PI) / chordCount(outer, tolerance);
  const innerArcStep = inner > 0 ? (2 * Math.PI) / chordCount(inner, tolerance) : 0;
  const layers = layerFunctionSpecs(design.quantization).map((spec) => {
    const { from, to } = drawnInterval(spec);
    const m = spec.power;
    const arms = m * Math.abs(charge);
    const loops: Float64Array[] = [];
    for (let n = 0; n < arms; n++) {
      // θ on the arm's two edges, less the curve's own angle: m·(F + c·θ − φ0) = from or to (+ 2πn)
      let low = ((from + 2 * Math.PI * n) / m + spec.phaseOffset) / charge;
      let high = ((to + 2 * Math.PI * n) / m + spec.phaseOffset) / charge;
      if (charge < 0) [low, high] = [high, low];
      const points: number[] = [];
      const at = (r: number, angle: number) => points.push((cx + r * Math.cos(angle)) * scale, (cy + r * Math.sin(angle)) * scale);
      for (let i = 0; i < curveR.length; i++) at(curveR[i], curveA[i] + low);
      const last = curveR.length - 1;
      const arc = (r: number, a0: number, a1: number, step: number) => {
        const count = Math.max(1, Math.ceil(Math.abs(a1 - a0) / step));
        for (let j = 1; j < count; j++) at(r, a0 + ((a1 - a0) * j) / count);
      };
      arc(outer, curveA[last] + low, curveA[last] + high, arcStep);
      for (let i = last; i >= 0; i--) {
        if (i === 0 && inner === 0) break; // the arms meet at the centre, already the first point
        at(curveR[i], curveA[i] + high);
      }
      if (inner > 0) arc(inner, curveA[0] + high, curveA[0] + low, innerArcStep);
      const loop = snapLoop(Float64Array.from(points), 1);
      if (loop) loops.push(loop);
    }
    return fracture(loops, options.maxVertices, options.minSliverWidth * scale);
  });
  return [{ piece: 0, layers, clipped: layers.map(() => []), provenWide: layers.map(() => []), opened: layers.map(() => null) }];
}
