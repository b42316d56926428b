'use client';

import { formatLength } from '@/components/mask-view/viewport';
import { Notice } from '@/components/ui';
import type { ProcessProfile } from '@/lib/schemas/designs';
import { Figure } from './MaskTab';
import type { PreviewState } from './usePreview';

/** Manufacturability numbers and warnings of the working script, against the process profile. */
export function ReportTab({ preview, profile }: { preview: PreviewState; profile: ProcessProfile }) {
  const report = preview.figures;
  if (!report) return <p className="text-ink/70">The report appears once the script draws a mask.</p>;
  const margin = report.narrowest ? report.narrowest.width / profile.minimumFeature : null;
  return (
    <section className="flex flex-col gap-3" data-testid="report-tab">
      <h2 className="text-sm font-semibold">Manufacturability</h2>
      <dl className="grid grid-cols-2 gap-x-6 gap-y-2 text-sm sm:grid-cols-3">
        <Figure label="Zones" value={report.zoneCount === null ? '—' : String(report.zoneCount)} />
        <Figure label="Narrowest feature" value={report.narrowest ? formatLength(report.narrowest.width) : '—'} warn={report.belowMinimum > 0} />
        <Figure label="Process minimum feature" value={formatLength(profile.minimumFeature)} />
        <Figure label="Narrowest ÷ minimum" value={margin === null ? '—' : `${margin.toFixed(2)} ×`} warn={margin !== null && margin < 1} />
        <Figure label="Features below the minimum" value={String(report.belowMinimum)} warn={report.belowMinimum > 0} />
        <Figure label="Open area" value={`${(report.openAreaFraction * 100).toFixed(1)} %`} />
        <Figure label="Polygons / vertices" value={`${report.polygonCount.toLocaleString('en')} / ${report.vertexCount.toLocaleString('en')}`} />
      </dl>
      {report.warnings.length === 0 ? (
        <Notice tone="success">No manufacturability warnings at the preview tolerance.</Notice>
      ) : (
        <Notice tone="warning" title={`${report.warnings.length} warning${report.warnings.length === 1 ? '' : 's'}`}>
          <ul className="list-disc pl-5">
            {report.warnings.map((w, i) => (
              <li key={i}>{w}</li>
            ))}
          </ul>
        </Notice>
      )}
      <p className="text-xs text-ink/60">
        Figures from the live preview; each saved revision’s own report is on its revision page.
      </p>
    </section>
  );
}
