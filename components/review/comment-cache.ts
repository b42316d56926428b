/** The comments query of one revision and the optimistic edits made to its cached list. */
import type { QueryClient } from '@tanstack/react-query';
import type { CommentView } from '@/lib/schemas/comments';

export const commentsKey = (revisionId: string) => ['comments', revisionId] as const;

export interface CommentsData {
  comments: CommentView[];
}

/** Applies `change` to the cached list now and returns how to undo it if the server refuses. */
export async function optimistic(
  client: QueryClient,
  revisionId: string,
  change: (comments: CommentView[]) => CommentView[],
): Promise<() => void> {
  const key = commentsKey(revisionId);
  await client.cancelQueries({ queryKey: key });
  const previous = client.getQueryData<CommentsData>(key);
  client.setQueryData<CommentsData>(key, (data) => ({ comments: change(data?.comments ?? []) }));
  return () => client.setQueryData(key, previous);
}

export function replaceComment(comments: CommentView[], id: string, next: CommentView): CommentView[] {
  return comments.map((c) => (c.id === id ? next : c));
}
