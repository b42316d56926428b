import type { PhaseField, Quantization } from '../design/types';

/**
 * One drawn mask layer as a smooth function g(x, y) whose zero set is the zone boundary and which is
 * positive exactly where the layer is drawn. Contouring g instead of the wrapped phase means 2π wraps
 * never make edges, and zeros of a combined field (phase singularities) are ordinary points of g.
 *
 * With v = u·e^(−i·phaseOffset) (u the complex field):
 *   binary:        g = Re(v) − cos(π·duty)·|v|                       (s = 1 where g > 0)
 *   multi-level k: g = −Im(v^m) / |v|^(m − 1), m = 2^(k − 1)          (bit k of the level set)
 * and a negative tone draws −g. Mask k is drawn where 2^(k−1)·(φ − phaseOffset) mod 2π lies in (π, 2π),
 * which is exactly "bit (bits − k) of the level L is set" for L = floor(mod(φ − phaseOffset, 2π)·2^bits/2π).
 */
export interface BoundaryFunction {
  /** g at (x, y) */
  value(x: number, y: number): number;
  /**
   * The smallest phase step (radians of φ) between two consecutive boundary levels. Sampling a line
   * so that φ changes by less than this between samples leaves at most one boundary per interval.
   */
  phaseGap: number;
}

export interface LayerFunctionSpec {
  /** power m applied to the normalised field */
  power: number;
  /** rotation applied after the power (radians) */
  rotation: number;
  /** threshold c: g = Re(e^(−i·rotation)·v^m)/|v|^(m−1) − c·|v| */
  threshold: number;
  /** −1 for negative tone */
  sign: 1 | -1;
  phaseOffset: number;
  phaseGap: number;
  /**
   * Where u vanishes along a whole line (two parts of equal weight), arg u jumps by π across it, so
   * the line is a boundary along some stretches and not along others, and its drawn side may swap.
   * This is the smallest step of arg u (radians) between two such changes; arg u turns at most 2π·F
   * per µm along the line (F the parts' frequency bound), so a step shorter than this over 2π·F
   * passes at most one of them.
   */
  zeroLineGap: number;
}

export class QuantizationError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'QuantizationError';
  }
}

/** The specs of every drawn layer of a quantization, in mask order. */
export function layerFunctionSpecs(q: Quantization): LayerFunctionSpec[] {
  if (q.kind === 'binary') {
    if (!(q.duty > 0 && q.duty < 1)) throw new QuantizationError(`The duty cycle must lie strictly between 0 and 1, got ${q.duty}.`);
    return [
      {
        power: 1,
        rotation: 0,
        threshold: Math.cos(Math.PI * q.duty),
        sign: q.tone === 'negative' ? -1 : 1,
        phaseOffset: q.phaseOffset,
        phaseGap: 2 * Math.PI * Math.min(q.duty, 1 - q.duty),
        // the line's stretches change where arg v or arg v + π is ±π·duty: steps of 2π·d and π − 2π·d
        // (d = min(duty, 1 − duty)); at duty ½ both levels change together, a crossing every π
        zeroLineGap: q.duty === 0.5 ? Math.PI : 2 * Math.PI * Math.min(Math.min(q.duty, 1 - q.duty), Math.abs(0.5 - q.duty)),
      },
    ];
  }
  if (!Number.isInteger(q.bits) || q.bits < 1 || q.bits > 8) throw new QuantizationError(`A multi-level design needs 1 to 8 bits, got ${q.bits}.`);
  return Array.from({ length: q.bits }, (_, i) => {
    const power = 2 ** i;
    return { power, rotation: (3 * Math.PI) / 2, threshold: 0, sign: 1 as const, phaseOffset: q.phaseOffset, phaseGap: Math.PI / power, zeroLineGap: Math.PI / power };
  });
}

export function boundaryFunction(field: PhaseField, spec: LayerFunctionSpec): BoundaryFunction {
  const out = new Float64Array(2);
  const cosOffset = Math.cos(spec.phaseOffset);
  const sinOffset = Math.sin(spec.phaseOffset);
  const cosRot = Math.cos(spec.rotation);
  const sinRot = Math.sin(spec.rotation);
  const { power, threshold, sign } = spec;
  const value = (x: number, y: number): number => {
    field.field(x, y, out);
    // v = u·e^(−i·offset)
    let re = out[0] * cosOffset + out[1] * sinOffset;
    let im = out[1] * cosOffset - out[0] * sinOffset;
    const modulus = Math.sqrt(re * re + im * im);
    if (power > 1) {
      if (modulus === 0) return 0;
      // normalise, raise to the power by repeated squaring (power is 2^j), scale back to |v|
      let a = re / modulus;
      let b = im / modulus;
      for (let p = 1; p < power; p *= 2) {
        const t = a * a - b * b;
        b = 2 * a * b;
        a = t;
      }
      re = a * modulus;
      im = b * modulus;
    }
    return sign * (re * cosRot + im * sinRot - threshold * modulus);
  };
  return { value, phaseGap: spec.phaseGap };
}
