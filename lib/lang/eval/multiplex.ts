import type { Region } from '../../design/types';
import type { Box } from './bounds';

/** Stripes and sectors beyond this count are refused: they would make the mask unreadable anyway. */
export const MAX_MULTIPLEX_CELLS = 20000;

export type MultiplexLayout =
  | { kind: 'stripes'; period: number; direction: number }
  | { kind: 'sectors'; count: number; cx: number; cy: number };

/**
 * The sub-aperture regions of spatial multiplexing, one per part, clipped to the aperture.
 * Cells are assigned to the parts in turn; neighbouring cells share exact edges, so the
 * pieces tile the aperture without overlapping.
 */
export function multiplexRegions(layout: MultiplexLayout, parts: number, aperture: Region, box: Box): Region[] | string {
  const cells: Float64Array[][] = Array.from({ length: parts }, () => []);
  if (layout.kind === 'stripes') {
    const c = Math.cos(layout.direction);
    const s = Math.sin(layout.direction);
    const corners = [
      [box.x0, box.y0],
      [box.x1, box.y0],
      [box.x0, box.y1],
      [box.x1, box.y1],
    ];
    // u runs across the stripes, v along them
    const us = corners.map(([x, y]) => x * c + y * s);
    const vs = corners.map(([x, y]) => -x * s + y * c);
    const first = Math.floor(Math.min(...us) / layout.period);
    const last = Math.ceil(Math.max(...us) / layout.period);
    if (last - first > MAX_MULTIPLEX_CELLS) return `the aperture holds ${last - first} stripes; at most ${MAX_MULTIPLEX_CELLS} are allowed`;
    const v0 = Math.min(...vs) - layout.period;
    const v1 = Math.max(...vs) + layout.period;
    for (let i = first; i < last; i++) {
      const u0 = i * layout.period;
      const u1 = (i + 1) * layout.period;
      const quad = [
        [u0, v0],
        [u1, v0],
        [u1, v1],
        [u0, v1],
      ].flatMap(([u, v]) => [u * c - v * s, u * s + v * c]);
      cells[((i % parts) + parts) % parts].push(Float64Array.from(quad));
    }
  } else {
    if (layout.count > MAX_MULTIPLEX_CELLS) return `at most ${MAX_MULTIPLEX_CELLS} sectors are allowed`;
    const { cx, cy, count } = layout;
    const reach = Math.max(...[box.x0, box.x1].flatMap((x) => [box.y0, box.y1].map((y) => Math.hypot(x - cx, y - cy)))) + 1;
    const width = (2 * Math.PI) / count;
    const steps = Math.max(1, Math.ceil(width / (Math.PI / 8)));
    // chords at this radius stay outside the circle of radius `reach`
    const radius = reach / Math.cos(width / steps / 2);
    for (let k = 0; k < count; k++) {
      const points = [cx, cy];
      for (let j = 0; j <= steps; j++) {
        const a = (k + j / steps) * width;
        points.push(cx + radius * Math.cos(a), cy + radius * Math.sin(a));
      }
      cells[k % parts].push(Float64Array.from(points));
    }
  }
  return cells.map((polygons) => {
    const shapes: Region[] = polygons.map((points) => ({ kind: 'polygon', points }));
    return { kind: 'intersection', parts: [aperture, shapes.length === 1 ? shapes[0] : { kind: 'union', parts: shapes }] };
  });
}
