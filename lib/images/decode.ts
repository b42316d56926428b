import { PNG } from 'pngjs';
import jpeg from 'jpeg-js';
import { MAX_IMAGE_PIXELS } from './limits';
import type { ImageType } from './sniff';

/** 8-bit RGBA pixels, row by row. */
export interface RgbaImage {
  width: number;
  height: number;
  data: Uint8Array;
}

/** Decodes a PNG or JPEG already recognised by `sniffImage`; throws with a plain message when the data is damaged. */
export function decodeImage(bytes: Uint8Array, type: ImageType): RgbaImage {
  try {
    if (type === 'png') {
      const png = PNG.sync.read(Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength));
      return { width: png.width, height: png.height, data: new Uint8Array(png.data.buffer, png.data.byteOffset, png.data.byteLength) };
    }
    const image = jpeg.decode(bytes, {
      useTArray: true,
      formatAsRGBA: true,
      maxResolutionInMP: MAX_IMAGE_PIXELS / 1e6,
      maxMemoryUsageInMB: 1024,
    });
    return { width: image.width, height: image.height, data: image.data };
  } catch {
    throw new Error(`The ${type === 'png' ? 'PNG' : 'JPEG'} image could not be decoded; the file may be damaged or use an unsupported variant.`);
  }
}
