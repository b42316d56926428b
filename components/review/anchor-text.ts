import type { CommentAnchor } from '@/lib/schemas/comments';

const um = (value: number) => `${Number(value.toPrecision(6))} µm`;

/** How an anchor reads on a comment: "line 4" or "x 12.5 µm, y −30 µm". */
export function anchorText(anchor: CommentAnchor): string {
  if ('line' in anchor) return `line ${anchor.line}`;
  return `x ${um(anchor.x_um)}, y ${um(anchor.y_um)}`.replace(/-/g, '−');
}
