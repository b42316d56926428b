import type { CompiledDesign } from '../design/types';
import { radialBands } from '../geometry/radial-mask';

export interface ZoneRow {
  /** 1 for a binary mask; k for mask k of a multi-level design */
  mask: number;
  /** 1-based, counted outwards */
  zone: number;
  /** µm */
  innerRadius: number;
  outerRadius: number;
}

/**
 * The drawn rings of a rotationally symmetric design, per mask, counted outwards: the same bands the
 * mask geometry writes (lib/geometry/radial-mask.ts), radii to 1e-7 µm. Null when the design is not
 * symmetric or its aperture is not a circle or ring about the centre.
 */
export function radialZones(design: CompiledDesign): ZoneRow[] | null {
  const bands = radialBands(design, 1e-7);
  return bands && bands.flatMap((layer, index) => layer.map((band, k) => ({ mask: index + 1, zone: k + 1, innerRadius: band.inner, outerRadius: band.outer })));
}

/** The zone table as CSV (µm, four decimals = 0.1 nm). */
export function zoneTableCsv(rows: readonly ZoneRow[]): string {
  const lines = ['mask,zone,inner_radius_um,outer_radius_um,width_um'];
  for (const row of rows) {
    lines.push([row.mask, row.zone, row.innerRadius.toFixed(4), row.outerRadius.toFixed(4), (row.outerRadius - row.innerRadius).toFixed(4)].join(','));
  }
  return `${lines.join('\n')}\n`;
}
