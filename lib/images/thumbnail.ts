import jpeg from 'jpeg-js';
import { decodeImage } from './decode';
import { downscale } from './downscale';
import { THUMBNAIL_SIDE } from './limits';
import type { ImageType } from './sniff';

export interface Thumbnail {
  mime: 'image/jpeg';
  width: number;
  height: number;
  bytes: Uint8Array;
}

/** A small JPEG preview of a PNG or JPEG image (longer side at most `maxSide` pixels). */
export function makeThumbnail(bytes: Uint8Array, type: ImageType, maxSide = THUMBNAIL_SIDE): Thumbnail {
  const small = downscale(decodeImage(bytes, type), maxSide);
  const encoded = jpeg.encode(small, 82);
  return { mime: 'image/jpeg', width: small.width, height: small.height, bytes: new Uint8Array(encoded.data) };
}
