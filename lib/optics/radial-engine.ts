import type { OpticsEngine } from './engine';
import { incidentField, incidentPhaseSpan } from './illumination';
import { kernelMagnitude, waveWeight, type IdealWave } from './ideal-wave';
import { stateTransmission, type MaskModel } from './mask-model';
import type { RadialMask } from './radial-mask';
import { radialField, radialProjection, type RadialTransmission } from './radial-field';
import { pieceAt } from './region';
import type { Illumination, Sampling } from './types';
import type { Region } from '../design/types';

/** The radial method: exact 1-D integrals over the annular segments read off a symmetric mask. */
export function createRadialEngine(
  mask: MaskModel,
  radial: RadialMask,
  centre: { x: number; y: number },
  illumination: Illumination,
  pieceRegions: Array<Region | null>,
  sampling: Sampling,
): OpticsEngine {
  const segments = radial.inner.length;
  const t: RadialTransmission = { inner: radial.inner, outer: radial.outer, tRe: new Float64Array(segments), tIm: new Float64Array(segments) };
  const open: RadialTransmission = { ...t, tRe: new Float64Array(segments).fill(1), tIm: new Float64Array(segments) };
  // the segments of each piece (by its midpoint), for per-piece projections
  const pieceOf = Int32Array.from({ length: segments }, (_, s) => pieceAt(pieceRegions, centre.x + 0.5 * (radial.inner[s] + radial.outer[s]), centre.y));
  const subset = (of: RadialTransmission, piece: number): RadialTransmission => {
    const keep = [...pieceOf.keys()].filter((s) => pieceOf[s] === piece);
    const pick = (a: Float64Array) => Float64Array.from(keep, (s) => a[s]);
    return { inner: pick(of.inner), outer: pick(of.outer), tRe: pick(of.tRe), tIm: pick(of.tIm) };
  };
  let wavelength = mask.designWavelength;
  const value = new Float64Array(2);
  const setWavelength = (lambda: number) => {
    wavelength = lambda;
    for (let s = 0; s < segments; s++) {
      let drawn = 0;
      for (let k = 0; k < radial.layers; k++) drawn |= radial.drawn[s * radial.layers + k] << k;
      stateTransmission(mask, drawn, lambda, value);
      t.tRe[s] = value[0];
      t.tIm[s] = value[1];
    }
  };
  setWavelength(wavelength);
  const k = () => (2 * Math.PI) / wavelength;
  const intensityAt = (rho: number, z: number) => {
    radialField(t, illumination, wavelength, rho, z, value);
    return value[0] * value[0] + value[1] * value[1];
  };
  const power = (weight: (r: number, out: Float64Array) => void, span: (a: number, b: number) => number, over: RadialTransmission) => {
    radialProjection(over, weight, span, value);
    return { re: value[0], im: value[1] };
  };
  const incidentIntensity = (r: number, out: Float64Array) => {
    incidentField(illumination, k(), r * r, out);
    out[0] = out[0] * out[0] + out[1] * out[1];
    out[1] = 0;
  };
  const incidentPower = power(incidentIntensity, () => 0, open).re;
  const pieceIncident = pieceRegions.map((_, piece) => power(incidentIntensity, () => 0, subset(open, piece)).re);
  let area = 0;
  for (let s = 0; s < segments; s++) area += Math.PI * (radial.outer[s] ** 2 - radial.inner[s] ** 2);

  return {
    sampling,
    apertureArea: area,
    incidentPower,
    setWavelength,
    axialIntensities(x, y, z0, dz, count) {
      const rho = Math.hypot(x - centre.x, y - centre.y);
      const out = new Float64Array(count);
      for (let i = 0; i < count; i++) out[i] = intensityAt(rho, z0 + i * dz);
      return out;
    },
    focalMap(xc, yc, z, step, size) {
      // the symmetric field depends on the distance from the axis only: tabulate it and read it back
      const offset = Math.hypot(xc - centre.x, yc - centre.y);
      const reach = offset + step * size;
      const fine = step / 2;
      const profile = new Float64Array(Math.ceil(reach / fine) + 2);
      for (let i = 0; i < profile.length; i++) profile[i] = intensityAt(i * fine, z);
      const map = new Float64Array(size * size);
      const half = (size - 1) / 2;
      for (let j = 0; j < size; j++) {
        for (let i = 0; i < size; i++) {
          const u = Math.hypot(xc + (i - half) * step - centre.x, yc + (j - half) * step - centre.y) / fine;
          const i0 = Math.floor(u);
          const f = u - i0;
          map[j * size + i] = (1 - f) * profile[i0] + f * profile[i0 + 1];
        }
      }
      return map;
    },
    projectedPower(wave: IdealWave) {
      const kk = k();
      const span = (a: number, b: number) =>
        Math.abs(wave.phasePerLength) * Math.abs(Math.hypot(b, wave.z) - Math.hypot(a, wave.z)) + (wave.withIncidentPhase ? incidentPhaseSpan(illumination, kk, a, b) : 0);
      const weight = (r: number, out: Float64Array) => waveWeight(wave, illumination, kk, centre.x + r, centre.y, r * r, out);
      let total = 0;
      pieceRegions.forEach((_, piece) => {
        if (pieceIncident[piece] === 0) return;
        const p = power(weight, span, pieceRegions.length === 1 ? t : subset(t, piece));
        total += (p.re * p.re + p.im * p.im) / (pieceIncident[piece] * incidentPower);
      });
      return total;
    },
    idealPeakIntensity(x, y, z) {
      const kk = k();
      const amplitude = power(
        (r, out) => {
          incidentField(illumination, kk, r * r, out);
          out[0] = Math.hypot(out[0], out[1]) * kernelMagnitude(kk, r, 0, z);
          out[1] = 0;
        },
        () => 0,
        open,
      ).re;
      return amplitude * amplitude;
    },
  };
}
