/** Measurements of a focal spot on a square map (size×size, row-major, `step` apart). */

/** The brightest sample refined to sub-sample precision by a parabola through its neighbours; map coordinates in samples. */
export function mapPeak(map: Float64Array, size: number): { u: number; v: number; value: number; atEdge: boolean } {
  let best = 0;
  for (let c = 1; c < map.length; c++) if (map[c] > map[best]) best = c;
  const j = Math.floor(best / size);
  const i = best - j * size;
  const atEdge = i === 0 || j === 0 || i === size - 1 || j === size - 1;
  const vertex = (a: number, b: number, c: number) => {
    const d = a - 2 * b + c;
    return d < 0 ? Math.max(-0.5, Math.min(0.5, (0.5 * (a - c)) / d)) : 0;
  };
  const du = atEdge ? 0 : vertex(map[best - 1], map[best], map[best + 1]);
  const dv = atEdge ? 0 : vertex(map[best - size], map[best], map[best + size]);
  return { u: i + du, v: j + dv, value: map[best], atEdge };
}

function bilinear(map: Float64Array, size: number, u: number, v: number): number {
  if (u < 0 || v < 0 || u > size - 1 || v > size - 1) return 0;
  const i = Math.min(size - 2, Math.floor(u));
  const j = Math.min(size - 2, Math.floor(v));
  const a = u - i;
  const b = v - j;
  return (1 - a) * (1 - b) * map[j * size + i] + a * (1 - b) * map[j * size + i + 1] + (1 - a) * b * map[(j + 1) * size + i] + a * b * map[(j + 1) * size + i + 1];
}

const DIRECTIONS = 16;

/**
 * Full width at half maximum: twice the mean distance from the peak to the half-maximum contour along
 * DIRECTIONS rays (bilinear interpolation), so elliptical spots give their mean width. Null when the
 * half-maximum contour leaves the map.
 */
export function spotFwhm(map: Float64Array, size: number, step: number, peak: { u: number; v: number; value: number }): number | null {
  const half = peak.value / 2;
  const dr = 0.05;
  let total = 0;
  for (let d = 0; d < DIRECTIONS; d++) {
    const a = (2 * Math.PI * d) / DIRECTIONS;
    let r = 0;
    let previous = peak.value;
    for (;;) {
      r += dr;
      const u = peak.u + r * Math.cos(a);
      const v = peak.v + r * Math.sin(a);
      if (u < 0 || v < 0 || u > size - 1 || v > size - 1) return null;
      const value = bilinear(map, size, u, v);
      if (value <= half) {
        total += r - dr * ((half - value) / (previous - value));
        break;
      }
      previous = value;
    }
  }
  return (2 * step * total) / DIRECTIONS;
}

const SUBSAMPLES = 4;

/** ∫ I dA over the disc of `radius` (same units as step) around the peak, with boundary samples split 4×4. */
export function encircledPower(map: Float64Array, size: number, step: number, peak: { u: number; v: number }, radius: number): number {
  const rs = radius / step;
  let sum = 0;
  for (let j = 0; j < size; j++) {
    for (let i = 0; i < size; i++) {
      const d = Math.hypot(i - peak.u, j - peak.v);
      if (d > rs + 0.75) continue;
      let fraction = 1;
      if (d > rs - 0.75) {
        let inside = 0;
        for (let b = 0; b < SUBSAMPLES; b++) {
          for (let a = 0; a < SUBSAMPLES; a++) {
            if (Math.hypot(i - 0.5 + (a + 0.5) / SUBSAMPLES - peak.u, j - 0.5 + (b + 0.5) / SUBSAMPLES - peak.v) <= rs) inside++;
          }
        }
        fraction = inside / SUBSAMPLES ** 2;
      }
      sum += fraction * map[j * size + i];
    }
  }
  return sum * step * step;
}
