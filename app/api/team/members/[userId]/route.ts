/** PATCH /api/team/members/{userId}  { teamId, role }: owners change a member's role. */
import { z } from 'zod';
import { changeRoleSchema } from '@/lib/auth';
import { ApiError, handle, json, parseBody } from '@/app/_server/http';
import { authorize, requireMember, requireUser } from '@/app/_server/session';
import { changeRole } from '@/app/_server/team';

export const PATCH = handle<{ userId: string }>(async (request, { params, requestId }) => {
  await requireUser();
  if (!z.uuid().safeParse(params.userId).success) throw new ApiError(404, 'No such member.');
  const input = await parseBody(request, changeRoleSchema);
  const owner = await requireMember(input.teamId);
  authorize(owner.actor, 'team.changeRole');
  await changeRole(owner, params.userId, input.role);
  return json({ userId: params.userId, role: input.role }, { requestId });
});
