/**
 * The contract between the phase-profile language (lib/lang), the mask geometry (lib/geometry)
 * and the optical check (lib/optics).
 *
 * Units everywhere in lib/: lengths in micrometres (µm), angles and phases in radians.
 * The language converts user units once, at compile time.
 */

/** A closed region of the mask plane, in µm. Polygon points are flat x,y pairs, not repeated at the end. */
export type Region =
  | { kind: 'circle'; cx: number; cy: number; r: number }
  | { kind: 'ring'; cx: number; cy: number; rInner: number; rOuter: number }
  | { kind: 'rectangle'; x0: number; y0: number; x1: number; y1: number }
  | { kind: 'polygon'; points: Float64Array }
  | { kind: 'union'; parts: Region[] }
  | { kind: 'intersection'; parts: Region[] }
  /** parts[0] minus every later part */
  | { kind: 'difference'; parts: Region[] };

/** A compiled phase profile: pure functions of the mask-plane position (µm). */
export interface PhaseField {
  /** Unwrapped phase in radians at (x, y). For a combination this is arg(field). */
  phase(x: number, y: number): number;
  /**
   * Complex field at (x, y), written to out[0] (real) and out[1] (imaginary).
   * A single profile gives exp(i·phase); a combination gives Σ w_k·exp(i(φ_k + c_k)),
   * whose modulus may vanish at phase singularities.
   */
  field(x: number, y: number, out: Float64Array): void;
  /** Batch form of `field` along one row y; must not allocate. */
  fieldRow(y: number, xs: Float64Array, outRe: Float64Array, outIm: Float64Array): void;
  /** Optional batch form of `phase` along one row y; must not allocate. The language always provides it. */
  phaseRow?(y: number, xs: Float64Array, out: Float64Array): void;
  /**
   * An upper bound of the local spatial frequency |∇φ|/(2π), in cycles per µm, over the
   * axis-aligned box [x0, x1] × [y0, y1]. The geometry engine samples at least twice this rate,
   * so a bound that is too low can miss zones: it must never under-estimate.
   */
  maxSpatialFrequency(x0: number, y0: number, x1: number, y1: number): number;
  /**
   * Combinations only: an upper bound of Σ|w_k|·|∇φ_k|/(2π) over the box, so |∇u| ≤ 2π·this (per µm).
   * For a combination `maxSpatialFrequency` bounds the parts, not arg u, whose gradient
   * |∇arg u| ≤ |∇u|/|u| grows without bound near zeros of u; the geometry engine sets its sample step
   * from this bound and |u| at each sample instead. Absent when |u| is constant (a single wave), where
   * `maxSpatialFrequency` bounds |∇φ|/(2π) itself. Like it, it must never under-estimate.
   */
  maxFieldGradient?(x0: number, y0: number, x1: number, y1: number): number;
  /**
   * Combinations only: a lower bound of |u| everywhere, the largest weight less the sum of the others
   * (reverse triangle inequality), or 0 when that is not positive. Above 0, u has no zeros at all.
   */
  minModulus?: number;
}

/**
 * One part of the profile. A plain design has one piece with `region: null` (the whole aperture).
 * Spatial multiplexing (interleaved sectors or stripes) gives one piece per sub-aperture, each with
 * its own field; pieces' regions do not overlap.
 */
export interface ProfilePiece {
  region: Region | null;
  field: PhaseField;
}

/**
 * How the continuous phase becomes fabricated states.
 *
 * Binary: the state is s = 1 where cos(φ − phaseOffset) > cos(π·duty) (a fraction `duty` of every
 * 2π period, centred on phaseOffset) and s = 0 elsewhere. For a combined field u the same test reads
 * Re(u·e^(−i·phaseOffset)) > cos(π·duty)·|u|.
 * `modulation` says what the two states do to light: amplitude (s = 1 transmits, s = 0 is opaque
 * chrome) or phase (s = 1 is retarded by π relative to s = 0; a step of λ/(2(n−1))).
 * `tone`: positive draws the s = 1 regions as polygons, negative draws the s = 0 regions
 * (inside the aperture).
 *
 * Multi-level: 2^bits phase levels, level L = floor(mod(φ − phaseOffset, 2π) / (2π/2^bits)),
 * written as `bits` binary masks; mask k (k = 1..bits) is drawn where bit (bits − k) of L is set
 * and carries a step of 2π/2^k, i.e. depth λ/(2^k·(n − 1)) in a material of refractive index n.
 */
export type Quantization =
  | {
      kind: 'binary';
      duty: number;
      phaseOffset: number;
      modulation: 'amplitude' | 'phase';
      tone: 'positive' | 'negative';
      refractiveIndex: number;
    }
  | {
      kind: 'multilevel';
      bits: number;
      phaseOffset: number;
      refractiveIndex: number;
    };

/** A designed focus, for the optical check. Coordinates in µm; z is the focal distance behind the mask. */
export interface DesignedFocus {
  x: number;
  y: number;
  z: number;
  /** relative weight as written in the script (not normalised) */
  weight: number;
}

/** A text label the script asks to place on the mask (µm). */
export interface LabelRequest {
  text: string;
  x: number;
  y: number;
  height: number;
}

/** What the language compiler hands to geometry and optics. */
export interface CompiledDesign {
  /** wavelength in µm */
  wavelength: number;
  aperture: Region;
  pieces: ProfilePiece[];
  quantization: Quantization;
  foci: DesignedFocus[];
  /** Set when the profile and aperture are rotationally symmetric about this point (enables the radial optics). */
  symmetryCentre: { x: number; y: number } | null;
  /**
   * Set when the profile is one wave equal to a function of the distance from (x, y) plus
   * charge·θ about it (a lens plus a vortex), inside a disc or ring about that point: every zone
   * boundary is then a spiral (enables the geometry's spiral path). Absent means not known.
   */
  spiral?: { x: number; y: number; charge: number } | null;
  labels: LabelRequest[];
}
