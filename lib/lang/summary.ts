import type { CompiledDesign, Region } from '../design/types';

const um = (v: number): string => `${Number(v.toPrecision(6))} µm`;

function describeRegion(r: Region): string {
  switch (r.kind) {
    case 'circle':
      return `circle Ø ${um(2 * r.r)}`;
    case 'ring':
      return `ring ${um(2 * r.rInner)}–${um(2 * r.rOuter)} Ø`;
    case 'rectangle':
      return `rectangle ${um(Math.abs(r.x1 - r.x0))} × ${um(Math.abs(r.y1 - r.y0))}`;
    case 'polygon':
      return `polygon of ${r.points.length / 2} corners`;
    default:
      return `${r.kind} of ${r.parts.length} regions`;
  }
}

/** A one-line summary of a design: wavelength, aperture, foci, quantization. */
export function describeDesign(d: CompiledDesign): string {
  const q = d.quantization;
  const quantization =
    q.kind === 'binary'
      ? `binary ${q.modulation}, duty ${q.duty}, ${q.tone} tone`
      : `${2 ** q.bits} levels on ${q.bits} masks (n = ${q.refractiveIndex})`;
  const foci = d.foci.length === 0
    ? 'no point focus'
    : `${d.foci.length} ${d.foci.length === 1 ? 'focus' : 'foci'} ${d.foci.map((f) => `(${Number(f.x.toFixed(3))}, ${Number(f.y.toFixed(3))}, ${Number(f.z.toFixed(3))}) µm${d.foci.length > 1 ? ` w ${f.weight}` : ''}`).join(', ')}`;
  const pieces = d.pieces.length > 1 ? ` · ${d.pieces.length} multiplexed pieces` : '';
  return `λ ${Number((d.wavelength * 1000).toPrecision(6))} nm · aperture ${describeRegion(d.aperture)} · ${foci}${pieces} · ${quantization}`;
}
