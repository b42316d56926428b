/**
 * Hand-built designs and layouts for the optics tests: concentric zone plates whose zone radii come from
 * the published zone-plate formula r_n² = nλf + (nλ/2)² (the radius where the path to the focus is
 * n·λ/2 longer than f; e.g. Attwood, Soft X-Rays and Extreme Ultraviolet Radiation, ch. 9), drawn as
 * half-annulus polygons on a 1 nm database unit, so the optics reads real polygons as it would from the
 * geometry engine.
 */
import type { CompiledDesign, PhaseField, Quantization, Region } from '@/lib/design/types';
import type { LayerInfo, LayoutLibrary } from '@/lib/layout/types';

export const DBU = 1e-9;

/** Ideal lens phase −k(√(r² + f²) − f) about (cx, cy), the language's convention for a converging lens. */
export function lensField(wavelength: number, focal: number, cx = 0, cy = 0): PhaseField {
  const k = (2 * Math.PI) / wavelength;
  const phase = (x: number, y: number) => -k * (Math.sqrt((x - cx) ** 2 + (y - cy) ** 2 + focal * focal) - focal);
  return {
    phase,
    field(x, y, out) {
      out[0] = Math.cos(phase(x, y));
      out[1] = Math.sin(phase(x, y));
    },
    fieldRow(y, xs, re, im) {
      for (let i = 0; i < xs.length; i++) {
        re[i] = Math.cos(phase(xs[i], y));
        im[i] = Math.sin(phase(xs[i], y));
      }
    },
    maxSpatialFrequency(x0, y0, x1, y1) {
      const far = Math.max(...[x0, x1].flatMap((x) => [y0, y1].map((y) => Math.hypot(x - cx, y - cy))));
      return far / (wavelength * Math.hypot(far, focal));
    },
  };
}

export function lensDesign(options: { wavelength: number; focal: number; radius: number; quantization: Quantization; centre?: [number, number]; symmetric?: boolean }): CompiledDesign {
  const [cx, cy] = options.centre ?? [0, 0];
  const aperture: Region = { kind: 'circle', cx: 0, cy: 0, r: options.radius };
  const symmetric = options.symmetric ?? (cx === 0 && cy === 0);
  return {
    wavelength: options.wavelength,
    aperture,
    pieces: [{ region: null, field: lensField(options.wavelength, options.focal, cx, cy) }],
    quantization: options.quantization,
    foci: [{ x: cx, y: cy, z: options.focal, weight: 1 }],
    symmetryCentre: symmetric ? { x: 0, y: 0 } : null,
    labels: [],
  };
}

export const binaryAmplitude: Quantization = { kind: 'binary', duty: 0.5, phaseOffset: Math.PI / 2, modulation: 'amplitude', tone: 'positive', refractiveIndex: 1.5 };
export const binaryPhase: Quantization = { kind: 'binary', duty: 0.5, phaseOffset: Math.PI / 2, modulation: 'phase', tone: 'positive', refractiveIndex: 1.5 };
export const multilevel = (bits: number): Quantization => ({ kind: 'multilevel', bits, phaseOffset: 0, refractiveIndex: 1.5 });

/** Radius where the path to the focus is `path` longer than f: r² = (f + path)² − f². */
export function radiusAtPath(focal: number, path: number): number {
  return Math.sqrt((focal + path) ** 2 - focal * focal);
}

/** Published zone radii r_n² = nλf + (nλ/2)², n = 1, 2, … while r_n < radius. */
export function zoneRadii(wavelength: number, focal: number, radius: number): number[] {
  const out: number[] = [];
  for (let n = 1; ; n++) {
    const r = Math.sqrt(n * wavelength * focal + (n * wavelength / 2) ** 2);
    if (r >= radius) return out;
    out.push(r);
  }
}

/**
 * Binary zone plate rings: odd Fresnel zones (r_{2j+1} .. r_{2j+2}) drawn, i.e. the ring between the
 * first and second zone radius and so on, clipped to the aperture radius. With `duty` ≠ 0.5 each drawn
 * zone keeps that fraction of its period in r² (the variable in which a zone plate is periodic).
 */
