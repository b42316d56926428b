'use client';

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { Notice } from '@/components/ui';
import type { AttachmentView, CommentAnchor, CommentView } from '@/lib/schemas/comments';
import { buildThreads } from '@/lib/workflow/comment-tree';
import { apiJson, errorText } from './api';
import { commentsKey, optimistic, replaceComment, type CommentsData } from './comment-cache';
import { CommentComposer, type CommentDraft } from './CommentComposer';
import { CommentItem, type CommentActions } from './CommentItem';

export interface CommentThreadProps {
  revisionId: string;
  /** an anchor picked elsewhere on the page (e.g. MaskView's onPickPoint, a clicked script line) for the next comment */
  anchorDraft?: CommentAnchor | null;
  /** called when a comment's anchor is clicked, so the page can show that line or point */
  onAnchorClick?: (anchor: CommentAnchor) => void;
}

let pendingCount = 0;

async function uploadImages(commentId: string, files: File[]): Promise<{ attachments: AttachmentView[]; failures: string[] }> {
  const attachments: AttachmentView[] = [];
  const failures: string[] = [];
  for (const file of files) {
    const form = new FormData();
    form.append('file', file);
    try {
      const { attachment } = await apiJson<{ attachment: AttachmentView }>(`/api/comments/${commentId}/attachments`, { method: 'POST', body: form });
      attachments.push(attachment);
    } catch (error) {
      failures.push(`${file.name}: ${errorText(error)}`);
    }
  }
  return { attachments, failures };
}

