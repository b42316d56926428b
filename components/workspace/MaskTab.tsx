'use client';

import { useMemo } from 'react';
import { MaskView } from '@/components/mask-view';
import { unpackLibrary } from '@/components/mask-view/packing';
import { formatLength } from '@/components/mask-view/viewport';
import { Notice } from '@/components/ui';
import type { ProcessProfile } from '@/lib/schemas/designs';
import type { Preview } from './usePreview';

export function MaskTab({ preview, profile }: { preview: Preview; profile: ProcessProfile }) {
  const { data, error, isFetching } = preview;
  const library = useMemo(() => (data?.library ? unpackLibrary(data.library) : null), [data?.library]);
  const markers = data?.report.narrowest ? [{ ...data.report.narrowest }] : [];
  return (
    <div className="flex flex-col gap-3" data-testid="mask-tab">
      {error ? <Notice tone="error">{error.message}</Notice> : null}
      {data?.message ? <Notice tone="warning">{data.message}</Notice> : null}
      <MaskView library={library} markers={markers} emptyText={isFetching ? 'Drawing the mask…' : 'No mask to show yet.'} />
      {data ? (
        <dl className="grid grid-cols-2 gap-x-6 gap-y-1 text-sm sm:grid-cols-4" data-testid="mask-figures">
          <Figure label="Zones" value={data.report.zoneCount === null ? '—' : String(data.report.zoneCount)} />
          <Figure label="Narrowest feature" value={data.report.narrowest ? formatLength(data.report.narrowest.width) : '—'} warn={data.report.belowMinimum > 0} />
          <Figure label="Polygons" value={data.report.polygonCount.toLocaleString('en')} />
          <Figure label="Vertices" value={data.report.vertexCount.toLocaleString('en')} />
        </dl>
      ) : null}
      <p className="text-xs text-ink/60">
        Preview drawn at a chord tolerance of {data ? formatLength(data.chordTolerance) : '—'}
        {data ? ` in ${data.elapsedMs} ms` : ''}; the saved bundle uses the process profile’s {formatLength(profile.chordTolerance)}.
        {isFetching ? ' Updating…' : ''}
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
