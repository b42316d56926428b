'use client';

import { useState } from 'react';
import { Button, DateTime, Notice } from '@/components/ui';
import type { CommentAnchor, CommentView } from '@/lib/schemas/comments';
import type { ThreadNode } from '@/lib/workflow/comment-tree';
import { anchorText } from './anchor-text';
import { CommentBody } from './CommentBody';
import { CommentComposer, type CommentDraft } from './CommentComposer';

export interface CommentActions {
  reply: (parentId: string, draft: CommentDraft) => Promise<boolean>;
  edit: (comment: CommentView, body: string) => Promise<boolean>;
  remove: (comment: CommentView) => Promise<boolean>;
  onAnchorClick?: (anchor: CommentAnchor) => void;
  /** an error from the last action on a given comment */
  errors: Record<string, string | undefined>;
  pendingReplyTo: string | null;
}

// Deeper replies are shown at this depth, so long exchanges stay readable.
const MAX_INDENT = 3;

export function CommentItem({ node, depth, actions }: { node: ThreadNode<CommentView>; depth: number; actions: CommentActions }) {
  const c = node.comment;
  const [mode, setMode] = useState<'view' | 'edit' | 'reply' | 'confirm-delete'>('view');
  const [text, setText] = useState(c.body);
  const pending = c.id.startsWith('pending-');
  const deleted = c.deletedAt !== null;
  const error = actions.errors[c.id];

  return (
    <li id={`comment-${c.id}`} className="flex flex-col gap-2" data-testid="comment">
      <article className={`rounded border border-hairline p-3 ${pending ? 'opacity-60' : 'bg-white'}`} aria-busy={pending}>
        <header className="mb-1 flex flex-wrap items-center gap-2 text-xs text-ink/70">
          <span className="font-medium text-ink">{c.author?.name ?? (pending ? 'You' : 'Former member')}</span>
          <DateTime value={c.createdAt} />
          {c.editedAt && !deleted ? <span title={c.editedAt}>edited</span> : null}
          {c.anchor ? (
            <button
              type="button"
              onClick={() => c.anchor && actions.onAnchorClick?.(c.anchor)}
              className="rounded border border-hairline bg-paper px-1.5 font-mono text-[11px] text-ink hover:border-ink/40 focus:outline-none focus-visible:ring-2 focus-visible:ring-accent"
              title={actions.onAnchorClick ? 'Show on the page' : undefined}
            >
              {anchorText(c.anchor)}
            </button>
          ) : null}
        </header>
        {deleted ? (
          <p className="text-sm italic text-ink/60">This comment was deleted.</p>
        ) : mode === 'edit' ? (
          <form
            className="flex flex-col gap-2"
            onSubmit={async (event) => {
              event.preventDefault();
              if (await actions.edit(c, text)) setMode('view');
            }}
          >
            <label className="sr-only" htmlFor={`edit-${c.id}`}>
              Edit comment
            </label>
            <textarea
              id={`edit-${c.id}`}
              value={text}
              rows={3}
              onChange={(event) => setText(event.target.value)}
              className="rounded border border-hairline p-2 text-sm focus:outline-none focus:ring-2 focus:ring-accent"
            />
            <div className="flex gap-2">
              <Button type="submit">Save</Button>
              <Button tone="quiet" onClick={() => { setText(c.body); setMode('view'); }}>
                Cancel
              </Button>
            </div>
          </form>
        ) : (
          <CommentBody text={c.body} />
        )}
        {c.attachments.length > 0 ? (
          <ul className="mt-2 flex flex-wrap gap-2" aria-label="Attached images">
            {c.attachments.map((a) => (
              <li key={a.id}>
                <a href={a.url} target="_blank" rel="noreferrer" className="block rounded border border-hairline focus:outline-none focus-visible:ring-2 focus-visible:ring-accent" title={`${a.fileName}, ${a.width} × ${a.height} px, ${(a.byteSize / 1048576).toFixed(2)} MB`}>
                  {/* eslint-disable-next-line @next/next/no-img-element -- thumbnails come from our own API with their size */}
                  <img src={a.thumbnailUrl} alt={a.fileName} width={Math.round(a.thumbnailWidth / 2)} height={Math.round(a.thumbnailHeight / 2)} className="block rounded" />
                </a>
              </li>
            ))}
          </ul>
        ) : null}
        {!deleted && !pending && mode === 'view' ? (
          <div className="mt-2 flex gap-1 text-xs">
            <Button tone="quiet" className="h-6 px-2 text-xs" onClick={() => setMode('reply')}>
              Reply
            </Button>
            {c.canEdit ? (
              <Button tone="quiet" className="h-6 px-2 text-xs" onClick={() => { setText(c.body); setMode('edit'); }}>
                Edit
              </Button>
            ) : null}
            {c.canDelete ? (
              <Button tone="quiet" className="h-6 px-2 text-xs" onClick={() => setMode('confirm-delete')}>
                Delete
              </Button>
            ) : null}
          </div>
        ) : null}
        {mode === 'confirm-delete' ? (
          <div className="mt-2 flex items-center gap-2 text-sm">
            <span>Delete this comment and its images? Replies stay.</span>
            <Button tone="danger" className="h-6 px-2 text-xs" onClick={async () => { if (await actions.remove(c)) setMode('view'); }}>
              Delete
            </Button>
            <Button tone="quiet" className="h-6 px-2 text-xs" onClick={() => setMode('view')}>
              Keep
            </Button>
          </div>
        ) : null}
        {error ? <div className="mt-2"><Notice tone="error">{error}</Notice></div> : null}
      </article>
      {mode === 'reply' ? (
        <div className="ml-6">
          <CommentComposer
            reply
            pending={actions.pendingReplyTo === c.id}
            onCancel={() => setMode('view')}
            onSubmit={async (draft) => {
              const saved = await actions.reply(c.id, draft);
              if (saved) setMode('view');
              return saved;
            }}
          />
        </div>
      ) : null}
      {node.replies.length > 0 ? (
        <ul className={`flex flex-col gap-2 ${depth < MAX_INDENT ? 'ml-6 border-l border-hairline pl-3' : ''}`}>
          {node.replies.map((r) => (
            <CommentItem key={r.comment.id} node={r} depth={depth + 1} actions={actions} />
          ))}
        </ul>
      ) : null}
    </li>
  );
}
