/** The manufacturability numbers the workspace shows, read from the geometry's report. Lengths in µm. */
import type { ManufacturabilityReport } from '../geometry';

export interface MaskFigures {
  zoneCount: number | null;
  polygonCount: number;
  vertexCount: number;
  /** the narrowest drawn zone or undrawn gap, and where it was measured */
  narrowest: { width: number; x: number; y: number } | null;
  minimumFeature: number;
  /** features narrower than the process minimum */
  belowMinimum: number;
  /** fraction of the aperture in the transmitting (or π-retarding) state */
  openAreaFraction: number;
  warnings: string[];
}

export function maskFigures(report: ManufacturabilityReport): MaskFigures {
  const candidates = [report.narrowestZone, report.smallestGap].filter((w): w is NonNullable<typeof w> => w !== null);
  const narrowest = candidates.reduce<(typeof candidates)[number] | null>((best, w) => (best === null || w.width_um < best.width_um ? w : best), null);
  return {
    zoneCount: report.zoneCount,
    polygonCount: report.polygonCount,
    vertexCount: report.vertexCount,
    narrowest: narrowest ? { width: narrowest.width_um, x: narrowest.x_um, y: narrowest.y_um } : null,
    minimumFeature: report.minimumFeature_um,
    belowMinimum: report.narrowFeatureCount,
    openAreaFraction: report.openAreaFraction,
    warnings: report.warnings.map((w) => w.message),
  };
}