export function binaryRings(wavelength: number, focal: number, radius: number, duty = 0.5): Array<[number, number]> {
  const rings: Array<[number, number]> = [];
  for (let j = 0; ; j++) {
    // in u = path difference, one period is λ; the drawn part starts at λ/2 + (0.5 − duty)·λ/2 ... centred on 3λ/4
    const centre = j * wavelength + 0.75 * wavelength;
    const a = radiusAtPath(focal, centre - (duty * wavelength) / 2);
    const b = radiusAtPath(focal, centre + (duty * wavelength) / 2);
    if (a >= radius) return rings;
    rings.push([a, Math.min(b, radius)]);
  }
}

/**
 * The bit masks of a 2^bits-level lens: level L = floor(mod(φ, 2π)/(2π/2^bits)) with φ = −k(R − f);
 * mask k (1-based) drawn where bit (bits − k) of L is set. Returns rings per mask.
 */
export function multilevelRings(wavelength: number, focal: number, radius: number, bits: number): Array<Array<[number, number]>> {
  const levels = 2 ** bits;
  const masks: Array<Array<[number, number]>> = Array.from({ length: bits }, () => []);
  for (let j = 0; ; j++) {
    const a = radiusAtPath(focal, (j * wavelength) / levels);
    if (a >= radius) return masks;
    const b = Math.min(radius, radiusAtPath(focal, ((j + 1) * wavelength) / levels));
    // φ just past path j·λ/levels is −2π(j + ε)/levels, so mod(φ, 2π) falls in level levels − 1 − (j mod levels)
    const level = levels - 1 - (j % levels);
    for (let k = 1; k <= bits; k++) if ((level >> (bits - k)) & 1) masks[k - 1].push([a, b]);
  }
}

/** Chord count for a circle of radius r at 2 nm sagitta, at least 64. */
function chordCount(r: number): number {
  return Math.max(64, Math.ceil(Math.PI / Math.acos(1 - 0.002 / r)));
}

/** An annulus as two half-annulus polygons (upper and lower), in DBU, vertices on the circles. */
export function halfAnnuli(rInner: number, rOuter: number, cx = 0, cy = 0): Int32Array[] {
  const halves: Int32Array[] = [];
  for (const start of [0, Math.PI]) {
    const outer = chordCount(rOuter);
    const inner = rInner > 0 ? chordCount(rInner) : 0;
    const pts: number[] = [];
    for (let i = 0; i <= outer / 2; i++) {
      const a = start + (Math.PI * i) / (outer / 2);
      pts.push(cx + rOuter * Math.cos(a), cy + rOuter * Math.sin(a));
    }
    if (inner > 0) {
      for (let i = inner / 2; i >= 0; i--) {
        const a = start + (Math.PI * i) / (inner / 2);
        pts.push(cx + rInner * Math.cos(a), cy + rInner * Math.sin(a));
      }
    } else pts.push(cx, cy);
    halves.push(Int32Array.from(pts, (v) => Math.round(v / (DBU / 1e-6))));
  }
  return halves;
}

/** A library with one layer per ring set: binary layouts pass one set ('zones'), multi-level ones `bits` sets ('level'). */
export function ringLibrary(sets: Array<Array<[number, number]>>, purpose: 'zones' | 'level', centre: [number, number] = [0, 0]): LayoutLibrary {
  const layers: LayerInfo[] = sets.map((_, i) => ({ layer: i + 1, datatype: 0, name: purpose === 'zones' ? 'zones' : `level${i + 1}`, purpose, ...(purpose === 'level' ? { levelIndex: i + 1 } : {}) }));
  return {
    name: 'TEST',
    databaseUnit: DBU,
    userUnit: 1e-6,
    layers,
    cells: [{ name: 'TOP', shapes: sets.map((rings, i) => ({ layer: i + 1, datatype: 0, polygons: rings.flatMap(([a, b]) => halfAnnuli(a, b, centre[0], centre[1])) })), texts: [], placements: [] }],
    topCell: 'TOP',
  };
}
