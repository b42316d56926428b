/**
 * What the optical check takes and returns. Lengths in µm, phases in radians.
 * The result is plain JSON (numbers, strings, arrays, null) so it can be cached per revision and sent to the browser.
 */

/** How the mask is lit: a plane wave along +z, or an on-axis point source a distance in front of the mask. */
export type Illumination = { kind: 'plane' } | { kind: 'point'; distance_um: number };

export interface SimulationOptions {
  illumination?: Illumination;
  /** largest FFT grid side for the 2-D method (power of two); default 2048 */
  maxGrid?: number;
  /** force a method; by default symmetric designs use the radial integral, the rest the 2-D angular spectrum */
  method?: 'auto' | 'fft-2d' | 'radial';
  /** chromatic band in µm; default a white LED, 0.42–0.68 µm, when the design wavelength is visible, else ±10 % */
  band?: { from_um: number; to_um: number; samples?: number };
  /** points on each axial scan; default 600 (radial) or 240 (2-D) */
  axialSamples?: number;
}

export type SamplingMethod = 'fft-2d' | 'radial' | 'scaled-region';

export interface Sampling {
  method: SamplingMethod;
  /** one honest sentence or two on what was simulated and how finely */
  note: string;
  /** 2-D: grid side and pixel pitch; radial: number of radial transitions read off the polygons */
  gridSize?: number;
  pitch_um?: number;
  transitions?: number;
  /** the part of the mask that was simulated, µm (the whole aperture unless method is scaled-region) */
  region_um: { x0: number; y0: number; x1: number; y1: number };
  /** highest local spatial frequency of the profile in the simulated region, cycles/µm */
  maxSpatialFrequency_per_um: number;
}

export interface FocusResult {
  designed_um: [number, number, number];
  /** where this focus should land under the chosen illumination (equals designed_um for a plane wave) */
  expected_um: [number, number, number];
  found_um: [number, number, number];
  /** power carried by the ideal wave converging to this focus, as a fraction of the light incident on the aperture */
  efficiency: number;
  /** peak intensity at the found point over the peak of a lossless perfect lens with the same aperture */
  peakRatio: number;
  /** peak intensity relative to the incident intensity */
  peakIntensity: number;
  fwhm_um: number | null;
  /** FWHM of the Airy spot of the simulated aperture, 0.514 λ/NA (Born & Wolf) */
  diffractionLimitFwhm_um: number;
  /** fraction of the light incident on the aperture that falls within encircledRadius_um of the found peak */
  encircledEnergy: number;
  /** the Airy first dark ring, 0.61 λ/NA (1.22 λz/D paraxially) */
  encircledRadius_um: number;
}

export interface OrderResult {
  order: number;
  /** designed focus this order belongs to; null for the zero order */
  focusIndex: number | null;
  /** expected focus of the order along the focus axis: z/m for m > 0, virtual (negative) for m < 0, null for the zero order */
  expectedZ_um: number | null;
  /** peak found on the axial scan near expectedZ_um, or null when the order is virtual, collimated or off the scan */
  z_um: number | null;
  /** fraction of the incident light carried by the wave exp(i·m·φ_focus), φ_focus the focus's ideal lens phase */
  efficiency: number;
  /** false when the order's zone frequencies (|m|·f_max) exceed the 2-D grid's Nyquist limit: its figures are then aliased */
  resolved: boolean;
}

export interface AxialScan {
  focusIndex: number;
  x_um: number;
  y_um: number;
  z_um: number[];
  /** intensity relative to the incident intensity */
  intensity: number[];
}

/** A small square intensity map in the plane z_um, centred on the found focus, row-major (y rows, x columns). */
export interface FocalMap {
  focusIndex: number;
  z_um: number;
  centre_um: [number, number];
  /** distance between neighbouring samples */
  step_um: number;
  size: number;
  intensity: number[];
}

export interface ChromaticResult {
  focusIndex: number;
  wavelength_um: number[];
  /** peak found on the focus axis at each wavelength */
  focus_z_um: number[];
  /** f(λ) = f0·λ0/λ (image distance for a point source), for comparison */
  expected_z_um: number[];
  /** number of Fresnel zones of the focus over the aperture */
  zones: number;
  /** rule of thumb: the focus stays sharp while λ/Δλ ≳ zones, i.e. Δλ ≲ λ/zones */
  maxBandwidth_um: number;
  note: string;
}

export interface SimulationResult {
  wavelength_um: number;
  illumination: Illumination;
  modulation: 'amplitude' | 'phase' | 'multilevel';
  sampling: Sampling;
  aperture: { area_um2: number; equivalentDiameter_um: number };
  foci: FocusResult[];
  orders: OrderResult[];
  /** the axial scan through the first designed focus (same as axialScans[0]) */
  axial: AxialScan;
  axialScans: AxialScan[];
  focalMaps: FocalMap[];
  chromatic: ChromaticResult;
  warnings: string[];
}

export type ProgressCallback = (fraction: number) => void;
