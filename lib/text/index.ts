export { loadLabelFont, textPolygons, textWidth, type TextPlacement, type TextGeometryOptions } from './text-polygons';
export { holeFreePolygons } from './hole-free';
export { flattenOutline } from './flatten-path';
