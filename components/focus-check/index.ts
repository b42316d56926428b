export { FocusCheck, type FocusCheckProps } from './FocusCheck';
export { axialCsv, chromaticCsv, focalMapCsv } from './curves';
