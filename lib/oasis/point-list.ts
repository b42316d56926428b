import type { ByteChunks } from '../layout/byte-chunks';
import { writeGDelta, writeSigned, writeUnsigned } from './encoding';

/**
 * Writes a polygon's point list (SEMI P39, point-list types): the record's x, y hold the first vertex
 * and the list holds the steps to the others; the closing edge is implied.
 * A Manhattan polygon whose edges alternate horizontal and vertical uses type 0 (horizontal first) or
 * type 1 (vertical first): one signed integer per step, and the last two steps are implied.
 * Any other polygon uses type 4: one g-delta per step.
 */
export function writePolygonPointList(out: ByteChunks, polygon: ArrayLike<number>): void {
  const count = polygon.length / 2;
  const firstHorizontal = alternatingManhattanStart(polygon);
  if (firstHorizontal !== null) {
    writeUnsigned(out, firstHorizontal ? 0 : 1);
    writeUnsigned(out, count - 2);
    let horizontal = firstHorizontal;
    for (let i = 1; i < count - 1; i++) {
      writeSigned(out, horizontal ? polygon[2 * i] - polygon[2 * i - 2] : polygon[2 * i + 1] - polygon[2 * i - 1]);
      horizontal = !horizontal;
    }
    return;
  }
  writeUnsigned(out, 4);
  writeUnsigned(out, count - 1);
  for (let i = 1; i < count; i++) writeGDelta(out, polygon[2 * i] - polygon[2 * i - 2], polygon[2 * i + 1] - polygon[2 * i - 1]);
}

/** true / false when every edge (closing edge included) is axis-parallel, non-zero and alternating, starting horizontal / vertical; else null. */
function alternatingManhattanStart(polygon: ArrayLike<number>): boolean | null {
  const count = polygon.length / 2;
  if (count % 2 !== 0 || count < 4) return null;
  let firstHorizontal: boolean | null = null;
  for (let i = 0; i < count; i++) {
    const j = (i + 1) % count;
    const dx = polygon[2 * j] - polygon[2 * i];
    const dy = polygon[2 * j + 1] - polygon[2 * i + 1];
    const horizontal = dy === 0 && dx !== 0;
    const vertical = dx === 0 && dy !== 0;
    if (!horizontal && !vertical) return null;
    if (i === 0) firstHorizontal = horizontal;
    else if (horizontal !== (i % 2 === 0 ? firstHorizontal : !firstHorizontal)) return null;
  }
  return firstHorizontal;
}
