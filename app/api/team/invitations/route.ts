/**
 * GET  /api/team/invitations?teamId=…   pending invitations (every member)
 * POST /api/team/invitations  { teamId, email, role }   owners invite by e-mail
 */
import { z } from 'zod';
import { inviteSchema } from '@/lib/auth';
import { handle, json, parseBody, parseQuery } from '@/app/_server/http';
import { authorize, requireMember, requireUser } from '@/app/_server/session';
import { invite, pendingInvitations } from '@/app/_server/team';

export const GET = handle(async (request, { requestId }) => {
  const { teamId } = parseQuery(request, z.object({ teamId: z.uuid('teamId must be a team id.').optional() }));
  const member = await requireMember(teamId);
  authorize(member.actor, 'team.view');
  return json({ invitations: await pendingInvitations(member.team.id) }, { requestId });
});

export const POST = handle(async (request, { requestId }) => {
  await requireUser();
  const input = await parseBody(request, inviteSchema);
  const owner = await requireMember(input.teamId);
  authorize(owner.actor, 'team.invite');
  const result = await invite(owner, input.email, input.role);
  return json({ invitation: { id: result.id, email: input.email, role: input.role }, mailSent: result.mailSent }, { status: 201, requestId });
});
