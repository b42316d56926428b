/**
 * A layout library as the writers (GDSII, OASIS, SVG) take it and the geometry engine produces it.
 * All coordinates are integers in database units (DBU).
 */

/** A closed polygon as flat x,y pairs in DBU; the first point is not repeated at the end. */
export type LayoutPolygon = Int32Array;

/** What a layer carries, so readers of the bundle (and the optical check) know its meaning. */
export type LayerPurpose = 'zones' | 'level' | 'label' | 'aperture' | 'marker';

export interface LayerInfo {
  layer: number;
  datatype: number;
  name: string;
  purpose: LayerPurpose;
  /** for purpose 'level': mask index k (1-based) of a multi-level design */
  levelIndex?: number;
}

export interface LayerShapes {
  layer: number;
  datatype: number;
  polygons: LayoutPolygon[];
}

/** An annotation (GDSII TEXT); not geometry. */
export interface LayoutText {
  layer: number;
  texttype: number;
  x: number;
  y: number;
  text: string;
}

/**
 * A reference to another cell, optionally arrayed. With columns/rows > 1 it is an array:
 * instance (i, j) sits at (x + i·columnStep.x + j·rowStep.x, y + i·columnStep.y + j·rowStep.y).
 */
export interface LayoutPlacement {
  cell: string;
  x: number;
  y: number;
  /** counter-clockwise, degrees; multiples of 90 only */
  rotation?: number;
  mirrorX?: boolean;
  columns?: number;
  rows?: number;
  columnStep?: { x: number; y: number };
  rowStep?: { x: number; y: number };
}

export interface LayoutCell {
  name: string;
  shapes: LayerShapes[];
  texts: LayoutText[];
  placements: LayoutPlacement[];
}

export interface LayoutLibrary {
  name: string;
  /** size of one database unit in metres, e.g. 1e-9 */
  databaseUnit: number;
  /** size of one user unit in metres, e.g. 1e-6 */
  userUnit: number;
  layers: LayerInfo[];
  cells: LayoutCell[];
  /** name of the cell that holds the whole mask */
  topCell: string;
}
