import type { Illumination } from './types';

/**
 * The incident field on the mask at distance r from the source axis, relative to its value on the axis:
 * 1 for a plane wave; (s/ρ)·exp(ik(ρ − s)) with ρ = √(r² + s²) for a point source a distance s in front.
 * Written to out[0], out[1].
 */
export function incidentField(illumination: Illumination, k: number, r2: number, out: Float64Array): void {
  if (illumination.kind === 'plane') {
    out[0] = 1;
    out[1] = 0;
    return;
  }
  const s = illumination.distance_um;
  const rho = Math.sqrt(r2 + s * s);
  const amplitude = s / rho;
  const phase = k * (rho - s);
  out[0] = amplitude * Math.cos(phase);
  out[1] = amplitude * Math.sin(phase);
}

/** Upper bound of the incident phase change between radii a and b (for quadrature step sizes). */
export function incidentPhaseSpan(illumination: Illumination, k: number, a: number, b: number): number {
  if (illumination.kind === 'plane') return 0;
  const s = illumination.distance_um;
  return k * Math.abs(Math.hypot(b, s) - Math.hypot(a, s));
}

/**
 * Where a lens of focal distance f images the illumination: f itself for a plane wave, the thin-lens
 * image distance 1/z' = 1/f − 1/s for a point source at s (null when the image is virtual).
 */
export function imageDistance(illumination: Illumination, f: number): number | null {
  if (illumination.kind === 'plane') return f;
  const inverse = 1 / f - 1 / illumination.distance_um;
  return inverse > 0 ? 1 / inverse : null;
}
