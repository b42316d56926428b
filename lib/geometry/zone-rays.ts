import type { CompiledDesign, PhaseField, Region } from '../design/types';
import { boundaryFunction, layerFunctionSpecs } from './boundary-function';
import type { MeasuredWidth } from './report-types';
import { regionSignedDistance } from './region';
import { scanSegment, type SampledField } from './scan-segment';

export interface RayMeasurement {
  zoneCount: number;
  outermostZone: MeasuredWidth | null;
  narrowestZone: MeasuredWidth | null;
  smallestGap: MeasuredWidth | null;
}

const RAY_COUNT = 16;
/** Rays start 0.1 rad above +x, off the axes and sector edges that scripts usually put there. */
const RAY_OFFSET = 0.1;

interface Crossing {
  s: number;
  /** |cos| of the angle between the ray and the boundary normal: converts ray length to width */
  cosine: number;
  /** where one piece of a multiplexed design meets another: not a zone edge */
  cut: boolean;
}

/**
 * Where the ray from (x, y) along (dx, dy) first enters the region (stepping by the distance bound)
 * and where it leaves it again (bisection on the signed distance); null when it never enters.
 */
function insideSpan(region: Region, x: number, y: number, dx: number, dy: number, reach: number): [number, number] | null {
  let start = 0;
  for (let d = regionSignedDistance(region, x, y); d <= 0; d = regionSignedDistance(region, x + start * dx, y + start * dy)) {
    start += Math.max(-d, 1e-3);
    if (start > reach) return null;
  }
  let lo = start;
  let hi = reach;
  for (let i = 0; i < 60; i++) {
    const mid = 0.5 * (lo + hi);
    if (regionSignedDistance(region, x + mid * dx, y + mid * dy) > 0) lo = mid;
    else hi = mid;
  }
  return [start, lo];
}

/**
 * The pieces seen as one field for the ray scan: each point takes its piece's field, and the bounds
 * are the largest of the pieces'. When some piece is a combination, single-wave pieces give
 * exp(iφ) (unit modulus, |∇| bounded by their frequency bound), so one |u|-scaled step rule holds
 * for all. Piece cuts are discontinuities either way and are flagged where they are crossed.
 */
function piecewiseField(pieces: { field: PhaseField }[], pieceAt: (x: number, y: number) => { field: PhaseField } | undefined): SampledField {
  const maxSpatialFrequency = (x0: number, y0: number, x1: number, y1: number) => Math.max(...pieces.map((p) => p.field.maxSpatialFrequency(x0, y0, x1, y1)));
  if (pieces.every((p) => !p.field.maxFieldGradient)) return { field: (x, y, out) => (pieceAt(x, y) ?? pieces[0]).field.field(x, y, out), maxSpatialFrequency };
  return {
    field(x, y, out) {
      const { field } = pieceAt(x, y) ?? pieces[0];
      if (field.maxFieldGradient) return field.field(x, y, out);
      const phase = field.phase(x, y);
      out[0] = Math.cos(phase);
      out[1] = Math.sin(phase);
    },
    maxSpatialFrequency,
    maxFieldGradient: (x0, y0, x1, y1) => Math.max(...pieces.map((p) => p.field.maxFieldGradient?.(x0, y0, x1, y1) ?? p.field.maxSpatialFrequency(x0, y0, x1, y1))),
  };
}

/**
 * Zone widths measured along rays from the design's centre. On each ray the drawn state is sampled at
 * the safe step of scan-segment.ts, every change is refined onto the boundary, and a ray length is
 * turned into a width across the zone with the boundary normals at both ends.
 */
export function measureZonesAlongRays(design: CompiledDesign, centre: { x: number; y: number }, reach: number): RayMeasurement {
  const spec = layerFunctionSpecs(design.quantization)[0];
  const pieces = design.pieces.map((p) => ({ region: p.region, field: p.field, g: boundaryFunction(p.field, spec).value }));
  const pieceAt = (x: number, y: number) => pieces.find((p) => !p.region || regionSignedDistance(p.region, x, y) > 0);
  const sampled = piecewiseField(pieces, pieceAt);
  const result: RayMeasurement = { zoneCount: 0, outermostZone: null, narrowestZone: null, smallestGap: null };
  const delta = 1e-4;
  for (let r = 0; r < RAY_COUNT; r++) {
    const angle = RAY_OFFSET + (2 * Math.PI * r) / RAY_COUNT;
    const dx = Math.cos(angle);
    const dy = Math.sin(angle);
    const span = insideSpan(design.aperture, centre.x, centre.y, dx, dy, reach);
    if (!span) continue;
    const [begin, end] = span;
    const gOnPlane = (x: number, y: number) => {
      const p = pieceAt(x, y);
      return p ? p.g(x, y) : -1;
    };
    const startsDrawn = gOnPlane(centre.x + begin * dx, centre.y + begin * dy) > 0;
    const found = scanSegment(gOnPlane, sampled, spec.phaseGap, centre.x + begin * dx, centre.y + begin * dy, centre.x + end * dx, centre.y + end * dy, 1e-5);
    const crossings: Crossing[] = found.t.map((t) => {
      const sc = begin + t * (end - begin);
      const x = centre.x + sc * dx;
      const y = centre.y + sc * dy;
      const p = pieceAt(x, y) ?? pieces[0];
      const gv = p.g(x, y);
      const gx = (p.g(x + delta, y) - gv) / delta;
      const gy = (p.g(x, y + delta) - gv) / delta;
      const norm = Math.sqrt(gx * gx + gy * gy);
      const cut = pieceAt(x - 1e-3 * dx, y - 1e-3 * dy) !== pieceAt(x + 1e-3 * dx, y + 1e-3 * dy);
      return { s: sc, cosine: norm > 0 ? Math.abs(gx * dx + gy * dy) / norm : 1, cut };
    });
    // Intervals between consecutive crossings are whole zones (drawn) or gaps (undrawn).
    let drawn = startsDrawn;
    const zones: MeasuredWidth[] = [];
    if (startsDrawn) result.zoneCount += r === 0 ? 1 : 0;
    for (let i = 0; i + 1 < crossings.length; i++) {
      drawn = !drawn;
      const a = crossings[i];
      const b = crossings[i + 1];
      const mid = 0.5 * (a.s + b.s);
      const w: MeasuredWidth = {
        width_um: (b.s - a.s) * 0.5 * (a.cosine + b.cosine),
        x_um: centre.x + mid * dx,
        y_um: centre.y + mid * dy,
      };
      if (a.cut || b.cut) continue;
      if (drawn) {
        zones.push(w);
        if (!result.narrowestZone || w.width_um < result.narrowestZone.width_um) result.narrowestZone = w;
      } else if ((!result.smallestGap || w.width_um < result.smallestGap.width_um)) result.smallestGap = w;
    }
    if (r === 0) {
      // a zone starts at every other crossing (a zone cut by the aperture edge counts too)
      result.zoneCount += startsDrawn ? Math.floor(crossings.length / 2) : Math.ceil(crossings.length / 2);
      result.outermostZone = zones.length > 0 ? zones[zones.length - 1] : null;
    }
  }
  return result;
}
