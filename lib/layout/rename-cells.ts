import type { LayoutCell, LayoutLibrary } from './types';

/**
 * The library's cells under new names (a suffix, the name cut so the result stays within 32 characters),
 * with placements following the renaming. Used to put several variant libraries into one file.
 */
export function renameCells(library: LayoutLibrary, suffix: string): { cells: LayoutCell[]; topCell: string } {
  const rename = (name: string) => `${name.slice(0, 32 - suffix.length)}${suffix}`;
  const cells = library.cells.map((cell) => ({
    ...cell,
    name: rename(cell.name),
    placements: cell.placements.map((p) => ({ ...p, cell: rename(p.cell) })),
  }));
  return { cells, topCell: rename(library.topCell) };
}
