import { describe, expect, it } from 'vitest';
import { PNG } from 'pngjs';
import jpeg from 'jpeg-js';
import { MAX_IMAGE_BYTES, checkImageUpload, downscale, makeThumbnail, sniffImage } from '@/lib/images';

function u32(n: number): number[] {
  return [(n >>> 24) & 255, (n >>> 16) & 255, (n >>> 8) & 255, n & 255];
}

// PNG signature and IHDR layout: W3C PNG specification, sections 5.2 and 11.2.2 (from memory).
function pngHeader(width: number, height: number): Uint8Array {
  return new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, ...u32(13), 0x49, 0x48, 0x44, 0x52, ...u32(width), ...u32(height), 8, 2, 0, 0, 0, 0, 0, 0, 0]);
}

// JPEG marker segments: ITU-T T.81 Annex B (SOI FFD8, APP0 FFE0, SOF2 FFC2 with Lf P Y X Nf), from memory.
function jpegHeader(width: number, height: number): Uint8Array {
  const app0 = [0xff, 0xe0, 0, 16, 0x4a, 0x46, 0x49, 0x46, 0, 1, 1, 0, 0, 1, 0, 1, 0, 0];
  const sof2 = [0xff, 0xff, 0xc2, 0, 17, 8, height >> 8, height & 255, width >> 8, width & 255, 3, 1, 0x22, 0, 2, 0x11, 1, 3, 0x11, 1];
  return new Uint8Array([0xff, 0xd8, ...app0, ...sof2]);
}

function solidRgba(width: number, height: number, rgba: [number, number, number, number]): Uint8Array {
  const data = new Uint8Array(width * height * 4);
  for (let i = 0; i < data.length; i += 4) data.set(rgba, i);
  return data;
}

describe('sniffImage', () => {
  it('reads PNG dimensions from a hand-built header', () => {
    expect(sniffImage(pngHeader(1920, 1080))).toEqual({ ok: true, type: 'png', mime: 'image/png', width: 1920, height: 1080 });
  });

  it('reads JPEG dimensions from a progressive frame header after an APP0 segment and a fill byte', () => {
    expect(sniffImage(jpegHeader(640, 480))).toEqual({ ok: true, type: 'jpeg', mime: 'image/jpeg', width: 640, height: 480 });
  });

  it('agrees with the pngjs and jpeg-js encoders on files they write', () => {
    const png = new PNG({ width: 37, height: 11 });
    png.data.fill(128);
    expect(sniffImage(new Uint8Array(PNG.sync.write(png)))).toMatchObject({ ok: true, type: 'png', width: 37, height: 11 });
    const jpg = jpeg.encode({ width: 53, height: 29, data: solidRgba(53, 29, [10, 20, 30, 255]) }, 90);
    expect(sniffImage(new Uint8Array(jpg.data))).toMatchObject({ ok: true, type: 'jpeg', width: 53, height: 29 });
  });

  it('refuses other types whatever the file is called, and says why', () => {
    const gif = new TextEncoder().encode('GIF89a\x01\x00\x01\x00');
    const result = sniffImage(gif);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.message).toMatch(/Only PNG and JPEG/);
    expect(sniffImage(new Uint8Array()).ok).toBe(false);
  });

  it('refuses a truncated JPEG and a PNG without IHDR', () => {
    expect(sniffImage(jpegHeader(640, 480).subarray(0, 24))).toMatchObject({ ok: false });
    const broken = pngHeader(10, 10);
    broken[12] = 0x58;
    expect(sniffImage(broken)).toMatchObject({ ok: false, message: expect.stringMatching(/IHDR/) });
  });
});

describe('checkImageUpload', () => {
  it('refuses files over 10 MB with the size in the message', () => {
    const big = new Uint8Array(MAX_IMAGE_BYTES + 1);
    big.set(pngHeader(100, 100));
    expect(checkImageUpload(big)).toEqual({ ok: false, message: 'The image is 10.0 MB; the limit is 10.0 MB.' });
    expect(checkImageUpload(big.subarray(0, MAX_IMAGE_BYTES)).ok).toBe(true);
  });

  it('refuses images with too many pixels to decode safely', () => {
    expect(checkImageUpload(pngHeader(20000, 20000))).toMatchObject({ ok: false, message: expect.stringMatching(/20000 × 20000/) });
  });
});

describe('thumbnails', () => {
  it('averages areas: a 2×2 black and white checkerboard becomes one mid-grey pixel', () => {
    const data = new Uint8Array([0, 0, 0, 255, 255, 255, 255, 255, 255, 255, 255, 255, 0, 0, 0, 255]);
    const out = downscale({ width: 2, height: 2, data }, 1);
    expect([...out.data]).toEqual([128, 128, 128, 255]); // mean 127.5 rounds up
  });

  it('shows transparency over the paper colour', () => {
    const out = downscale({ width: 1, height: 1, data: new Uint8Array([0, 0, 0, 0]) }, 8);
    expect([...out.data]).toEqual([0xf7, 0xf7, 0xf2, 255]);
  });

  it('shrinks a PNG and a JPEG to a JPEG whose longer side is the limit, keeping the colour', () => {
    const png = new PNG({ width: 800, height: 400 });
    png.data.set(solidRgba(800, 400, [40, 120, 200, 255]));
    const fromPng = makeThumbnail(new Uint8Array(PNG.sync.write(png)), 'png', 320);
    expect([fromPng.width, fromPng.height]).toEqual([320, 160]);
    const decoded = jpeg.decode(fromPng.bytes, { useTArray: true });
    expect([decoded.width, decoded.height]).toEqual([320, 160]);
    const [r, g, b] = decoded.data.subarray(0, 3);
    expect(Math.abs(r - 40) + Math.abs(g - 120) + Math.abs(b - 200)).toBeLessThan(12);

    const jpg = jpeg.encode({ width: 300, height: 900, data: solidRgba(300, 900, [200, 60, 20, 255]) }, 90);
    const fromJpeg = makeThumbnail(new Uint8Array(jpg.data), 'jpeg', 320);
    expect([fromJpeg.width, fromJpeg.height]).toEqual([107, 320]);
  });

  it('gives a plain message for an image that sniffs right but cannot be decoded', () => {
    expect(() => makeThumbnail(jpegHeader(640, 480), 'jpeg')).toThrow(/could not be decoded/);
  });
});
