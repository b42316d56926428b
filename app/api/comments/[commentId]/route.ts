import { deleteComment, editComment } from '@/db/queries/comments';
import { appUrl } from '@/app/_server/app-url';
import { apiError, handle, json, parseBody } from '@/app/_server/http';
import { requireUser } from '@/app/_server/session';
import { editCommentSchema } from '@/lib/schemas/comments';

/** Edits one's own comment ({ body, expectedEditedAt? }); 409 when it was edited elsewhere meanwhile. */
export const PATCH = handle<{ commentId: string }>(async (request, { params }) => {
  const user = await requireUser();
  const body = await parseBody(request, editCommentSchema);
  const outcome = await editComment({ commentId: params.commentId, actorId: user.id, ...body, appUrl: appUrl() });
  if (!outcome.ok) throw apiError(outcome.status, outcome.message);
  return json({ comment: outcome.comment, mentioned: outcome.mentioned });
});

/** Deletes one's own comment (owners may delete any); replies keep their place. */
export const DELETE = handle<{ commentId: string }>(async (_request, { params }) => {
  const user = await requireUser();
  const outcome = await deleteComment(params.commentId, user.id);
  if (!outcome.ok) throw apiError(outcome.status, outcome.message);
  return json({ comment: outcome.comment });
});
