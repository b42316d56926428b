import FFT from 'fft.js';

/**
 * In-place 2-D discrete Fourier transform of an n×n complex array stored interleaved
 * (re, im per sample, row-major), by 1-D transforms of rows then columns with fft.js.
 * The inverse divides by n² (fft.js divides each 1-D inverse by n).
 */
export function fft2d(data: Float64Array, n: number, inverse: boolean): void {
  const fft = new FFT(n);
  const line = new Float64Array(2 * n);
  const result = new Float64Array(2 * n);
  const run = inverse ? (out: Float64Array, input: Float64Array) => fft.inverseTransform(out, input) : (out: Float64Array, input: Float64Array) => fft.transform(out, input);
  for (let row = 0; row < n; row++) {
    const base = 2 * row * n;
    line.set(data.subarray(base, base + 2 * n));
    run(result, line);
    data.set(result, base);
  }
  for (let col = 0; col < n; col++) {
    for (let row = 0; row < n; row++) {
      const i = 2 * (row * n + col);
      line[2 * row] = data[i];
      line[2 * row + 1] = data[i + 1];
    }
    run(result, line);
    for (let row = 0; row < n; row++) {
      const i = 2 * (row * n + col);
      data[i] = result[2 * row];
      data[i + 1] = result[2 * row + 1];
    }
  }
}
