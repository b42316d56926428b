import type { LayoutLibrary } from '../layout/types';

/** Vertices stored in the library (each cell once, as the files store them). */
export function countVertices(library: LayoutLibrary): { polygons: number; vertices: number } {
  let polygons = 0;
  let vertices = 0;
  for (const cell of library.cells) {
    for (const shapes of cell.shapes) {
      polygons += shapes.polygons.length;
      for (const polygon of shapes.polygons) vertices += polygon.length / 2;
    }
  }
  return { polygons, vertices };
}
