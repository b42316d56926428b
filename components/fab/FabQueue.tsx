'use client';

import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { formatLength } from '@/components/mask-view/viewport';
import { DateTime, Notice, Panel, Tag, buttonClass } from '@/components/ui';
import { formatBytes } from '@/components/workspace/history';
import { STATE_LABELS, isRevisionState } from '@/lib/workflow/states';
import { RunForm } from './RunForm';
import type { FabItemView, FabRunRow } from './types';

/** Released revisions with their bundle, layer map and notes; the run form for fab staff; recorded runs with photos. */
export function FabQueue({ items, runs, recordableRoles }: { items: FabItemView[]; runs: FabRunRow[]; recordableRoles: string[] }) {
  const [filter, setFilter] = useState<'waiting' | 'all'>('waiting');
  const shown = items.filter((i) => filter === 'all' || i.state === 'released');
  return (
    <div className="flex flex-col gap-4" data-testid="fab-queue">
      <Notice tone="warning" title="Safety">
        Resists, developers and etchants are hazardous: work to your lab’s safety data sheets and local rules. The lenses made here
        focus light; never look into a focused beam. These pages record the work; they do not replace licensed practice.
      </Notice>
      <div className="flex items-center gap-2 text-sm" role="radiogroup" aria-label="Show">
        {(['waiting', 'all'] as const).map((f) => (
          <label key={f} className="flex items-center gap-1">
            <input type="radio" name="fab-filter" checked={filter === f} onChange={() => setFilter(f)} />
            {f === 'waiting' ? 'waiting for fabrication' : 'also fabricated'}
          </label>
        ))}
      </div>
      {shown.length === 0 ? <p className="text-ink/70">Nothing is waiting for fabrication. Revisions appear here once a reviewer releases them to fab.</p> : null}
      {shown.map((item) => (
        <FabItem key={item.revisionId} item={item} runs={runs.filter((r) => r.revisionId === item.revisionId)} canRecord={recordableRoles.includes(item.role)} />
      ))}
    </div>
  );
}

function FabItem({ item, runs, canRecord }: { item: FabItemView; runs: FabRunRow[]; canRecord: boolean }) {
  const router = useRouter();
  const [recording, setRecording] = useState(false);
  const profile = item.profile;
  return (
    <Panel
      title={`${item.designName} · revision ${item.number}`}
      actions={<Tag>{isRevisionState(item.state) ? STATE_LABELS[item.state] : item.state}</Tag>}
    >
      <div className="flex flex-col gap-4" data-testid={`fab-item-${item.number}`}>
        <p className="text-sm">
          {item.message} <span className="text-ink/60">· {item.teamName} · saved <DateTime value={item.createdAt} /></span>{' '}
          <Link href={`/revisions/${item.revisionId}`}>revision page</Link>
        </p>
        <div className="flex flex-wrap items-center gap-3">
          {item.bundleSha256 ? (
            <>
              <a href={`/api/revisions/${item.revisionId}/bundle`} className={buttonClass('secondary', 'no-underline')} download>
                Download bundle ({formatBytes(item.bundleBytes)})
              </a>
              <span className="text-xs text-ink/60">SHA-256</span>
              <code className="break-all text-xs" data-testid="fab-sha256">
                {item.bundleSha256}
              </code>
            </>
          ) : (
            <Notice tone="error">This revision has no bundle; ask the designer to retry its export.</Notice>
          )}
        </div>
        <div className="grid grid-cols-1 gap-4 md:grid-cols-2">
          <div>
            <h3 className="mb-1 text-xs font-semibold uppercase tracking-wide text-ink/60">Layer map (from the bundle)</h3>
            <table className="w-full text-left text-sm">
              <thead className="text-xs text-ink/60">
                <tr>
                  <th className="pr-2 font-medium">Layer/datatype</th>
                  <th className="pr-2 font-medium">Name</th>
                  <th className="font-medium">Meaning</th>
                </tr>
              </thead>
              <tbody>
                {item.layers.map((l) => (
                  <tr key={`${l.layer}/${l.datatype}`} className="border-t border-hairline align-top">
                    <td className="numeric pr-2">
                      {l.layer}/{l.datatype}
                    </td>
                    <td className="pr-2">{l.name}</td>
                    <td>
                      {l.meaning ?? l.purpose}
                      {l.tone ? <span className="block text-xs text-ink/60">{l.tone}</span> : null}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <div className="text-sm">
            <h3 className="mb-1 text-xs font-semibold uppercase tracking-wide text-ink/60">Process</h3>
            <dl className="grid grid-cols-2 gap-x-4 gap-y-1">
              <dt className="text-ink/60">Minimum feature</dt>
              <dd className="numeric">{formatLength(profile.minimumFeature)}</dd>
              <dt className="text-ink/60">Narrowest drawn</dt>
              <dd className="numeric">{item.narrowestFeature === null ? '—' : formatLength(item.narrowestFeature)}</dd>
              <dt className="text-ink/60">Database unit</dt>
              <dd className="numeric">{formatLength(profile.databaseUnit)}</dd>
              <dt className="text-ink/60">Resist tone</dt>
              <dd>{profile.tone}</dd>
              <dt className="text-ink/60">Zones</dt>
              <dd className="numeric">{item.zoneCount ?? '—'}</dd>
            </dl>
            <h3 className="mb-1 mt-3 text-xs font-semibold uppercase tracking-wide text-ink/60">Process notes</h3>
            <p className="whitespace-pre-wrap">{profile.processNotes || '—'}</p>
          </div>
        </div>
        {runs.length > 0 ? <RunList runs={runs} /> : null}
        {canRecord && item.bundleSha256 ? (
          recording ? (
            <RunForm
              revisionId={item.revisionId}
              onCancel={() => setRecording(false)}
              onRecorded={() => {
                setRecording(false);
                router.refresh();
              }}
            />
          ) : (
            <div>
              <button type="button" className={buttonClass('primary')} onClick={() => setRecording(true)}>
                Record a run
              </button>
            </div>
          )
        ) : null}
      </div>
    </Panel>
  );
}

function RunList({ runs }: { runs: FabRunRow[] }) {
  return (
    <div>
      <h3 className="mb-1 text-xs font-semibold uppercase tracking-wide text-ink/60">Runs ({runs.length})</h3>
      <ul className="flex flex-col gap-3">
        {runs.map((run) => (
          <li key={run.id} className="rounded border border-hairline p-3 text-sm" data-testid="fab-run">
            <p>
              <span className="numeric">{run.runDate}</span> · {run.tool} · dose <span className="numeric">{run.dose}</span> {run.doseUnit} · focus{' '}
              <span className="numeric">{run.focus}</span> µm · {run.resist}, <span className="numeric">{run.resistThickness}</span> µm
              <span className="text-ink/60"> · recorded by {run.recordedByName ?? 'unknown'}</span>
            </p>
            {run.notes ? <p className="mt-1 whitespace-pre-wrap text-ink/80">{run.notes}</p> : null}
            {run.photos.length > 0 ? (
              <div className="mt-2 flex flex-wrap gap-2">
                {run.photos.map((p) => (
                  <a key={p.id} href={`/api/fab/photos/${p.id}`} target="_blank" rel="noreferrer" title={`${p.fileName} (${p.width} × ${p.height} px)`}>
                    <img src={`/api/fab/photos/${p.id}?size=thumbnail`} alt={`Inspection photo ${p.fileName}`} className="h-24 rounded border border-hairline" />
                  </a>
                ))}
              </div>
            ) : null}
          </li>
        ))}
      </ul>
    </div>
  );
}
