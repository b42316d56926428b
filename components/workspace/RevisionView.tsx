'use client';

import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { MaskView, type MaskPin } from '@/components/mask-view';
import { formatLength } from '@/components/mask-view/viewport';
import { CommentThread, RevisionMoves } from '@/components/review';
import { DateTime, Notice, Panel, Tag, buttonClass } from '@/components/ui';
import type { CommentAnchor } from '@/lib/schemas/comments';
import type { ProcessProfile } from '@/lib/schemas/designs';
import { STATE_LABELS, isRevisionState } from '@/lib/workflow/states';
import { callApi } from './api';
import { BuildProgress } from './BuildProgress';
import { formatBytes } from './history';
import { ScriptLines } from './ScriptLines';
import type { PhaseMapRow, RevisionRow } from './types';
import { usePhaseMapData } from './usePhaseMapData';
import { usePreview } from './usePreview';

const NO_MAPS: PhaseMapRow[] = [];

export interface RevisionViewProps {
  revision: RevisionRow & { source: string; processProfile: ProcessProfile };
  designId: string;
  designName: string;
  teamName: string;
  canRetry: boolean;
  /** figures from the stored export report */
  warnings: string[];
}

export function RevisionView({ revision, designId, designName, teamName, canRetry, warnings }: RevisionViewProps) {
  const router = useRouter();
  const [anchor, setAnchor] = useState<CommentAnchor | null>(null);
  const [highlight, setHighlight] = useState<number | null>(null);
  const [retryError, setRetryError] = useState<string | null>(null);
  const mapRows = useQuery({
    queryKey: ['phase-maps', designId],
    queryFn: async () => (await callApi<{ maps: PhaseMapRow[] }>(`/api/designs/${designId}/phase-maps`)).maps,
    staleTime: Infinity,
  });
  const mapData = usePhaseMapData(designId, mapRows.data ?? NO_MAPS);
  const profile = revision.processProfile;
  const mask = usePreview(
    { script: revision.source, databaseUnit: profile.databaseUnit, minimumFeature: profile.minimumFeature, chordTolerance: profile.chordTolerance },
    mapData,
  );
  const pins: MaskPin[] = anchor && 'x_um' in anchor ? [{ x: anchor.x_um, y: anchor.y_um, label: '•' }] : [];
  const state = isRevisionState(revision.state) ? STATE_LABELS[revision.state] : revision.state;

  const retry = async () => {
    setRetryError(null);
    try {
      await callApi(`/api/designs/${designId}/revisions/${revision.id}/retry`, { method: 'POST' });
      router.refresh();
    } catch (e) {
      setRetryError(e instanceof Error ? e.message : String(e));
    }
  };

  return (
    <div className="mx-auto flex max-w-7xl flex-col gap-4" data-testid="revision-page">
      <div className="flex flex-wrap items-end justify-between gap-4 border-b border-hairline pb-3">
        <div>
          <p className="text-xs text-ink/60">
            {teamName} · <Link href={`/designs/${designId}`}>{designName}</Link>
          </p>
          <h1 className="text-lg font-semibold">
            Revision {revision.number} <Tag>{state}</Tag>
          </h1>
          <p className="text-sm text-ink/70">
            {revision.message} — {revision.authorName ?? 'unknown author'}, <DateTime value={revision.createdAt} />
          </p>
        </div>
        <RevisionMoves revision={{ id: revision.id, state: revision.state }} />
      </div>

      <Panel title="Bundle">
        {revision.buildStatus === 'ready' && revision.bundleSha256 ? (
          <div className="flex flex-wrap items-center gap-4">
            <a href={`/api/revisions/${revision.id}/bundle`} className={buttonClass('secondary', 'no-underline')} download>
              Download bundle ({formatBytes(revision.bundleBytes)})
            </a>
            <span className="text-xs text-ink/60">SHA-256</span>
            <code className="break-all text-xs" data-testid="bundle-sha256">
              {revision.bundleSha256}
            </code>
          </div>
        ) : revision.buildStatus === 'failed' ? (
          <Notice tone="error" title="The export failed; this revision has no bundle.">
            <p>{revision.buildError}</p>
            {canRetry ? (
              <button type="button" className={buttonClass('secondary', 'mt-2')} onClick={() => void retry()}>
                Retry export
              </button>
            ) : null}
            {retryError ? <p className="mt-1">{retryError}</p> : null}
          </Notice>
        ) : (
          <BuildProgress revisionId={revision.id} onRetry={() => void retry()} onSettled={() => router.refresh()} />
        )}
        <dl className="mt-3 grid grid-cols-2 gap-x-6 gap-y-1 text-sm sm:grid-cols-4">
          <div>
            <dt className="text-xs text-ink/60">Zones</dt>
            <dd className="numeric">{revision.zoneCount ?? '—'}</dd>
          </div>
          <div>
            <dt className="text-xs text-ink/60">Narrowest feature</dt>
            <dd className="numeric">{revision.narrowestFeature === null ? '—' : formatLength(revision.narrowestFeature)}</dd>
          </div>
          <div>
            <dt className="text-xs text-ink/60">Minimum feature (process)</dt>
            <dd className="numeric">{formatLength(revision.processProfile.minimumFeature)}</dd>
          </div>
          <div>
            <dt className="text-xs text-ink/60">Database unit</dt>
            <dd className="numeric">{formatLength(revision.processProfile.databaseUnit)}</dd>
          </div>
        </dl>
        {warnings.length > 0 ? (
          <div className="mt-3">
            <Notice tone="warning" title={`${warnings.length} manufacturability warning${warnings.length === 1 ? '' : 's'}`}>
              <ul className="list-disc pl-5">
                {warnings.map((w, i) => (
                  <li key={i}>{w}</li>
                ))}
              </ul>
            </Notice>
          </div>
        ) : null}
      </Panel>

      <div className="grid grid-cols-1 gap-4 xl:grid-cols-2">
        <Panel title="Script (read-only)">
          <ScriptLines source={revision.source} highlight={highlight} onPickLine={(line) => setAnchor({ line })} />
          <p className="mt-2 text-xs text-ink/60">Click a line number to comment on that line.</p>
        </Panel>
        <Panel title="Mask">
          {mask.message ? <Notice tone="warning">{mask.message}</Notice> : null}
          <MaskView
            library={mask.library}
            markers={mask.figures?.narrowest ? [mask.figures.narrowest] : []}
            pins={pins}
            onPickPoint={(p) => setAnchor({ x_um: p.x, y_um: p.y })}
            height={420}
            emptyText={mask.busy ? 'Drawing the mask…' : 'No mask to show.'}
          />
        </Panel>
      </div>

      <Panel title="Comments">
        <CommentThread
          revisionId={revision.id}
          anchorDraft={anchor}
          onAnchorClick={(a) => {
            if ('line' in a) {
              setHighlight(a.line);
              document.getElementById(`line-${a.line}`)?.scrollIntoView({ block: 'center' });
            } else {
              setAnchor(a);
            }
          }}
        />
      </Panel>
    </div>
  );
}
