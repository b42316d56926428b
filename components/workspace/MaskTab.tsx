'use client';

import { MaskView } from '@/components/mask-view';
import { formatLength } from '@/components/mask-view/viewport';
import { Notice } from '@/components/ui';
import type { ProcessProfile } from '@/lib/schemas/designs';
import type { PreviewState } from './usePreview';

export function MaskTab({ preview, profile }: { preview: PreviewState; profile: ProcessProfile }) {
  const { figures } = preview;
  const markers = figures?.narrowest ? [figures.narrowest] : [];
  return (
    <div className="flex flex-col gap-3" data-testid="mask-tab">
      {preview.message ? <Notice tone="warning">{preview.message}</Notice> : null}
      <MaskView library={preview.library} markers={markers} emptyText={preview.busy ? 'Drawing the mask…' : 'No mask to show yet.'} />
      {figures ? (
        <dl className="grid grid-cols-2 gap-x-6 gap-y-1 text-sm sm:grid-cols-4" data-testid="mask-figures">
          <Figure label="Zones" value={figures.zoneCount === null ? '—' : String(figures.zoneCount)} />
          <Figure label="Narrowest feature" value={figures.narrowest ? formatLength(figures.narrowest.width) : '—'} warn={figures.belowMinimum > 0} />
          <Figure label="Polygons" value={figures.polygonCount.toLocaleString('en')} />
          <Figure label="Vertices" value={figures.vertexCount.toLocaleString('en')} />
        </dl>
      ) : null}
      <p className="text-xs text-ink/60">
        Preview drawn at a chord tolerance of {preview.chordTolerance === null ? '—' : formatLength(preview.chordTolerance)}
        {preview.elapsedMs === null ? '' : ` in ${preview.elapsedMs} ms`}; the saved bundle uses the process profile’s {formatLength(profile.chordTolerance)}.
        {preview.busy ? ' Updating…' : ''}
      </p>
    </div>
  );
}

export function Figure({ label, value, warn = false }: { label: string; value: string; warn?: boolean }) {
  return (
    <div>
      <dt className="text-xs text-ink/60">{label}</dt>
      <dd className={`numeric ${warn ? 'text-warning' : ''}`}>{value}</dd>
    </div>
  );
}
