/** DELETE /api/team/invitations/{id}?teamId=…  owners revoke a pending invitation. */
import { z } from 'zod';
import { ApiError, handle, json, parseQuery } from '@/app/_server/http';
import { authorize, requireMember, requireUser } from '@/app/_server/session';
import { revokeInvitation } from '@/app/_server/team';

export const DELETE = handle<{ invitationId: string }>(async (request, { params, requestId }) => {
  await requireUser();
  const { teamId } = parseQuery(request, z.object({ teamId: z.uuid('teamId must be a team id.') }));
  if (!z.uuid().safeParse(params.invitationId).success) throw new ApiError(404, 'No such pending invitation.');
  const owner = await requireMember(teamId);
  authorize(owner.actor, 'team.invite');
  await revokeInvitation(owner, params.invitationId);
  return json({ revoked: params.invitationId }, { requestId });
});
