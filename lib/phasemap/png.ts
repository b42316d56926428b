import { PNG } from 'pngjs';
import { PHASE_MAP_LIMITS } from './limits';
import type { PhaseMapPlacement, PhaseMapResult } from './placement';
import { placeGrid } from './placement';

export interface PngPhaseOptions extends PhaseMapPlacement {
  /** phase in radians of a full-scale step: gray value g maps to g / 65536 · phaseRange (2π by default) */
  phaseRange?: number;
}

const SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];

/**
 * Parses a 16-bit grayscale PNG as a phase map. The header is checked before anything is
 * decompressed, so a huge or wrong-format image is refused cheaply.
 */
export function parsePhasePng(bytes: Uint8Array, options: PngPhaseOptions): PhaseMapResult {
  if (bytes.length > PHASE_MAP_LIMITS.maxFileBytes) return { ok: false, error: `the file is larger than ${PHASE_MAP_LIMITS.maxFileBytes / 1024 / 1024} MB` };
  if (bytes.length < 33 || SIGNATURE.some((b, i) => bytes[i] !== b)) return { ok: false, error: 'the file is not a PNG image' };
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const width = view.getUint32(16);
  const height = view.getUint32(20);
  const depth = bytes[24];
  const colorType = bytes[25];
  if (colorType !== 0 || depth !== 16) {
    const kind = colorType === 0 ? `${depth}-bit grayscale` : colorType === 3 ? 'palette' : colorType === 4 ? 'grayscale with alpha' : 'colour';
    return { ok: false, error: `the PNG is ${kind}; a phase map must be 16-bit grayscale without alpha` };
  }
  if (width * height > PHASE_MAP_LIMITS.maxSamples || width > PHASE_MAP_LIMITS.maxColumns || height > PHASE_MAP_LIMITS.maxRows) {
    return { ok: false, error: `the image is ${width} × ${height} pixels; at most ${PHASE_MAP_LIMITS.maxColumns} × ${PHASE_MAP_LIMITS.maxRows} are allowed` };
  }
  const range = options.phaseRange ?? 2 * Math.PI;
  if (!(Number.isFinite(range) && range > 0)) return { ok: false, error: 'the phase range must be a positive number of radians' };
  let data: Uint16Array;
  try {
    // skipRescale keeps the 16-bit samples; pngjs expands them to four channels per pixel
    data = (PNG.sync.read(Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength), { skipRescale: true } as Parameters<typeof PNG.sync.read>[1]) as unknown as { data: Uint16Array }).data;
  } catch (error) {
    return { ok: false, error: `the PNG could not be decoded (${error instanceof Error ? error.message : 'damaged file'})` };
  }
  if (!(data instanceof Uint16Array) || data.length < width * height * 4) return { ok: false, error: 'the PNG could not be decoded as 16-bit samples' };
  const scale = range / 65536;
  return placeGrid(width, height, (i, fileRow) => data[(fileRow * width + i) * 4] * scale, options);
}
