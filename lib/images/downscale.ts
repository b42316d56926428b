import type { RgbaImage } from './decode';

/** Where the image is transparent it is shown over the page's paper colour (#f7f7f2). */
const BACKDROP = [0xf7, 0xf7, 0xf2] as const;

/**
 * Shrinks an image so its longer side is at most `maxSide`, by area averaging (each output pixel
 * is the mean of the source pixels it covers, weighted by overlap), flattening alpha onto the
 * paper colour. Images already small enough are only flattened. Output alpha is opaque.
 */
export function downscale(image: RgbaImage, maxSide: number): RgbaImage {
  const scale = Math.min(1, maxSide / Math.max(image.width, image.height));
  const width = Math.max(1, Math.round(image.width * scale));
  const height = Math.max(1, Math.round(image.height * scale));
  const sx = image.width / width;
  const sy = image.height / height;
  const out = new Uint8Array(width * height * 4);
  const sum = new Float64Array(3);
  for (let oy = 0; oy < height; oy++) {
    const y0 = oy * sy;
    const y1 = y0 + sy;
    for (let ox = 0; ox < width; ox++) {
      const x0 = ox * sx;
      const x1 = x0 + sx;
      sum.fill(0);
      let area = 0;
      for (let y = Math.floor(y0); y < Math.min(image.height, Math.ceil(y1)); y++) {
        const wy = Math.min(y + 1, y1) - Math.max(y, y0);
        for (let x = Math.floor(x0); x < Math.min(image.width, Math.ceil(x1)); x++) {
          const w = wy * (Math.min(x + 1, x1) - Math.max(x, x0));
          const i = (y * image.width + x) * 4;
          const alpha = image.data[i + 3] / 255;
          for (let c = 0; c < 3; c++) sum[c] += w * (alpha * image.data[i + c] + (1 - alpha) * BACKDROP[c]);
          area += w;
        }
      }
      const o = (oy * width + ox) * 4;
      for (let c = 0; c < 3; c++) out[o + c] = Math.round(sum[c] / area);
      out[o + 3] = 255;
    }
  }
  return { width, height, data: out };
}
