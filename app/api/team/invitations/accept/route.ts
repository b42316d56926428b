/** POST /api/team/invitations/accept  { token, name?, password? }: join the team the link invites to. */
import { acceptInvitationSchema } from '@/lib/auth';
import { handle, json, parseBody } from '@/app/_server/http';
import { getCurrentUser, TEAM_COOKIE } from '@/app/_server/session';
import { acceptInvitation } from '@/app/_server/team';

export const POST = handle(async (request, { requestId }) => {
  const input = await parseBody(request, acceptInvitationSchema);
  const result = await acceptInvitation(input.token, await getCurrentUser(), input);
  const response = json(result, { requestId });
  // Land in the team just joined.
  response.headers.append('set-cookie', `${TEAM_COOKIE}=${result.teamId}; Path=/; SameSite=Lax; HttpOnly; Max-Age=31536000`);
  return response;
});
