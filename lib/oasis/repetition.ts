import type { ByteChunks } from '../layout/byte-chunks';
import type { LayoutPlacement } from '../layout/types';
import { writeGDelta, writeUnsigned } from './encoding';

/**
 * Writes the repetition of an arrayed placement (SEMI P39, repetition types); dimensions are stored as count − 2.
 * Type 1: columns × rows on positive x and y spacings; 2 / 3: one row / one column on a positive spacing;
 * 8: two arbitrary lattice vectors; 9: one arbitrary vector.
 */
export function writeArrayRepetition(out: ByteChunks, placement: LayoutPlacement): void {
  const columns = placement.columns ?? 1;
  const rows = placement.rows ?? 1;
  const column = placement.columnStep ?? { x: 0, y: 0 };
  const row = placement.rowStep ?? { x: 0, y: 0 };
  if (columns > 1 && rows > 1) {
    if (column.y === 0 && column.x > 0 && row.x === 0 && row.y > 0) {
      writeUnsigned(out, 1);
      writeUnsigned(out, columns - 2);
      writeUnsigned(out, rows - 2);
      writeUnsigned(out, column.x);
      writeUnsigned(out, row.y);
    } else {
      writeUnsigned(out, 8);
      writeUnsigned(out, columns - 2);
      writeUnsigned(out, rows - 2);
      writeGDelta(out, column.x, column.y);
      writeGDelta(out, row.x, row.y);
    }
    return;
  }
  const [count, step] = columns > 1 ? [columns, column] : [rows, row];
  if (step.y === 0 && step.x > 0) {
    writeUnsigned(out, 2);
    writeUnsigned(out, count - 2);
    writeUnsigned(out, step.x);
  } else if (step.x === 0 && step.y > 0) {
    writeUnsigned(out, 3);
    writeUnsigned(out, count - 2);
    writeUnsigned(out, step.y);
  } else {
    writeUnsigned(out, 9);
    writeUnsigned(out, count - 2);
    writeGDelta(out, step.x, step.y);
  }
}
