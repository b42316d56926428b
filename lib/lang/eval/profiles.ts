import type { PhaseMap } from '../../phasemap/types';
import { linearRange, radialRange } from './bounds';
import type { ScalarField } from './scalar';
import { NONE } from './scalar';

const TWO_PI = 2 * Math.PI;

/**
 * Exact lens φ = −(2π/λ)(√(ρ² + f²) − f). |∇φ| = (2π/λ)·ρ/√(ρ² + f²) grows with ρ, so its
 * maximum over a box is at the box's farthest point from the axis.
 */
export function lensField(wavelength: number, focal: number, cx: number, cy: number): ScalarField {
  const k = TWO_PI / wavelength;
  const f2 = focal * focal;
  const phaseAt = (rho: number): number => -k * (Math.sqrt(rho * rho + f2) - focal);
  return {
    at: (x, y) => {
      const dx = x - cx;
      const dy = y - cy;
      return -k * (Math.sqrt(dx * dx + dy * dy + f2) - focal);
    },
    bound: (box) => {
      const [near, far] = radialRange(box, cx, cy);
      return { lo: phaseAt(far), hi: phaseAt(near), slope: (k * far) / Math.sqrt(far * far + f2) };
    },
    symmetry: { kind: 'about', x: cx, y: cy },
    focus: { x: cx, y: cy, z: focal },
  };
}

/** Paraxial lens φ = −πρ²/(λf); |∇φ| = 2πρ/(λf). */
export function paraxialLensField(wavelength: number, focal: number, cx: number, cy: number): ScalarField {
  const c = Math.PI / (wavelength * focal);
  return {
    at: (x, y) => {
      const dx = x - cx;
      const dy = y - cy;
      return -c * (dx * dx + dy * dy);
    },
    bound: (box) => {
      const [near, far] = radialRange(box, cx, cy);
      return { lo: -c * far * far, hi: -c * near * near, slope: 2 * c * far };
    },
    symmetry: { kind: 'about', x: cx, y: cy },
    focus: { x: cx, y: cy, z: focal },
  };
}

/** Cylindrical lens: the exact lens profile across the line through the centre along `axis`. */
export function cylindricalLensField(wavelength: number, focal: number, axis: number, cx: number, cy: number): ScalarField {
  const k = TWO_PI / wavelength;
  const f2 = focal * focal;
  const s = Math.sin(axis);
  const c = Math.cos(axis);
  return {
    at: (x, y) => {
      const u = -(x - cx) * s + (y - cy) * c;
      return -k * (Math.sqrt(u * u + f2) - focal);
    },
    bound: (box) => {
      const [lo, hi] = linearRange(box, -s, c, cx, cy);
      const far = Math.max(Math.abs(lo), Math.abs(hi));
      const near = lo <= 0 && hi >= 0 ? 0 : Math.min(Math.abs(lo), Math.abs(hi));
      const phaseAt = (u: number): number => -k * (Math.sqrt(u * u + f2) - focal);
      return { lo: phaseAt(far), hi: phaseAt(near), slope: (k * far) / Math.sqrt(far * far + f2) };
    },
    symmetry: NONE,
    focus: null,
  };
}

/** Linear phase φ = 2π(x·cos d + y·sin d)/Λ; |∇φ| = 2π/Λ everywhere. */
export function gratingField(period: number, direction: number): ScalarField {
  const kx = (TWO_PI / period) * Math.cos(direction);
  const ky = (TWO_PI / period) * Math.sin(direction);
  return {
    at: (x, y) => kx * x + ky * y,
    bound: (box) => {
      const [lo, hi] = linearRange(box, kx, ky, 0, 0);
      return { lo, hi, slope: TWO_PI / period };
    },
    symmetry: NONE,
    focus: null,
  };
}

/** Axicon φ = −2πρ/Λ; |∇φ| = 2π/Λ. */
export function axiconField(period: number, cx: number, cy: number): ScalarField {
  const k = TWO_PI / period;
  return {
    at: (x, y) => {
      const dx = x - cx;
      const dy = y - cy;
      return -k * Math.sqrt(dx * dx + dy * dy);
    },
    bound: (box) => {
      const [near, far] = radialRange(box, cx, cy);
      return { lo: -k * far, hi: -k * near, slope: k };
    },
    symmetry: { kind: 'about', x: cx, y: cy },
    focus: null,
  };
}

/**
 * Bilinear interpolation of a sampled map; outside the map the nearest edge value holds.
 * Within one cell the gradient of the bilinear patch is bounded by the largest neighbour
 * difference along x over pitchX and along y over pitchY, so the global maximum of
 * √(gx² + gy²) over all cells bounds |∇φ| everywhere.
 */
export function phaseMapField(map: PhaseMap, scale: number): ScalarField {
  const { columns, rows, pitchX, pitchY, originX, originY, values } = map;
  let lo = Infinity;
  let hi = -Infinity;
  let gx = 0;
  let gy = 0;
  for (let j = 0; j < rows; j++) {
    for (let i = 0; i < columns; i++) {
      const v = values[j * columns + i];
      if (v < lo) lo = v;
      if (v > hi) hi = v;
      if (i + 1 < columns) gx = Math.max(gx, Math.abs(values[j * columns + i + 1] - v));
      if (j + 1 < rows) gy = Math.max(gy, Math.abs(values[(j + 1) * columns + i] - v));
    }
  }
  const slope = Math.abs(scale) * Math.hypot(columns > 1 ? gx / pitchX : 0, rows > 1 ? gy / pitchY : 0);
  const range = { lo: Math.min(lo * scale, hi * scale), hi: Math.max(lo * scale, hi * scale), slope };
  const lastColumn = columns - 1;
  const lastRow = rows - 1;
  return {
    at: (x, y) => {
      const u = Math.min(Math.max((x - originX) / pitchX, 0), lastColumn);
      const v = Math.min(Math.max((y - originY) / pitchY, 0), lastRow);
      const i = Math.min(Math.floor(u), Math.max(lastColumn - 1, 0));
      const j = Math.min(Math.floor(v), Math.max(lastRow - 1, 0));
      const fu = u - i;
      const fv = v - j;
      const i1 = Math.min(i + 1, lastColumn);
      const j1 = Math.min(j + 1, lastRow);
      const a = values[j * columns + i];
      const b = values[j * columns + i1];
      const c = values[j1 * columns + i];
      const d = values[j1 * columns + i1];
      return scale * ((a * (1 - fu) + b * fu) * (1 - fv) + (c * (1 - fu) + d * fu) * fv);
    },
    bound: () => range,
    symmetry: NONE,
    focus: null,
  };
}
