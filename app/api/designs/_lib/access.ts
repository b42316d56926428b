/** Loads what a handler acts on and checks the caller may act on it (404 for unknown ids, 403 from `authorize`). */
import { getDesignForUser, type DesignWithRole } from '@/db/queries/designs';
import { getRevisionForUser, type RevisionWithAccess } from '@/db/queries/revisions';
import { ApiError } from '@/app/_server/http';
import { authorize, requireUser, type CurrentUser } from '@/app/_server/session';
import type { Action, Actor } from '@/lib/auth';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export async function designAccess(designId: string, action: Action): Promise<DesignWithRole & { user: CurrentUser; actor: Actor }> {
  const user = await requireUser();
  const found = UUID.test(designId) ? await getDesignForUser(designId, user.id) : null;
  // Outsiders get the same answer as for a design that does not exist, so ids cannot be probed.
  if (!found || !found.role) throw new ApiError(404, 'No such design.');
  const actor: Actor = { userId: user.id, role: found.role };
  authorize(actor, action);
  return { ...found, user, actor };
}

export async function revisionAccess(
  revisionId: string,
  action: Action,
): Promise<RevisionWithAccess & { user: CurrentUser; actor: Actor }> {
  const user = await requireUser();
  const found = UUID.test(revisionId) ? await getRevisionForUser(revisionId, user.id) : null;
  if (!found || !found.role) throw new ApiError(404, 'No such revision.');
  const actor: Actor = { userId: user.id, role: found.role };
  authorize(actor, action, { authorId: found.revision.authorId });
  return { ...found, user, actor };
}
