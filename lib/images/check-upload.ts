import { MAX_IMAGE_BYTES, MAX_IMAGE_PIXELS } from './limits';
import { sniffImage, type SniffResult } from './sniff';

function megabytes(bytes: number): string {
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}

/** Checks an uploaded image: PNG or JPEG by content, at most 10 MB, and a pixel count we can decode safely. */
export function checkImageUpload(bytes: Uint8Array, maxBytes = MAX_IMAGE_BYTES): SniffResult {
  if (bytes.length > maxBytes) {
    return { ok: false, message: `The image is ${megabytes(bytes.length)}; the limit is ${megabytes(maxBytes)}.` };
  }
  const header = sniffImage(bytes);
  if (header.ok && header.width * header.height > MAX_IMAGE_PIXELS) {
    return {
      ok: false,
      message: `The image is ${header.width} × ${header.height} pixels; at most ${MAX_IMAGE_PIXELS / 1e6} million pixels are accepted.`,
    };
  }
  return header;
}
