import type { IdealWave } from './ideal-wave';
import type { Sampling } from './types';

/** What the two propagation methods (radial integral, 2-D angular spectrum) offer the analysis. */
export interface OpticsEngine {
  readonly sampling: Sampling;
  /** illuminated aperture area, µm² */
  readonly apertureArea: number;
  /** Sets the wavelength (µm) the field is computed at; phase steps scale as λ0/λ. */
  setWavelength(wavelength: number): void;
  /** Intensity relative to the incident intensity at (x, y, z0 + i·dz), i = 0..count−1. */
  axialIntensities(x: number, y: number, z0: number, dz: number, count: number): Float64Array;
  /** size×size intensities in plane z centred on (xc, yc), `step` apart, row-major (y rows). */
  focalMap(xc: number, yc: number, z: number, step: number, size: number): Float64Array;
  /**
   * The fraction of the incident light carried by the wave: Σ_p |∫_p t·w dA|² / (P_p·P) over the design's
   * pieces p (one piece, the whole aperture, for a plain design), P_p the light incident on piece p and P on
   * the aperture. Per piece, so a focus served by some sectors of a multiplexed lens gets the power those
   * sectors send it, not their overlap with a full-aperture wave.
   */
  projectedPower(wave: IdealWave): number;
  /** Peak intensity a lossless perfect lens on the same aperture would give at (x, y, z). */
  idealPeakIntensity(x: number, y: number, z: number): number;
  /** Power incident on the aperture (incident intensity 1 on the axis), for encircled energy. */
  readonly incidentPower: number;
}
