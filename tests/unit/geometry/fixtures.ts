import type { CompiledDesign, PhaseField, Quantization, Region } from '@/lib/design/types';

/** The unit-modulus field exp(i·phase) of a phase function, single and row-wise. */
function unitField(phase: (x: number, y: number) => number): Pick<PhaseField, 'phase' | 'field' | 'fieldRow'> {
  return {
    phase,
    field(x, y, out) {
      const p = phase(x, y);
      out[0] = Math.cos(p);
      out[1] = Math.sin(p);
    },
    fieldRow(y, xs, re, im) {
      for (let i = 0; i < xs.length; i++) {
        const p = phase(xs[i], y);
        re[i] = Math.cos(p);
        im[i] = Math.sin(p);
      }
    },
  };
}

/**
 * Hand-built designs for the geometry tests: the exact hyperbolic lens phase
 * φ = −(2π/λ)(√(ρ² + f²) − f) focusing a plane wave to (x0, y0, f) (textbook optics, from memory),
 * with its exact spatial-frequency bound ρ/(λ√(ρ² + f²)) taken at the box's farthest point.
 */
export function lensField(wavelength: number, focalLength: number, x0 = 0, y0 = 0): PhaseField {
  const k = (2 * Math.PI) / wavelength;
  const f2 = focalLength * focalLength;
  const phase = (x: number, y: number) => -k * (Math.sqrt((x - x0) ** 2 + (y - y0) ** 2 + f2) - focalLength);
  return {
    ...unitField(phase),
    maxSpatialFrequency(bx0, by0, bx1, by1) {
      const dx = Math.max(Math.abs(bx0 - x0), Math.abs(bx1 - x0));
      const dy = Math.max(Math.abs(by0 - y0), Math.abs(by1 - y0));
      const rho = Math.hypot(dx, dy);
      return rho / (wavelength * Math.sqrt(rho * rho + f2));
    },
  };
}

/** Σ w_k·exp(iφ_k): a multi-focus combination; its modulus can vanish (phase singularities). */
export function combinedField(parts: { field: PhaseField; weight: number }[]): PhaseField {
  const tmp = new Float64Array(2);
  const field = (x: number, y: number, out: Float64Array) => {
    let re = 0;
    let im = 0;
    for (const p of parts) {
      p.field.field(x, y, tmp);
      re += p.weight * tmp[0];
      im += p.weight * tmp[1];
    }
    out[0] = re;
    out[1] = im;
  };
  const out2 = new Float64Array(2);
  return {
    phase(x, y) {
      field(x, y, out2);
      return Math.atan2(out2[1], out2[0]);
    },
    field,
    fieldRow(y, xs, re, im) {
      for (let i = 0; i < xs.length; i++) {
        field(xs[i], y, out2);
        re[i] = out2[0];
        im[i] = out2[1];
      }
    },
    maxSpatialFrequency(bx0, by0, bx1, by1) {
      return Math.max(...parts.map((p) => p.field.maxSpatialFrequency(bx0, by0, bx1, by1)));
    },
    // |∇u| ≤ Σ w_k·|∇φ_k| (triangle inequality); |∇arg u| has no bound near zeros of u
    maxFieldGradient(bx0, by0, bx1, by1) {
      return parts.reduce((s, p) => s + p.weight * p.field.maxSpatialFrequency(bx0, by0, bx1, by1), 0);
    },
  };
}

/** A spiral (vortex) phase ℓ·θ about (x0, y0): a singular point of charge ℓ at the centre. */
export function vortexField(charge: number, x0 = 0, y0 = 0): PhaseField {
  const phase = (x: number, y: number) => charge * Math.atan2(y - y0, x - x0);
  return {
    ...unitField(phase),
    maxSpatialFrequency(bx0, by0, bx1, by1) {
      // |∇(ℓθ)| = |ℓ|/ρ, largest at the box point nearest the centre
      const dx = Math.max(bx0 - x0, 0, x0 - bx1);
      const dy = Math.max(by0 - y0, 0, y0 - by1);
      const rho = Math.hypot(dx, dy);
      return rho > 0 ? Math.abs(charge) / (2 * Math.PI * rho) : 1e6;
    },
  };
}

export function binary(duty = 0.5, phaseOffset = -Math.PI / 2, tone: 'positive' | 'negative' = 'positive'): Quantization {
  return { kind: 'binary', duty, phaseOffset, modulation: 'amplitude', tone, refractiveIndex: 1.5 };
}

export function design(field: PhaseField, aperture: Region, quantization: Quantization, extra: Partial<CompiledDesign> = {}): CompiledDesign {
  return {
    wavelength: 0.405,
    aperture,
    pieces: [{ region: null, field }],
    quantization,
    foci: [],
    symmetryCentre: null,
    labels: [],
    ...extra,
  };
}
