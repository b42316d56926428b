export { svgChunks, writeSvg, type SvgOptions } from './write-svg';
export { cellBoundingBox, type Box } from './bounding-box';
