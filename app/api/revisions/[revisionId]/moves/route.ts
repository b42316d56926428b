import { applyMove, moveChoices } from '@/db/queries/review';
import { appUrl } from '@/app/_server/app-url';
import { apiError, handle, json, parseBody } from '@/app/_server/http';
import { requireUser } from '@/app/_server/session';
import { moveRequestSchema } from '@/lib/schemas/review';
import { STATE_LABELS } from '@/lib/workflow/states';

/** Applies a review move ({ move, expectedState, note? }); 409 when the page is stale or the move does not apply. */
export const POST = handle<{ revisionId: string }>(async (request, { params }) => {
  const user = await requireUser();
  const body = await parseBody(request, moveRequestSchema);
  const outcome = await applyMove({ revisionId: params.revisionId, actorId: user.id, ...body, appUrl: appUrl() });
  if (!outcome.ok) throw apiError(outcome.status, outcome.message);
  return json({
    revisionId: outcome.revisionId,
    from: outcome.from,
    state: outcome.to,
    stateLabel: STATE_LABELS[outcome.to],
    emailed: outcome.notifications.filter((n) => n.sent).map((n) => n.to),
  });
});

/** The revision's state and the moves the caller may make now. */
export const GET = handle<{ revisionId: string }>(async (_request, { params }) => {
  const user = await requireUser();
  const outcome = await moveChoices(params.revisionId, user.id);
  if (!outcome.ok) throw apiError(outcome.status, outcome.message);
  return json({ state: outcome.state, stateLabel: STATE_LABELS[outcome.state], moves: outcome.moves, ownRevision: outcome.ownRevision, bundlePending: outcome.bundlePending });
});
