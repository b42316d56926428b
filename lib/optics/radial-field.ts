import { besselJ0 } from './bessel-j0';
import { GAUSS_NODES, GAUSS_WEIGHTS } from './gauss-legendre';
import { incidentField, incidentPhaseSpan } from './illumination';
import type { Illumination } from './types';

/** A rotationally symmetric transmission at one wavelength: segments inner[i]..outer[i] with complex t. */
export interface RadialTransmission {
  inner: Float64Array;
  outer: Float64Array;
  tRe: Float64Array;
  tIm: Float64Array;
}

/** Largest phase change one six-point Gauss–Legendre panel is asked to integrate. */
const PANEL_PHASE = 2;

/**
 * The scalar field at distance ρ from the axis in the plane z behind a symmetric mask, from the
 * Rayleigh–Sommerfeld integral of the first kind with the azimuth integrated analytically:
 *   U(ρ, z) = ∫ u(r)·t(r)·(z/R²)·(1/R − ik)·exp(ik(R + ρ²/2R))·J0(kρr/R)·r dr,   R = √(r² + z²),
 * which is exact on the axis and accurate to first order in ρ/z off it (the aperture's NA is not
 * approximated). Each segment is split into Gauss–Legendre panels of at most PANEL_PHASE radians of
 * integrand phase. Written to out[0], out[1].
 */
export function radialField(
  t: RadialTransmission,
  illumination: Illumination,
  wavelength: number,
  rho: number,
  z: number,
  out: Float64Array,
): void {
  const k = (2 * Math.PI) / wavelength;
  const inc = new Float64Array(2);
  let sumRe = 0;
  let sumIm = 0;
  for (let s = 0; s < t.inner.length; s++) {
    const tr = t.tRe[s];
    const ti = t.tIm[s];
    if (tr === 0 && ti === 0) continue;
    const a = t.inner[s];
    const b = t.outer[s];
    const span = k * Math.abs(Math.hypot(b, z) - Math.hypot(a, z)) + incidentPhaseSpan(illumination, k, a, b) + (k * rho * (b - a)) / z;
    const panels = Math.max(1, Math.ceil(span / PANEL_PHASE));
    const h = (b - a) / panels;
    let segRe = 0;
    let segIm = 0;
    for (let p = 0; p < panels; p++) {
      const mid = a + (p + 0.5) * h;
      for (let g = 0; g < GAUSS_NODES.length; g++) {
        const r = mid + 0.5 * h * GAUSS_NODES[g];
        const w = 0.5 * h * GAUSS_WEIGHTS[g];
        const R = Math.sqrt(r * r + z * z);
        const phase = k * (R + (rho * rho) / (2 * R));
        const bessel = rho === 0 ? 1 : besselJ0((k * rho * r) / R);
        const scale = ((w * z * r) / (R * R)) * bessel;
        // (1/R − ik)·exp(i·phase)
        const c = Math.cos(phase);
        const sn = Math.sin(phase);
        let re = scale * (c / R + k * sn);
        let im = scale * (sn / R - k * c);
        if (illumination.kind !== 'plane') {
          incidentField(illumination, k, r * r, inc);
          const nr = re * inc[0] - im * inc[1];
          im = re * inc[1] + im * inc[0];
          re = nr;
        }
        segRe += re;
        segIm += im;
      }
    }
    sumRe += segRe * tr - segIm * ti;
    sumIm += segRe * ti + segIm * tr;
  }
  out[0] = sumRe;
  out[1] = sumIm;
}

/**
 * ∫ t(r)·w(r)·2πr dr over the segments, for a weight w given as a function writing (re, im) and a bound
 * of its phase change per segment; the projections of the mask onto ideal waves use it.
 */
export function radialProjection(
  t: RadialTransmission,
  weight: (r: number, out: Float64Array) => void,
  phaseSpan: (a: number, b: number) => number,
  out: Float64Array,
): void {
  const w = new Float64Array(2);
  let sumRe = 0;
  let sumIm = 0;
  for (let s = 0; s < t.inner.length; s++) {
    const a = t.inner[s];
    const b = t.outer[s];
    const panels = Math.max(1, Math.ceil(phaseSpan(a, b) / PANEL_PHASE));
    const h = (b - a) / panels;
    let segRe = 0;
    let segIm = 0;
    for (let p = 0; p < panels; p++) {
      const mid = a + (p + 0.5) * h;
      for (let g = 0; g < GAUSS_NODES.length; g++) {
        const r = mid + 0.5 * h * GAUSS_NODES[g];
        weight(r, w);
        const scale = 0.5 * h * GAUSS_WEIGHTS[g] * 2 * Math.PI * r;
        segRe += scale * w[0];
        segIm += scale * w[1];
      }
    }
    sumRe += segRe * t.tRe[s] - segIm * t.tIm[s];
    sumIm += segRe * t.tIm[s] + segIm * t.tRe[s];
  }
  out[0] = sumRe;
  out[1] = sumIm;
}
