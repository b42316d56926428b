import { incidentField } from './illumination';
import type { Illumination } from './types';

/**
 * A reference wave the mask is projected onto, written as a weight on the transmission t:
 *   w(ξ) = |u(ξ)|²·exp(i·phasePerLength·R(ξ))·(exp(iα(ξ)) when withIncidentPhase),
 * R the distance from ξ to (x, y, z) and u = |u|·exp(iα) the incident field. With phasePerLength = k the
 * projection measures the power sent into the ideal wave converging to (x, y, z); with m·k0 about a
 * designed focus it measures diffraction order m of that focus's lens.
 */
export interface IdealWave {
  x: number;
  y: number;
  z: number;
  phasePerLength: number;
  withIncidentPhase: boolean;
}

export function waveWeight(wave: IdealWave, illumination: Illumination, k: number, px: number, py: number, r2FromSource: number, out: Float64Array): void {
  incidentField(illumination, k, r2FromSource, out);
  const intensity = out[0] * out[0] + out[1] * out[1];
  const R = Math.sqrt((px - wave.x) ** 2 + (py - wave.y) ** 2 + wave.z * wave.z);
  const phase = wave.phasePerLength * R + (wave.withIncidentPhase ? Math.atan2(out[1], out[0]) : 0);
  out[0] = intensity * Math.cos(phase);
  out[1] = intensity * Math.sin(phase);
}

/** Magnitude of the Rayleigh–Sommerfeld kernel (z/2πR²)·|1/R − ik| from ξ to (x, y, z): a perfect lens adds these in phase. */
export function kernelMagnitude(k: number, dx: number, dy: number, z: number): number {
  const R2 = dx * dx + dy * dy + z * z;
  return (z / (2 * Math.PI * R2)) * Math.sqrt(1 / R2 + k * k);
}
