/**
 * The authorization table enforced end to end: real sessions, real memberships in PostgreSQL, the
 * route handlers answering by `can`. Uses throw-away teams so the demo team's roles never change.
 */
import { eq, and } from 'drizzle-orm';
import { beforeAll, describe, expect, it } from 'vitest';
import { db } from '@/db';
import { memberships } from '@/db/schema';
import { TEAM_ROLES, type TeamRole } from '@/lib/auth/roles';
import { api, makeTeam, signInCookie } from './helpers';

let team: Awaited<ReturnType<typeof makeTeam>>;
const cookies = new Map<TeamRole, string>();
let outsider: string;
let outsiderTeam: Awaited<ReturnType<typeof makeTeam>>;

beforeAll(async () => {
  team = await makeTeam([...TEAM_ROLES]);
  for (const m of team.members) cookies.set(m.role, await signInCookie(m.email, team.password));
  outsiderTeam = await makeTeam(['owner']);
  outsider = await signInCookie(outsiderTeam.members[0].email, outsiderTeam.password);
});

// Expected outcomes, from the authorization table: owners and designers create designs; only owners
// invite and change roles; every member reads designs and the team.
const MAY_CREATE: TeamRole[] = ['owner', 'designer'];
const MAY_INVITE: TeamRole[] = ['owner'];

describe('route handlers follow the authorization table', () => {
  for (const role of TEAM_ROLES) {
    it(`${role}: create design ${MAY_CREATE.includes(role) ? 201 : 403}, invite ${MAY_INVITE.includes(role) ? 201 : 403}, read 200`, async () => {
      const cookie = cookies.get(role)!;
      const create = await api('/api/designs', { method: 'POST', cookie, body: { teamId: team.teamId, name: `${role}'s axicon` } });
      expect(create.status).toBe(MAY_CREATE.includes(role) ? 201 : 403);
      const invite = await api('/api/team/invitations', {
        method: 'POST',
        cookie,
        body: { teamId: team.teamId, email: `invited-by-${role}-${Date.now()}@example.com`, role: 'viewer' },
      });
      expect(invite.status).toBe(MAY_INVITE.includes(role) ? 201 : 403);
      expect((await api(`/api/designs?teamId=${team.teamId}`, { cookie })).status).toBe(200);
      expect((await api(`/api/team/invitations?teamId=${team.teamId}`, { cookie })).status).toBe(200);
      expect((await api('/api/mailbox?limit=1', { cookie })).status).toBe(200);
    });
  }

  it('lets an owner change a role, and refuses everyone else', async () => {
    const viewer = team.members.find((m) => m.role === 'viewer')!;
    for (const role of TEAM_ROLES.filter((r) => r !== 'owner')) {
      const response = await api(`/api/team/members/${viewer.id}`, { method: 'PATCH', cookie: cookies.get(role), body: { teamId: team.teamId, role: 'designer' } });
      expect(response.status, role).toBe(403);
    }
    const response = await api(`/api/team/members/${viewer.id}`, { method: 'PATCH', cookie: cookies.get('owner'), body: { teamId: team.teamId, role: 'fab' } });
    expect(response.status).toBe(200);
    const [row] = await db.select({ role: memberships.role }).from(memberships).where(and(eq(memberships.teamId, team.teamId), eq(memberships.userId, viewer.id)));
    expect(row.role).toBe('fab');
    await api(`/api/team/members/${viewer.id}`, { method: 'PATCH', cookie: cookies.get('owner'), body: { teamId: team.teamId, role: 'viewer' } });
  });

  it('keeps at least one owner in a team', async () => {
    const only = team.members.find((m) => m.role === 'owner')!;
    const response = await api(`/api/team/members/${only.id}`, { method: 'PATCH', cookie: cookies.get('owner'), body: { teamId: team.teamId, role: 'viewer' } });
    expect(response.status).toBe(409);
    expect(response.body.error).toMatch(/at least one owner/);
  });

  it('gives a member of another team nothing (403), even as that team’s owner', async () => {
    expect((await api(`/api/designs?teamId=${team.teamId}`, { cookie: outsider })).status).toBe(403);
    expect((await api('/api/designs', { method: 'POST', cookie: outsider, body: { teamId: team.teamId, name: 'Intruder' } })).status).toBe(403);
    expect((await api(`/api/team/invitations?teamId=${team.teamId}`, { cookie: outsider })).status).toBe(403);
    const someone = team.members[1];
    expect(
      (await api(`/api/team/members/${someone.id}`, { method: 'PATCH', cookie: outsider, body: { teamId: team.teamId, role: 'owner' } })).status,
    ).toBe(403);
  });
});
