export { svgChunks, writeSvg, type SvgOptions } from './write-svg';
export { cellBoundingBox, type Box } from '../layout/bounding-box';
