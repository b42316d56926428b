'use client';

import { useQuery } from '@tanstack/react-query';
import { useEffect } from 'react';
import { Button, Notice } from '@/components/ui';
import { callApi } from './api';
import { toRevisionRow, type RevisionRow } from './types';

/** Follows one revision's export until it is ready or failed, polling its API route. */
export function useRevisionBuild(revisionId: string | null) {
  return useQuery({
    queryKey: ['revision', revisionId],
    enabled: revisionId !== null,
    queryFn: async () => toRevisionRow((await callApi<{ revision: RevisionRow }>(`/api/revisions/${revisionId}`)).revision),
    refetchInterval: (query) => {
      const status = query.state.data?.buildStatus;
      return status === 'ready' || status === 'failed' ? false : 700;
    },
    staleTime: 0,
  });
}

/** The export's progress bar, its failure with a retry, or a short note once the bundle is stored. */
export function BuildProgress({
  revisionId,
  onSettled,
  onRetry,
}: {
  revisionId: string;
  onSettled: (row: RevisionRow) => void;
  onRetry: (revisionId: string) => void;
}) {
  const { data, error } = useRevisionBuild(revisionId);
  const status = data?.buildStatus;
  useEffect(() => {
    if (data && (status === 'ready' || status === 'failed')) onSettled(data);
    // onSettled is called once per finished state, not on every render.
  }, [status, data?.id]);

  if (error) return <Notice tone="warning">Could not follow the export: {error.message}</Notice>;
  if (!data) return null;
  if (status === 'failed') {
    return (
      <Notice tone="error" title={`Revision ${data.number}: the export failed; nothing was stored.`}>
        <p>{data.buildError}</p>
        <Button className="mt-2" onClick={() => onRetry(data.id)}>
          Retry export
        </Button>
      </Notice>
    );
  }
  if (status === 'ready') {
    return (
      <p className="text-sm text-ink/70" role="status" data-testid="build-done">
        Revision {data.number} saved; bundle ready.
      </p>
    );
  }
  const percent = Math.round(data.buildProgress * 100);
  return (
    <div className="flex items-center gap-3 text-sm" data-testid="build-progress">
      <span>Revision {data.number}:</span>
      <div
        role="progressbar"
        aria-label={`Export of revision ${data.number}`}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={percent}
        className="h-2 w-48 overflow-hidden rounded border border-hairline bg-white"
      >
        <div className="h-full bg-ink transition-[width]" style={{ width: `${percent}%` }} />
      </div>
      <span className="numeric">{percent} %</span>
      <span className="text-ink/60">{data.buildStage}</span>
    </div>
  );
}
