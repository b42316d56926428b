import type { CompiledDesign } from '../design/types';
import { boundaryFunction, layerFunctionSpecs } from '../geometry/boundary-function';

export interface ZoneRow {
  /** 1 for a binary mask; k for mask k of a multi-level design */
  mask: number;
  /** 1-based, counted outwards */
  zone: number;
  /** µm */
  innerRadius: number;
  outerRadius: number;
}

/** Segments of the radius over which the local spatial-frequency bound is taken. */
const SEGMENTS = 512;
/** Bisection stops below this width, µm (far under any database grid). */
const RADIUS_RESOLUTION = 1e-7;

/**
 * The drawn rings of a rotationally symmetric design, found along the ray from the symmetry centre
 * towards +x: each mask's boundary function is sampled so that the phase moves by less than half the
 * smallest step between boundary levels per sample (from the field's spatial-frequency bound, which never
 * under-estimates), so no ring is missed, and each sign change is bisected. Null when the design is not
 * symmetric or its aperture is not a circle or ring about the centre.
 */
export function radialZones(design: CompiledDesign): ZoneRow[] | null {
  const centre = design.symmetryCentre;
  if (!centre || design.pieces.length !== 1 || design.pieces[0].region !== null) return null;
  const span = apertureSpan(design, centre);
  if (!span) return null;
  const field = design.pieces[0].field;
  const rows: ZoneRow[] = [];
  layerFunctionSpecs(design.quantization).forEach((spec, index) => {
    const g = boundaryFunction(field, spec);
    const at = (r: number) => g.value(centre.x + r, centre.y);
    let zone = 0;
    let inside = at(span.inner) > 0;
    let start = span.inner;
    const segment = (span.outer - span.inner) / SEGMENTS;
    for (let s = 0; s < SEGMENTS; s++) {
      const a = span.inner + s * segment;
      const b = a + segment;
      const frequency = field.maxSpatialFrequency(centre.x + a, centre.y, centre.x + b, centre.y);
      const step = frequency > 0 ? Math.min(segment, g.phaseGap / (2 * Math.PI * frequency) / 2) : segment;
      const samples = Math.ceil(segment / step);
      let previous = a;
      for (let i = 1; i <= samples; i++) {
        const r = i === samples ? b : a + i * (segment / samples);
        const now = at(r) > 0;
        if (now !== inside) {
          const edge = bisect(at, previous, r, inside);
          if (inside) rows.push({ mask: index + 1, zone: ++zone, innerRadius: start, outerRadius: edge });
          else start = edge;
          inside = now;
        }
        previous = r;
      }
    }
    if (inside) rows.push({ mask: index + 1, zone: ++zone, innerRadius: start, outerRadius: span.outer });
  });
  return rows;
}

function apertureSpan(design: CompiledDesign, centre: { x: number; y: number }): { inner: number; outer: number } | null {
  const a = design.aperture;
  if (a.kind === 'circle' && a.cx === centre.x && a.cy === centre.y) return { inner: 0, outer: a.r };
  if (a.kind === 'ring' && a.cx === centre.x && a.cy === centre.y) return { inner: a.rInner, outer: a.rOuter };
  return null;
}

/** The radius in (low, high] where the drawn state stops being `insideAtLow`. */
function bisect(at: (r: number) => number, low: number, high: number, insideAtLow: boolean): number {
  let a = low;
  let b = high;
  while (b - a > RADIUS_RESOLUTION) {
    const m = (a + b) / 2;
    if (at(m) > 0 === insideAtLow) a = m;
    else b = m;
  }
  return (a + b) / 2;
}

/** The zone table as CSV (µm, four decimals = 0.1 nm). */
export function zoneTableCsv(rows: readonly ZoneRow[]): string {
  const lines = ['mask,zone,inner_radius_um,outer_radius_um,width_um'];
  for (const row of rows) {
    lines.push([row.mask, row.zone, row.innerRadius.toFixed(4), row.outerRadius.toFixed(4), (row.outerRadius - row.innerRadius).toFixed(4)].join(','));
  }
  return `${lines.join('\n')}\n`;
}
