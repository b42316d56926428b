import type { ManufacturabilityReport, MeasuredWidth } from '../geometry';
import type { LayoutLibrary } from '../layout/types';

/** The manufacturability report in short lines with units, for the CLI, the job log and README.txt. */
export function reportLines(report: ManufacturabilityReport, library: LayoutLibrary, storedVertices: number): string[] {
  const lines = [
    `zones on the measuring ray: ${report.zoneCount}`,
    `outermost zone: ${width(report.outermostZone)}`,
    `narrowest zone: ${width(report.narrowestZone)}`,
    `smallest gap: ${width(report.smallestGap)}`,
    ...report.numericalApertures.map((f) => `focus ${f.focus + 1} at (${f.x_um}, ${f.y_um}, ${f.z_um}) µm: NA ${f.numericalAperture.toFixed(4)}`),
    `open area: ${(report.openAreaFraction * 100).toFixed(2)} % of ${report.apertureArea_um2.toFixed(0)} µm²`,
    `mask geometry: ${report.polygonCount.toLocaleString('en')} polygons, ${report.vertexCount.toLocaleString('en')} vertices, largest ${report.largestPolygonVertices} points`,
    `in the files (labels and matrix included): ${storedVertices.toLocaleString('en')} vertices in ${library.cells.length} cell${library.cells.length === 1 ? '' : 's'}`,
    `features under the ${report.minimumFeature_um} µm minimum: ${report.narrowFeatureCount}`,
    report.sliverWidth_um > 0
      ? `slivers removed (narrower on average than ${report.sliverWidth_um} µm): ${report.sliverCount}, ${report.sliverArea_um2.toPrecision(3)} µm² in all`
      : 'slivers: none removed (sliver width 0)',
  ];
  for (const warning of report.warnings.slice(0, 10)) lines.push(`warning: ${warning.message}`);
  if (report.warnings.length > 10) lines.push(`… and ${report.warnings.length - 10} more warnings in manifest.json`);
  return lines;
}

function width(measured: MeasuredWidth | null): string {
  if (!measured) return 'none';
  return `${measured.width_um.toFixed(3)} µm at (${measured.x_um.toFixed(1)}, ${measured.y_um.toFixed(1)}) µm`;
}
