'use client';

import Link from 'next/link';
import { useMemo, useState } from 'react';
import { Button, DateTime, Select, TextInput } from '@/components/ui';
import { formatLength } from '@/components/mask-view/viewport';
import { REVISION_STATES, STATE_LABELS, isRevisionState } from '@/lib/workflow/states';
import { formatBytes, viewHistory, type HistoryColumn, type HistoryView } from './history';
import type { RevisionRow } from './types';

const COLUMNS: { id: HistoryColumn; label: string; numeric?: boolean }[] = [
  { id: 'number', label: 'No.', numeric: true },
  { id: 'author', label: 'Author' },
  { id: 'message', label: 'Message' },
  { id: 'state', label: 'State' },
  { id: 'zones', label: 'Zones', numeric: true },
  { id: 'narrowest', label: 'Narrowest feature', numeric: true },
  { id: 'size', label: 'Bundle size', numeric: true },
  { id: 'date', label: 'Saved' },
];

export function HistoryTable({ rows, onRetry }: { rows: RevisionRow[]; onRetry?: (revisionId: string) => void }) {
  const [view, setView] = useState<HistoryView>({ sortBy: 'number', descending: true, text: '', state: '' });
  const shown = useMemo(() => viewHistory(rows, view), [rows, view]);
  const sort = (id: HistoryColumn) => setView((v) => ({ ...v, sortBy: id, descending: v.sortBy === id ? !v.descending : true }));

  return (
    <div className="flex flex-col gap-3" data-testid="history">
      <div className="flex gap-2">
        <TextInput
          aria-label="Filter by message or author"
          placeholder="Filter by message or author"
          value={view.text}
          onChange={(e) => setView((v) => ({ ...v, text: e.target.value }))}
        />
        <Select aria-label="Filter by state" value={view.state} onChange={(e) => setView((v) => ({ ...v, state: e.target.value }))} className="w-48">
          <option value="">every state</option>
          {REVISION_STATES.map((s) => (
            <option key={s} value={s}>
              {STATE_LABELS[s]}
            </option>
          ))}
        </Select>
      </div>
      {rows.length === 0 ? (
        <p className="text-ink/70">No revisions yet. “Save revision” stores the script and exports its bundle.</p>
      ) : (
        <div className="overflow-x-auto">
          <table className="w-full text-left text-sm">
            <thead className="text-xs text-ink/60">
              <tr className="border-b border-hairline">
                {COLUMNS.map((c) => (
                  <th
                    key={c.id}
                    className={`py-1 pr-3 font-medium ${c.numeric ? 'text-right' : ''}`}
                    aria-sort={view.sortBy === c.id ? (view.descending ? 'descending' : 'ascending') : 'none'}
                  >
                    <button type="button" className="hover:underline" onClick={() => sort(c.id)}>
                      {c.label}
                      {view.sortBy === c.id ? (view.descending ? ' ↓' : ' ↑') : ''}
                    </button>
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {shown.map((r) => (
                <tr key={r.id} className="border-b border-hairline align-top last:border-0">
                  <td className="numeric py-2 pr-3 text-right">
                    <Link href={`/revisions/${r.id}`}>{r.number}</Link>
                  </td>
                  <td className="py-2 pr-3">{r.authorName ?? '—'}</td>
                  <td className="py-2 pr-3">{r.message}</td>
                  <td className="py-2 pr-3">
                    {isRevisionState(r.state) ? STATE_LABELS[r.state] : r.state}
                    {r.buildStatus === 'failed' ? (
                      <span className="mt-1 block text-xs text-error">
                        export failed{' '}
                        {onRetry ? (
                          <Button tone="quiet" className="h-6 px-1 text-xs" onClick={() => onRetry(r.id)}>
                            Retry
                          </Button>
                        ) : null}
                      </span>
                    ) : r.buildStatus !== 'ready' ? (
                      <span className="mt-1 block text-xs text-ink/60">exporting…</span>
                    ) : null}
                  </td>
                  <td className="numeric py-2 pr-3 text-right">{r.zoneCount ?? '—'}</td>
                  <td className="numeric py-2 pr-3 text-right">{r.narrowestFeature === null ? '—' : formatLength(r.narrowestFeature)}</td>
                  <td className="numeric py-2 pr-3 text-right">{formatBytes(r.bundleBytes)}</td>
                  <td className="py-2 pr-3 text-xs">
                    <DateTime value={r.createdAt} />
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
          {shown.length === 0 ? <p className="py-2 text-ink/70">No revision matches the filter.</p> : null}
        </div>
      )}
    </div>
  );
}
