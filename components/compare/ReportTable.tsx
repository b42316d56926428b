import { diffParameters, type ParameterRow } from '@/lib/workflow/parameter-diff';
import { ChangeTable } from './ChangeTable';

export interface ReportSide {
  zoneCount: number | null;
  /** µm */
  narrowestFeature: number | null;
  bundleBytes: number | null;
  /** the stored export report ({ mask: ManufacturabilityReport, ... }) */
  report: Record<string, unknown> | null;
}

function maskReport(report: Record<string, unknown> | null): Record<string, unknown> {
  const mask = report?.mask;
  return typeof mask === 'object' && mask !== null && !Array.isArray(mask) ? (mask as Record<string, unknown>) : {};
}

// Lists of places (narrow features, per-zone rows) would bury the figures; they are compared by count.
const LONG_LIST = 8;

function figures(mask: Record<string, unknown>): Record<string, unknown> {
  return Object.fromEntries(
    Object.entries(mask).map(([key, value]) => (Array.isArray(value) && value.length > LONG_LIST ? [`${key} (count)`, value.length] : [key, value])),
  );
}

function warningCount(report: Record<string, unknown> | null): number {
  const warnings = maskReport(report).warnings;
  return Array.isArray(warnings) ? warnings.length : 0;
}

/** Manufacturability numbers of A and B side by side: the headline figures with units, then the whole report. */
export function ReportTable({ a, b, labelA, labelB }: { a: ReportSide; b: ReportSide; labelA: string; labelB: string }) {
  const headline = (s: ReportSide) => ({
    'zones': s.zoneCount,
    'narrowest feature (µm)': s.narrowestFeature,
    'manufacturability warnings': warningCount(s.report),
    'bundle size (bytes)': s.bundleBytes,
  });
  const rows: ParameterRow[] = [
    ...diffParameters(headline(a), headline(b)),
    ...diffParameters(figures(maskReport(a.report)), figures(maskReport(b.report)), { ignore: ['warnings'] }).map((r) => ({ ...r, path: `report.${r.path}` })),
  ];
  return <ChangeTable rows={rows} labelA={labelA} labelB={labelB} empty="Neither revision has a manufacturability report yet." />;
}
