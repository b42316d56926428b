/**
 * Recognises PNG and JPEG files from their content bytes (never the name) and reads their
 * pixel dimensions from the header, without decoding the image.
 */

export type ImageType = 'png' | 'jpeg';

export interface ImageHeader {
  type: ImageType;
  mime: 'image/png' | 'image/jpeg';
  width: number;
  height: number;
}

export type SniffResult = ({ ok: true } & ImageHeader) | { ok: false; message: string };

const PNG_SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];

function readU32(bytes: Uint8Array, at: number): number {
  return ((bytes[at] << 24) | (bytes[at + 1] << 16) | (bytes[at + 2] << 8) | bytes[at + 3]) >>> 0;
}

function readU16(bytes: Uint8Array, at: number): number {
  return (bytes[at] << 8) | bytes[at + 1];
}

function startsWith(bytes: Uint8Array, prefix: readonly number[]): boolean {
  return bytes.length >= prefix.length && prefix.every((b, i) => bytes[i] === b);
}

// PNG: the signature, then the IHDR chunk first, holding width and height as 4-byte big-endian.
function sniffPng(bytes: Uint8Array): SniffResult {
  const ihdr = bytes.length >= 24 && readU32(bytes, 8) === 13 && String.fromCharCode(...bytes.subarray(12, 16)) === 'IHDR';
  if (!ihdr) return { ok: false, message: 'The file starts like a PNG but its header (IHDR) is missing or damaged.' };
  const width = readU32(bytes, 16);
  const height = readU32(bytes, 20);
  if (width === 0 || height === 0) return { ok: false, message: 'The PNG header gives a zero width or height.' };
  return { ok: true, type: 'png', mime: 'image/png', width, height };
}

// Markers that carry no length field (ITU-T T.81, table B.1): TEM and RST0..RST7.
function isStandalone(marker: number): boolean {
  return marker === 0x01 || (marker >= 0xd0 && marker <= 0xd7);
}

// Start-of-frame markers SOF0..SOF15, except DHT (C4), JPG (C8) and DAC (CC) which share the range.
function isStartOfFrame(marker: number): boolean {
  return marker >= 0xc0 && marker <= 0xcf && marker !== 0xc4 && marker !== 0xc8 && marker !== 0xcc;
}

// JPEG: SOI, then marker segments until a frame header, whose fields are Lf(2) P(1) Y(2) X(2).
function sniffJpeg(bytes: Uint8Array): SniffResult {
  const damaged = { ok: false, message: 'The file starts like a JPEG but its frame header could not be found; it may be truncated or damaged.' } as const;
  let at = 2;
  while (at < bytes.length) {
    if (bytes[at] !== 0xff) return damaged;
    while (at < bytes.length && bytes[at] === 0xff) at++; // fill bytes
    if (at >= bytes.length) return damaged;
    const marker = bytes[at++];
    if (isStandalone(marker)) continue;
    if (marker === 0xd9 || marker === 0xda) return damaged; // end of image or scan data before any frame header
    if (at + 2 > bytes.length) return damaged;
    const length = readU16(bytes, at);
    if (length < 2) return damaged;
    if (isStartOfFrame(marker)) {
      if (at + 7 > bytes.length) return damaged;
      const height = readU16(bytes, at + 3);
      const width = readU16(bytes, at + 5);
      if (width === 0 || height === 0) {
        return { ok: false, message: 'The JPEG gives a zero width or height (height set later by a DNL marker is not supported).' };
      }
      return { ok: true, type: 'jpeg', mime: 'image/jpeg', width, height };
    }
    at += length;
  }
  return damaged;
}

export function sniffImage(bytes: Uint8Array): SniffResult {
  if (bytes.length === 0) return { ok: false, message: 'The file is empty.' };
  if (startsWith(bytes, PNG_SIGNATURE)) return sniffPng(bytes);
  if (startsWith(bytes, [0xff, 0xd8, 0xff])) return sniffJpeg(bytes);
  return { ok: false, message: 'Only PNG and JPEG images are accepted; this file is neither (its type is read from its content, not its name).' };
}
