import type { OpticsEngine } from './engine';
import { fft2d } from './fft2d';
import { incidentField } from './illumination';
import { kernelMagnitude, waveWeight, type IdealWave } from './ideal-wave';
import { stateTransmission, type MaskModel } from './mask-model';
import type { Grid } from './raster-coverage';
import { pieceAt } from './region';
import type { Illumination, Sampling } from './types';
import type { Region } from '../design/types';

/**
 * The 2-D method: the rasterised transmission (per-layer coverages and the aperture coverage) on an
 * n×n grid, its angular spectrum by FFT, and the band-limited angular-spectrum transfer function
 * exp(i·kz·z) with kz = 2π√(1/λ² − fx² − fy²) (evanescent waves dropped). The field at any point is
 * the inverse transform evaluated there directly, so foci can be mapped finer than the grid.
 * The band limit is that of Matsushima & Shimobaba, Opt. Express 17, 19662 (2009):
 * |f| < 1/(λ·√((2·Δf·z)² + 1)) per axis, which keeps the sampled transfer function free of aliasing.
 */
/** Axial scans are split into chunks spanning at most this ratio of distances, each with its own band limit. */
const CHUNK_RATIO = 1.3;

export function createGridEngine(
  mask: MaskModel,
  grid: Grid,
  /** from stateCoverage: index s > 0 holds the fraction of each pixel where exactly the layers in s are drawn */
  stateCoverage: Float32Array[],
  apertureCoverage: Float32Array,
  illumination: Illumination,
  sourceAxis: { x: number; y: number },
  pieceRegions: Array<Region | null>,
  sampling: Sampling,
): OpticsEngine {
  const { n, pitch } = grid;
  const cells = n * n;
  const transmission = new Float64Array(2 * cells);
  const spectrum = new Float64Array(2 * cells);
  const frequency = new Float64Array(n);
  for (let j = 0; j < n; j++) frequency[j] = (j < n / 2 ? j : j - n) / (n * pitch);
  const df = 1 / (n * pitch);
  const nyquist = 1 / (2 * pitch);
  const centreX = (i: number) => grid.x0 + (i + 0.5) * pitch;
  const centreY = (j: number) => grid.y0 + (j + 0.5) * pitch;
  let wavelength = mask.designWavelength;
  const value = new Float64Array(2);
  const inc = new Float64Array(2);
  const stateValues = new Float64Array(2 * stateCoverage.length);

  const pieces = pieceRegions.length;
  const pieceOf = new Int32Array(cells);
  if (pieces > 1) {
    for (let j = 0; j < n; j++) {
      for (let i = 0; i < n; i++) if (apertureCoverage[j * n + i] > 0) pieceOf[j * n + i] = pieceAt(pieceRegions, centreX(i), centreY(j));
    }
  }
  const pieceIncident = new Float64Array(pieces);
  let incidentPower = 0;
  let area = 0;
  const setWavelength = (lambda: number) => {
    wavelength = lambda;
    const k = (2 * Math.PI) / lambda;
    for (let state = 0; state < stateCoverage.length; state++) {
      stateTransmission(mask, state, lambda, value);
      stateValues[2 * state] = value[0];
      stateValues[2 * state + 1] = value[1];
    }
    incidentPower = 0;
    area = 0;
    pieceIncident.fill(0);
    for (let j = 0; j < n; j++) {
      const dy = centreY(j) - sourceAxis.y;
      for (let i = 0; i < n; i++) {
        const c = j * n + i;
        const ap = apertureCoverage[c];
        if (ap === 0) {
          spectrum[2 * c] = spectrum[2 * c + 1] = 0;
          continue;
        }
        // area average over the pixel of the drawn states' transmissions
        let rest = 1;
        let tr = 0;
        let ti = 0;
        for (let state = 1; state < stateCoverage.length; state++) {
          const f = stateCoverage[state][c];
          if (f === 0) continue;
          rest -= f;
          tr += f * stateValues[2 * state];
          ti += f * stateValues[2 * state + 1];
        }
        tr = ap * (tr + rest * stateValues[0]);
        ti = ap * (ti + rest * stateValues[1]);
        const dx = centreX(i) - sourceAxis.x;
        incidentField(illumination, k, dx * dx + dy * dy, inc);
        spectrum[2 * c] = tr * inc[0] - ti * inc[1];
        spectrum[2 * c + 1] = tr * inc[1] + ti * inc[0];
        const incident = ap * (inc[0] * inc[0] + inc[1] * inc[1]) * pitch * pitch;
        incidentPower += incident;
        pieceIncident[pieceOf[c]] += incident;
        area += ap * pitch * pitch;
      }
    }
    fft2d(spectrum, n, false);
    undoPixelAveraging();
    transmissionCurrent = false;
  };
  let transmissionCurrent = false;

  /**
   * Area coverage box-filters the mask before sampling, which damps its spectrum by sinc(π·fx·p)·sinc(π·fy·p)
   * (up to 36 % at Nyquist). Dividing it out restores the mask's own band-limited spectrum; the
   * transmission used for projections is brought back from it (currentTransmission) so both see the same mask.
   */
  function undoPixelAveraging(): void {
    const sinc = new Float64Array(n);
    for (let j = 0; j < n; j++) {
      const a = Math.PI * frequency[j] * pitch;
      sinc[j] = a === 0 ? 1 : Math.sin(a) / a;
    }
    for (let j = 0; j < n; j++) {
      for (let i = 0; i < n; i++) {
        const c = 2 * (j * n + i);
        const g = 1 / (sinc[i] * sinc[j]);
        spectrum[c] *= g;
        spectrum[c + 1] *= g;
      }
    }
  }

  /** The mask's transmission brought back from the corrected spectrum (for projections), when first needed. */
  function currentTransmission(): Float64Array {
    if (transmissionCurrent) return transmission;
    transmissionCurrent = true;
    transmission.set(spectrum);
    fft2d(transmission, n, true);
    const k = (2 * Math.PI) / wavelength;
    for (let j = 0; j < n; j++) {
      const dy = centreY(j) - sourceAxis.y;
      for (let i = 0; i < n; i++) {
        const c = 2 * (j * n + i);
        const dx = centreX(i) - sourceAxis.x;
        incidentField(illumination, k, dx * dx + dy * dy, inc);
        // t = field / incident
        const m = inc[0] * inc[0] + inc[1] * inc[1];
        const fr = transmission[c];
        const fi = transmission[c + 1];
        transmission[c] = (fr * inc[0] + fi * inc[1]) / m;
        transmission[c + 1] = (fi * inc[0] - fr * inc[1]) / m;
      }
    }
    return transmission;
  }
  setWavelength(wavelength);

  /** Band limit per axis for propagation to z, and the squared cut-off of propagating waves. */
  const limits = (z: number) => ({ axis: 1 / (wavelength * Math.sqrt((2 * df * z) ** 2 + 1)), radial2: 1 / (wavelength * wavelength) });
  /** exp(i·2π·f·(x − x_first)) for every frequency f of one axis. */
  const phasors = (offset: number) => {
    const out = new Float64Array(2 * n);
    for (let j = 0; j < n; j++) {
      const a = 2 * Math.PI * frequency[j] * offset;
      out[2 * j] = Math.cos(a);
      out[2 * j + 1] = Math.sin(a);
    }
    return out;
  };

  /**
   * kz depends on fx² + fy² only, and on the grid that is (i² + j²)·Δf² with integer i, j: spectrum
   * entries are grouped by that integer, exactly, so an axial scan sums one term per distinct value
   * (about 7× fewer than entries on a 2048² grid).
   */
  const ringOf = new Int32Array(cells);
  const ringSquares: number[] = [];
  {
    const index = (j: number) => (j < n / 2 ? j : j - n);
    const idOfSquare = new Int32Array(2 * (n / 2) ** 2 + 1).fill(-1);
    for (let j = 0; j < n; j++) for (let i = 0; i < n; i++) idOfSquare[index(i) ** 2 + index(j) ** 2] = 0;
    for (let v = 0; v < idOfSquare.length; v++) {
      if (idOfSquare[v] < 0) continue;
      idOfSquare[v] = ringSquares.length;
      ringSquares.push(v);
    }
    for (let j = 0; j < n; j++) for (let i = 0; i < n; i++) ringOf[j * n + i] = idOfSquare[index(i) ** 2 + index(j) ** 2];
  }

  /** Intensities at (x, y, z0 + i·dz) given B = A·exp(i2π(fx·x + fy·y)) for every entry. */
  /** Sums of B over each ring within the per-axis band limit. */
  function ringSums(B: Float64Array, axis: number): Float64Array {
    const C = new Float64Array(2 * ringSquares.length);
    for (let j = 0; j < n; j++) {
      if (Math.abs(frequency[j]) >= axis) continue;
      for (let i = 0; i < n; i++) {
        if (Math.abs(frequency[i]) >= axis) continue;
        const c = j * n + i;
        const r = ringOf[c];
        C[2 * r] += B[2 * c];
        C[2 * r + 1] += B[2 * c + 1];
      }
    }
    return C;
  }

  function axialChunk(B: Float64Array, uncutSums: () => Float64Array, z0: number, dz: number, count: number): Float64Array {
    const { axis, radial2 } = limits(z0 + dz * (count - 1));
    const rings = ringSquares.length;
    const C = axis >= nyquist ? uncutSums() : ringSums(B, axis);
    // current term P = C·exp(i·kz·z) and step S = exp(i·kz·dz) for every propagating ring
    const P = new Float64Array(2 * rings);
    const S = new Float64Array(2 * rings);
    let m = 0;
    for (let r = 0; r < rings; r++) {
      const rest = radial2 - ringSquares[r] * df * df;
      if (rest <= 0) break;
      if (C[2 * r] === 0 && C[2 * r + 1] === 0) continue;
      const kz = 2 * Math.PI * Math.sqrt(rest);
      const c0 = Math.cos(kz * z0);
      const s0 = Math.sin(kz * z0);
      P[2 * m] = C[2 * r] * c0 - C[2 * r + 1] * s0;
      P[2 * m + 1] = C[2 * r] * s0 + C[2 * r + 1] * c0;
      S[2 * m] = Math.cos(kz * dz);
      S[2 * m + 1] = Math.sin(kz * dz);
      m++;
    }
    const out = new Float64Array(count);
    const norm = 1 / cells;
    for (let step = 0; step < count; step++) {
      let re = 0;
      let im = 0;
      for (let q = 0; q < 2 * m; q += 2) {
        const pr = P[q];
        const pi = P[q + 1];
        re += pr;
        im += pi;
        P[q] = pr * S[q] - pi * S[q + 1];
        P[q + 1] = pr * S[q + 1] + pi * S[q];
      }
      out[step] = (re * re + im * im) * norm * norm;
    }
    return out;
  }

  return {
    sampling,
    get apertureArea() {
      return area;
    },
    get incidentPower() {
      return incidentPower;
    },
    setWavelength,
    axialIntensities(x, y, z0, dz, count) {
      const ex = phasors(x - centreX(0));
      const ey = phasors(y - centreY(0));
      const B = new Float64Array(2 * cells);
      for (let j = 0; j < n; j++) {
        for (let i = 0; i < n; i++) {
          const c = 2 * (j * n + i);
          const er = ex[2 * i] * ey[2 * j] - ex[2 * i + 1] * ey[2 * j + 1];
          const ei = ex[2 * i] * ey[2 * j + 1] + ex[2 * i + 1] * ey[2 * j];
          B[c] = spectrum[c] * er - spectrum[c + 1] * ei;
          B[c + 1] = spectrum[c] * ei + spectrum[c + 1] * er;
        }
      }
      // the band limit narrows with distance: where it cuts into the grid's band, take the scan in chunks
      // of at most CHUNK_RATIO in z, each with the limit of its far end
      let uncut: Float64Array | null = null;
      const uncutSums = () => (uncut ??= ringSums(B, Infinity));
      const out = new Float64Array(count);
      let start = 0;
      while (start < count) {
        const zStart = z0 + start * dz;
        let end = start + 1;
        const whole = (z: number) => limits(z).axis >= nyquist;
        while (end < count && (whole(z0 + end * dz) || z0 + end * dz <= CHUNK_RATIO * Math.max(zStart, dz))) end++;
        out.set(axialChunk(B, uncutSums, zStart, dz, end - start), start);
        start = end;
      }
      return out;
    },
    focalMap(xc, yc, z, step, size) {
      const { axis, radial2 } = limits(z);
      const half = (size - 1) / 2;
      // exp(i2π·fx·x_a) for every map column a, one flat table; likewise for the rows
      const ex = new Float64Array(2 * n * size);
      for (let a = 0; a < size; a++) ex.set(phasors(xc + (a - half) * step - centreX(0)), 2 * n * a);
      const ey = Array.from({ length: size }, (_, b) => phasors(yc + (b - half) * step - centreY(0)));
      // rows[jy][a] = Σ_jx A·H·exp(i2π fx x_a), then the map sums over jy
      const rows = new Float64Array(2 * n * size);
      const g = new Float64Array(2 * n);
      for (let j = 0; j < n; j++) {
        if (Math.abs(frequency[j]) >= axis) continue;
        g.fill(0);
        let any = false;
        for (let i = 0; i < n; i++) {
          const fx = frequency[i];
          const rest = radial2 - fx * fx - frequency[j] ** 2;
          if (Math.abs(fx) >= axis || rest <= 0) continue;
          const c = 2 * (j * n + i);
          const kz = 2 * Math.PI * Math.sqrt(rest);
          const hr = Math.cos(kz * z);
          const hi = Math.sin(kz * z);
          g[2 * i] = spectrum[c] * hr - spectrum[c + 1] * hi;
          g[2 * i + 1] = spectrum[c] * hi + spectrum[c + 1] * hr;
          any = true;
        }
        if (!any) continue;
        for (let a = 0; a < size; a++) {
          let re = 0;
          let im = 0;
          const base = 2 * n * a;
          for (let q = 0; q < 2 * n; q += 2) {
            const er = ex[base + q];
            const ei = ex[base + q + 1];
            re += g[q] * er - g[q + 1] * ei;
            im += g[q] * ei + g[q + 1] * er;
          }
          rows[2 * (j * size + a)] = re;
          rows[2 * (j * size + a) + 1] = im;
        }
      }
      const map = new Float64Array(size * size);
      const norm = 1 / cells;
      for (let b = 0; b < size; b++) {
        const e = ey[b];
        for (let a = 0; a < size; a++) {
          let re = 0;
          let im = 0;
          for (let j = 0; j < n; j++) {
            const o = 2 * (j * size + a);
            re += rows[o] * e[2 * j] - rows[o + 1] * e[2 * j + 1];
            im += rows[o] * e[2 * j + 1] + rows[o + 1] * e[2 * j];
          }
          map[b * size + a] = (re * re + im * im) * norm * norm;
        }
      }
      return map;
    },
    projectedPower(wave: IdealWave) {
      const k = (2 * Math.PI) / wavelength;
      const t = currentTransmission();
      const re = new Float64Array(pieces);
      const im = new Float64Array(pieces);
      for (let j = 0; j < n; j++) {
        const py = centreY(j);
        const dy = py - sourceAxis.y;
        const wy2 = (py - wave.y) ** 2 + wave.z * wave.z;
        for (let i = 0; i < n; i++) {
          const c = j * n + i;
          if (apertureCoverage[c] === 0) continue;
          const tr = t[2 * c];
          const ti = t[2 * c + 1];
          const px = centreX(i);
          let wr: number;
          let wi: number;
          if (illumination.kind === 'plane') {
            const phase = wave.phasePerLength * Math.sqrt((px - wave.x) ** 2 + wy2);
            wr = Math.cos(phase);
            wi = Math.sin(phase);
          } else {
            const dx = px - sourceAxis.x;
            waveWeight(wave, illumination, k, px, py, dx * dx + dy * dy, value);
            wr = value[0];
            wi = value[1];
          }
          const piece = pieceOf[c];
          re[piece] += tr * wr - ti * wi;
          im[piece] += tr * wi + ti * wr;
        }
      }
      let total = 0;
      const area2 = pitch ** 4;
      for (let piece = 0; piece < pieces; piece++) {
        if (pieceIncident[piece] > 0) total += ((re[piece] ** 2 + im[piece] ** 2) * area2) / (pieceIncident[piece] * incidentPower);
      }
      return total;
    },
    idealPeakIntensity(x, y, z) {
      const k = (2 * Math.PI) / wavelength;
      let amplitude = 0;
      for (let j = 0; j < n; j++) {
        const py = centreY(j);
        for (let i = 0; i < n; i++) {
          const ap = apertureCoverage[j * n + i];
          if (ap === 0) continue;
          const px = centreX(i);
          incidentField(illumination, k, (px - sourceAxis.x) ** 2 + (py - sourceAxis.y) ** 2, inc);
          amplitude += ap * Math.hypot(inc[0], inc[1]) * kernelMagnitude(k, px - x, py - y, z);
        }
      }
      amplitude *= pitch * pitch;
      return amplitude * amplitude;
    },
  };
}
