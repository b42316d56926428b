import type { MaskModel } from './mask-model';
import { rayIntervals } from './ray-intervals';
import { regionRadialIntervals } from './region';

/**
 * A rotationally symmetric mask as read off its polygons: annular segments inner[i]..outer[i] inside
 * the aperture, each with the drawn state of every layer (drawn[i·layers + k] is 0 or 1).
 */
export interface RadialMask {
  inner: Float64Array;
  outer: Float64Array;
  drawn: Uint8Array;
  layers: number;
  /** how many of the rays agreed on the sequence of transitions */
  agreeingRays: number;
  rays: number;
}

const RAY_COUNT = 12;
/** Transitions closer than this (µm) along a ray are one transition. */
const SNAP_UM = 0.005;

/**
 * Reads the radial transitions along several rays from the symmetry centre and averages their radii,
 * so chords of polygonised circles count at their mean radius. Returns null when the aperture is not
 * made of circles and rings about the centre (then the 2-D method applies).
 */
export function readRadialMask(mask: MaskModel, cx: number, cy: number): RadialMask | null {
  const regionIntervals = mask.aperturePolygons ? null : regionRadialIntervals(mask.apertureRegion, cx, cy, 1e-6);
  if (!mask.aperturePolygons && !regionIntervals) return null;
  const profiles: Array<{ signature: string; edges: number[]; states: number[][] }> = [];
  for (let r = 0; r < RAY_COUNT; r++) {
    // irrational-looking angles keep rays off polygon vertices and keyhole cuts
    const angle = ((r + 0.3819660113) * 2 * Math.PI) / RAY_COUNT;
    const aperture = mask.aperturePolygons ? rayIntervals(mask.aperturePolygons, cx, cy, angle) : (regionIntervals as number[]);
    const layerIntervals = mask.layers.map((layer) => rayIntervals(layer.polygons, cx, cy, angle));
    profiles.push(segmentRay(aperture, layerIntervals));
  }
  const groups = new Map<string, typeof profiles>();
  for (const p of profiles) groups.set(p.signature, [...(groups.get(p.signature) ?? []), p]);
  const best = [...groups.values()].sort((a, b) => b.length - a.length)[0];
  const segments = best[0].states.length;
  const layers = mask.layers.length;
  const inner = new Float64Array(segments);
  const outer = new Float64Array(segments);
  const drawn = new Uint8Array(segments * layers);
  for (let i = 0; i < segments; i++) {
    for (const p of best) {
      inner[i] += p.edges[2 * i] / best.length;
      outer[i] += p.edges[2 * i + 1] / best.length;
    }
    for (let k = 0; k < layers; k++) drawn[i * layers + k] = best[0].states[i][k];
  }
  return { inner, outer, drawn, layers, agreeingRays: best.length, rays: RAY_COUNT };
}

/** Splits one ray into segments of constant layer states inside the aperture. */
function segmentRay(aperture: number[], layerIntervals: number[][]): { signature: string; edges: number[]; states: number[][] } {
  const all = [...aperture, ...layerIntervals.flat()].sort((a, b) => a - b);
  // edges of different layers meant to coincide differ by chords and rounding: read them as one
  const sorted: number[] = [];
  for (const v of all) {
    if (sorted.length > 0 && v - sorted[sorted.length - 1] < SNAP_UM) continue;
    sorted.push(v);
  }
  const edges: number[] = [];
  const states: number[][] = [];
  const inAperture = monotoneMembership(aperture);
  const inLayers = layerIntervals.map(monotoneMembership);
  for (let i = 0; i + 1 < sorted.length; i++) {
    const a = sorted[i];
    const b = sorted[i + 1];
    const mid = 0.5 * (a + b);
    if (!inAperture(mid)) continue;
    const state = inLayers.map((inLayer) => (inLayer(mid) ? 1 : 0));
    const last = states.length - 1;
    if (last >= 0 && edges[2 * last + 1] === a && state.every((s, k) => s === states[last][k])) {
      edges[2 * last + 1] = b;
    } else {
      edges.push(a, b);
      states.push(state);
    }
  }
  const signature = states.map((s) => s.join('')).join(',') + '|' + gapsSignature(edges);
  return { signature, edges, states };
}

/** Which segments touch their neighbour, so rays with the same states but different gaps do not mix. */
function gapsSignature(edges: number[]): string {
  let s = '';
  for (let i = 1; i + 1 < edges.length; i += 2) s += edges[i] === edges[i + 1] ? '-' : '_';
  return s;
}

/** Membership in sorted intervals for queries that only increase (one pass over the list). */
function monotoneMembership(list: number[]): (x: number) => boolean {
  let i = 0;
  return (x) => {
    while (i < list.length && list[i + 1] < x) i += 2;
    return i < list.length && x >= list[i];
  };
}