/** Threaded comments on a revision: anchored to a script line or a mask point, with @mentions and images. */
export function CommentThread({ revisionId, anchorDraft, onAnchorClick }: CommentThreadProps) {
  const client = useQueryClient();
  const key = commentsKey(revisionId);
  const list = useQuery({ queryKey: key, queryFn: () => apiJson<CommentsData>(`/api/revisions/${revisionId}/comments`) });
  const [errors, setErrors] = useState<Record<string, string | undefined>>({});
  const [uploadNotes, setUploadNotes] = useState<string[]>([]);
  const setError = (id: string, message?: string) => setErrors((e) => ({ ...e, [id]: message }));

  const create = useMutation({
    mutationFn: async ({ draft, parentId }: { draft: CommentDraft; parentId: string | null }) => {
      const { comment, mentioned } = await apiJson<{ comment: CommentView; mentioned: string[] }>(`/api/revisions/${revisionId}/comments`, {
        method: 'POST',
        body: JSON.stringify({ body: draft.body, parentId, anchor: draft.anchor }),
      });
      const uploaded = await uploadImages(comment.id, draft.files);
      return { comment: { ...comment, attachments: [...comment.attachments, ...uploaded.attachments] }, mentioned, failures: uploaded.failures };
    },
    onMutate: async ({ draft, parentId }) => {
      const tempId = `pending-${++pendingCount}`;
      const temp: CommentView = {
        id: tempId,
        revisionId,
        parentId,
        author: null,
        body: draft.body.trim(),
        anchor: draft.anchor,
        createdAt: new Date().toISOString(),
        editedAt: null,
        deletedAt: null,
        attachments: [],
        canEdit: false,
        canDelete: false,
      };
      const undo = await optimistic(client, revisionId, (comments) => [...comments, temp]);
      return { undo, tempId };
    },
    onSuccess: (result, _vars, context) => {
      client.setQueryData<CommentsData>(key, (data) => ({ comments: replaceComment(data?.comments ?? [], context.tempId, result.comment) }));
      setUploadNotes(result.failures.length ? [`The comment was posted, but some images were not attached:`, ...result.failures] : []);
    },
    onError: (_error, _vars, context) => context?.undo(),
    onSettled: () => client.invalidateQueries({ queryKey: key }),
  });

  const edit = useMutation({
    mutationFn: ({ comment, body }: { comment: CommentView; body: string }) =>
      apiJson<{ comment: CommentView }>(`/api/comments/${comment.id}`, {
        method: 'PATCH',
        body: JSON.stringify({ body, expectedEditedAt: comment.editedAt }),
      }),
    onMutate: async ({ comment, body }) => {
      setError(comment.id);
      return { undo: await optimistic(client, revisionId, (all) => replaceComment(all, comment.id, { ...comment, body: body.trim(), editedAt: new Date().toISOString() })) };
    },
    onError: (error, { comment }, context) => {
      context?.undo();
      setError(comment.id, errorText(error));
    },
    onSettled: () => client.invalidateQueries({ queryKey: key }),
  });

  const remove = useMutation({
    mutationFn: (comment: CommentView) => apiJson<{ comment: CommentView }>(`/api/comments/${comment.id}`, { method: 'DELETE' }),
    onMutate: async (comment) => {
      setError(comment.id);
      return {
        undo: await optimistic(client, revisionId, (all) =>
          replaceComment(all, comment.id, { ...comment, body: '', attachments: [], deletedAt: new Date().toISOString(), canEdit: false, canDelete: false }),
        ),
      };
    },
    onError: (error, comment, context) => {
      context?.undo();
      setError(comment.id, errorText(error));
    },
    onSettled: () => client.invalidateQueries({ queryKey: key }),
  });

  const threads = useMemo(() => buildThreads(list.data?.comments ?? []), [list.data]);
  const [replyError, setReplyError] = useState<string | null>(null);
  const [pendingReplyTo, setPendingReplyTo] = useState<string | null>(null);

  const actions: CommentActions = {
    reply: async (parentId, draft) => {
      setPendingReplyTo(parentId);
      setError(parentId);
      try {
        await create.mutateAsync({ draft, parentId });
        return true;
      } catch (error) {
        setError(parentId, errorText(error));
        return false;
      } finally {
        setPendingReplyTo(null);
      }
    },
    edit: (comment, body) => {
      if (!body.trim()) {
        setError(comment.id, 'A comment cannot be empty; delete it instead.');
        return Promise.resolve(false);
      }
      return edit.mutateAsync({ comment, body }).then(() => true, () => false);
    },
    remove: (comment) => remove.mutateAsync(comment).then(() => true, () => false),
    onAnchorClick,
    errors,
    pendingReplyTo,
  };

  const count = list.data?.comments.filter((c) => !c.deletedAt).length ?? 0;

  return (
    <section aria-label="Comments" className="flex flex-col gap-3" data-testid="comment-thread">
      <p className="text-xs text-ink/70" data-testid="comment-count">
        <span className="font-mono">{count}</span> {count === 1 ? 'comment' : 'comments'}
      </p>
      {list.isError ? <Notice tone="error">{errorText(list.error)}</Notice> : null}
      {list.isPending ? <p className="text-sm text-ink/60">Loading comments…</p> : null}
      {threads.length > 0 ? (
        <ul className="flex flex-col gap-3">
          {threads.map((node) => (
            <CommentItem key={node.comment.id} node={node} depth={0} actions={actions} />
          ))}
        </ul>
      ) : list.isSuccess ? (
        <p className="text-sm text-ink/60">No comments yet.</p>
      ) : null}
      <CommentComposer
        anchorDraft={anchorDraft}
        pending={create.isPending && pendingReplyTo === null}
        error={replyError}
        onSubmit={async (draft) => {
          setReplyError(null);
          try {
            await create.mutateAsync({ draft, parentId: null });
            return true;
          } catch (error) {
            setReplyError(errorText(error));
            return false;
          }
        }}
      />
      {uploadNotes.length > 0 ? (
        <Notice tone="warning" title={uploadNotes[0]}>
          <ul className="list-disc pl-4">
            {uploadNotes.slice(1).map((n) => (
              <li key={n}>{n}</li>
            ))}
          </ul>
        </Notice>
      ) : null}
    </section>
  );
}
