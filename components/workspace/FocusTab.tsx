'use client';

import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { FocusCheck } from '@/components/focus-check';
import { Notice, Select } from '@/components/ui';
import type { SimulationResult } from '@/lib/optics';
import { reportFocusCheck } from '@/lib/jobs/report-figures';
import { callApi } from './api';
import type { RevisionRow } from './types';

/** The optical check of a saved revision, computed by the worker after its export and stored with it. */
export function FocusTab({ revisions }: { revisions: RevisionRow[] }) {
  const ready = revisions.filter((r) => r.buildStatus === 'ready');
  const [chosen, setChosen] = useState<string | null>(null);
  const revisionId = chosen ?? ready[0]?.id ?? null;
  const stored = useQuery({
    queryKey: ['revision-report', revisionId],
    enabled: revisionId !== null,
    queryFn: async () => reportFocusCheck((await callApi<{ revision: { report: unknown } }>(`/api/revisions/${revisionId}`)).revision.report),
    staleTime: Infinity,
    // The check runs after the bundle is stored; until it lands in the report, look again now and then.
    refetchInterval: (query) => (query.state.data === null ? 3000 : false),
  });
  if (ready.length === 0) {
    return <p className="text-ink/70">The focus check runs with each saved revision’s export. Save a revision to see where its light goes.</p>;
  }
  return (
    <div className="flex flex-col gap-3" data-testid="focus-tab">
      <label className="flex items-center gap-2 text-sm">
        Revision
        <Select className="w-40" value={revisionId ?? ''} onChange={(e) => setChosen(e.target.value)}>
          {ready.map((r) => (
            <option key={r.id} value={r.id}>
              {r.number} — {r.message.slice(0, 40)}
            </option>
          ))}
        </Select>
      </label>
      {stored.error ? <Notice tone="error">{stored.error.message}</Notice> : null}
      {stored.data && 'error' in stored.data ? <Notice tone="warning">The focus check could not run for this revision: {stored.data.error}</Notice> : null}
      {stored.data && 'result' in stored.data ? <FocusCheck result={stored.data.result as SimulationResult} progress={null} /> : null}
      {stored.data === null ? <p className="text-ink/70" role="status">The focus check of this revision is running in the background; it appears here when it is done.</p> : null}
    </div>
  );
}
