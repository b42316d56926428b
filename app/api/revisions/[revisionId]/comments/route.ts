import { createComment, listComments } from '@/db/queries/comments';
import { appUrl } from '@/app/_server/app-url';
import { apiError, handle, json, parseBody } from '@/app/_server/http';
import { requireUser } from '@/app/_server/session';
import { createCommentSchema } from '@/lib/schemas/comments';

export const GET = handle<{ revisionId: string }>(async (_request, { params }) => {
  const user = await requireUser();
  const outcome = await listComments(params.revisionId, user.id);
  if (!outcome.ok) throw apiError(outcome.status, outcome.message);
  return json({ comments: outcome.comments });
});

export const POST = handle<{ revisionId: string }>(async (request, { params }) => {
  const user = await requireUser();
  const body = await parseBody(request, createCommentSchema);
  const outcome = await createComment({ revisionId: params.revisionId, actorId: user.id, ...body, appUrl: appUrl() });
  if (!outcome.ok) throw apiError(outcome.status, outcome.message);
  return json({ comment: outcome.comment, mentioned: outcome.mentioned }, { status: 201 });
});
