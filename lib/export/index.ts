export { exportDesign, type ExportResult } from './export-design';
export { ExportError, formatDiagnostics } from './errors';
export { resolveExportOptions, type ExportOptions, type ExposureMatrixRequest } from './export-options';
export { ENGINE_VERSION } from './engine-version';
