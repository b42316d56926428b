import type { DesignedFocus, PhaseField } from '../../design/types';
import { normaliseBox } from './bounds';
import { distinctWeights } from './distinct-weights';
import type { ScalarField } from './scalar';

/** One weighted part of a profile: w·exp(i(φ + c)). */
export interface Wave {
  phase: ScalarField;
  weight: number;
  offset: number;
}

const TWO_PI = 2 * Math.PI;

/**
 * The contract's PhaseField for a profile made of one or more waves.
 *
 * maxSpatialFrequency: for one wave it bounds |∇φ|/2π. For a combination it is the largest
 * bound of the parts (what the optics' grid must resolve); arg u itself has no finite bound near
 * the zeros of u, where every zone edge meets. A combination therefore also gives
 * maxFieldGradient = Σ w_k·|∇φ_k|/2π, since ∇u = Σ i·w_k·∇φ_k·exp(i(φ_k + c_k)) gives
 * |∇u| ≤ Σ w_k·|∇φ_k| (triangle inequality); with |u| at a point it bounds how fast arg u can turn
 * nearby (scan-segment.ts).
 */
export function phaseFieldOf(waves: Wave[]): PhaseField & { phaseRow(y: number, xs: Float64Array, out: Float64Array): void } {
  if (waves.length === 1) return singleWave(waves[0]);
  const n = waves.length;
  const ats = waves.map((w) => w.phase.at);
  const weights = distinctWeights(waves.map((w) => w.weight));
  const largest = Math.max(...weights);
  const minModulus = Math.max(0, 2 * largest - weights.reduce((sum, w) => sum + w, 0));
  const offsets = Float64Array.from(waves.map((w) => w.offset));
  const sum = (x: number, y: number, out: Float64Array): void => {
    let re = 0;
    let im = 0;
    for (let k = 0; k < n; k++) {
      const p = ats[k](x, y) + offsets[k];
      re += weights[k] * Math.cos(p);
      im += weights[k] * Math.sin(p);
    }
    out[0] = re;
    out[1] = im;
  };
  const scratch = new Float64Array(2);
  // row buffers for phaseRow, grown once to the longest row seen (no allocation afterwards)
  let rowRe = new Float64Array(0);
  let rowIm = new Float64Array(0);
  const fieldRow = (y: number, xs: Float64Array, outRe: Float64Array, outIm: Float64Array): void => {
    outRe.fill(0, 0, xs.length);
    outIm.fill(0, 0, xs.length);
    for (let k = 0; k < n; k++) {
      const at = ats[k];
      const w = weights[k];
      const c = offsets[k];
      for (let i = 0; i < xs.length; i++) {
        const p = at(xs[i], y) + c;
        outRe[i] += w * Math.cos(p);
        outIm[i] += w * Math.sin(p);
      }
    }
  };
  return {
    phase(x, y) {
      sum(x, y, scratch);
      return Math.atan2(scratch[1], scratch[0]);
    },
    field: sum,
    fieldRow,
    phaseRow(y, xs, out) {
      if (rowRe.length < xs.length) {
        rowRe = new Float64Array(xs.length);
        rowIm = new Float64Array(xs.length);
      }
      fieldRow(y, xs, rowRe, rowIm);
      for (let i = 0; i < xs.length; i++) out[i] = Math.atan2(rowIm[i], rowRe[i]);
    },
    maxSpatialFrequency(x0, y0, x1, y1) {
      const box = normaliseBox(x0, y0, x1, y1);
      let most = 0;
      for (const w of waves) if (w.weight > 0) most = Math.max(most, w.phase.bound(box).slope);
      return most / TWO_PI;
    },
    minModulus,
    maxFieldGradient(x0, y0, x1, y1) {
      const box = normaliseBox(x0, y0, x1, y1);
      let sum = 0;
      for (const w of waves) if (w.weight > 0) sum += w.weight * w.phase.bound(box).slope;
      return sum / TWO_PI;
    },
  };
}

function singleWave({ phase: field, weight, offset }: Wave): ReturnType<typeof phaseFieldOf> {
  const base = field.at;
  const at = offset === 0 ? base : (x: number, y: number) => base(x, y) + offset;
  return {
    phase: at,
    field(x, y, out) {
      const p = at(x, y);
      out[0] = weight * Math.cos(p);
      out[1] = weight * Math.sin(p);
    },
    fieldRow(y, xs, outRe, outIm) {
      for (let i = 0; i < xs.length; i++) {
        const p = at(xs[i], y);
        outRe[i] = weight * Math.cos(p);
        outIm[i] = weight * Math.sin(p);
      }
    },
    phaseRow(y, xs, out) {
      for (let i = 0; i < xs.length; i++) out[i] = at(xs[i], y);
    },
    maxSpatialFrequency(x0, y0, x1, y1) {
      return field.bound(normaliseBox(x0, y0, x1, y1)).slope / TWO_PI;
    },
  };
}

/** The designed foci of a profile: waves whose phase is a lens (plus a constant). */
export function fociOf(waves: Wave[]): DesignedFocus[] {
  return waves.flatMap((w) => (w.phase.focus && w.weight > 0 ? [{ ...w.phase.focus, weight: w.weight }] : []));
}
