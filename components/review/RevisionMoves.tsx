'use client';

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useEffect, useId, useState } from 'react';
import { Button, Notice } from '@/components/ui';
import { STATE_LABELS, type RevisionMove, type RevisionState } from '@/lib/workflow/states';
import { apiJson, errorText } from './api';

interface MoveChoices {
  state: RevisionState;
  stateLabel: string;
  moves: { move: RevisionMove; label: string }[];
  ownRevision: boolean;
  bundlePending: boolean;
}

/** Who hears about each move, said before the user confirms it. */
const CONSEQUENCE: Record<RevisionMove, string> = {
  requestReview: "The team's reviewers are e-mailed.",
  approve: 'The author is e-mailed. An approved revision can be released to fab.',
  requestChanges: 'The author is e-mailed with your note.',
  release:
    'Fab staff are e-mailed and the bundle appears in the Fab queue. Check the layer map, tone and minimum feature first: released bundles are what gets exposed.',
  markFabricated: 'Usually done by recording a run in the Fab queue, which keeps the exposure parameters with it.',
};

const FORWARD: ReadonlySet<RevisionMove> = new Set(['requestReview', 'approve', 'release', 'markFabricated']);

export interface RevisionMovesProps {
  /** the revision as the page loaded it; its state is sent with each move so stale pages are caught */
  revision: { id: string; state: string };
}

/** The review moves the signed-in user may make on a revision, each confirmed with an optional note. */
export function RevisionMoves({ revision }: RevisionMovesProps) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const noteId = useId();
  const [chosen, setChosen] = useState<RevisionMove | null>(null);
  const [note, setNote] = useState('');
  // the state this page stands on: as loaded, then as left by this page's own moves
  const [pageState, setPageState] = useState(revision.state);
  useEffect(() => setPageState(revision.state), [revision.state]);
  const queryKey = ['revision-moves', revision.id];
  const choices = useQuery({
    queryKey,
    queryFn: () => apiJson<MoveChoices>(`/api/revisions/${revision.id}/moves`),
    // while the export runs, look again now and then so "Request review" appears when the bundle is ready
    refetchInterval: (query) => (query.state.data?.bundlePending ? 3000 : false),
  });
  const move = useMutation({
    mutationFn: (which: RevisionMove) =>
      apiJson<{ state: RevisionState; stateLabel: string; emailed: string[] }>(`/api/revisions/${revision.id}/moves`, {
        method: 'POST',
        body: JSON.stringify({ move: which, expectedState: pageState, ...(note.trim() ? { note: note.trim() } : {}) }),
      }),
    onSuccess: (result) => {
      setPageState(result.state);
      setChosen(null);
      setNote('');
      router.refresh();
    },
    onSettled: () => queryClient.invalidateQueries({ queryKey }),
  });

  const shownLabel = STATE_LABELS[pageState as RevisionState] ?? pageState;
  const data = choices.data;
  const stale = data && data.state !== pageState;
  const label = data?.moves.find((m) => m.move === chosen)?.label;

  return (
    <div className="relative flex max-w-md flex-col items-end gap-2" data-testid="revision-moves">
      {choices.isError ? <Notice tone="error">{errorText(choices.error)}</Notice> : null}
      {stale ? (
        <Notice tone="warning" title="This revision changed since the page was loaded">
          It is now {data.stateLabel} (this page shows {shownLabel}).{' '}
          <button type="button" className="underline" onClick={() => router.refresh()}>
            Reload
          </button>
        </Notice>
      ) : null}
      {data && !stale ? (
        data.moves.length > 0 ? (
          <div className="flex flex-wrap gap-2">
            {data.moves.map((m) => (
              <Button
                key={m.move}
                tone={FORWARD.has(m.move) && !chosen ? 'primary' : 'secondary'}
                aria-pressed={chosen === m.move}
                onClick={() => {
                  setChosen(chosen === m.move ? null : m.move);
                  move.reset();
                }}
              >
                {m.label}
              </Button>
            ))}
          </div>
        ) : (
          <p className="text-sm text-ink/70">
            {data.ownRevision
              ? 'You wrote this revision, so another reviewer or an owner must review it.'
              : data.bundlePending
                ? 'Review can be requested once the export has finished and the bundle is ready.'
                : `No review move is open to you while the revision is ${data.stateLabel}.`}
          </p>
        )
      ) : null}
      {chosen && label && !stale ? (
        <form
          aria-label={label}
          className="absolute right-0 top-10 z-20 flex w-96 flex-col gap-2 rounded border border-hairline bg-paper p-3 shadow-md"
          onSubmit={(event) => {
            event.preventDefault();
            move.mutate(chosen);
          }}
        >
          <label htmlFor={noteId} className="text-sm font-medium">
            {chosen === 'requestChanges' ? 'What should change?' : 'Note (optional)'}
          </label>
          <textarea
            id={noteId}
            value={note}
            maxLength={2000}
            rows={3}
            onChange={(event) => setNote(event.target.value)}
            className="rounded border border-hairline bg-white p-2 text-sm focus:outline-none focus:ring-2 focus:ring-accent"
          />
          <p className="text-xs text-ink/70">{CONSEQUENCE[chosen]}</p>
          {move.isError ? <Notice tone="error">{errorText(move.error)}</Notice> : null}
          <div className="flex gap-2">
            <Button type="submit" tone="primary" disabled={move.isPending}>
              {move.isPending ? 'Working…' : `Confirm: ${label}`}
            </Button>
            <Button tone="quiet" onClick={() => setChosen(null)}>
              Cancel
            </Button>
          </div>
        </form>
      ) : null}
      {move.isSuccess ? (
        <Notice tone="success">
          Now {move.data.stateLabel}.{move.data.emailed.length > 0 ? ` E-mailed ${move.data.emailed.join(', ')}.` : ''}
        </Notice>
      ) : null}
      <Link href={`/compare?b=${revision.id}`} className="text-xs" data-testid="compare-previous">
        Compare with the previous revision
      </Link>
    </div>
  );
}
