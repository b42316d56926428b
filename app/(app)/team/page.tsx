import type { Metadata } from 'next';
import { asc, eq } from 'drizzle-orm';
import { db } from '@/db';
import { memberships, users } from '@/db/schema';
import { InviteForm } from '@/components/team/InviteForm';
import { RevokeButton } from '@/components/team/RevokeButton';
import { RoleSelect } from '@/components/team/RoleSelect';
import { DateTime, Notice, PageHeader, Panel, Tag } from '@/components/ui';
import { allows, pageMembership } from '@/app/_server/session';
import { pendingInvitations } from '@/app/_server/team';
import { ROLE_DESCRIPTIONS, ROLE_LABELS, TEAM_ROLES } from '@/lib/auth';

export const metadata: Metadata = { title: 'Team' };
export const dynamic = 'force-dynamic';

export default async function TeamPage() {
  const { membership } = await pageMembership('/team');
  if (!membership || !allows(membership.actor, 'team.view')) {
    return (
      <div className="mx-auto max-w-3xl">
        <PageHeader title="Team" />
        <Notice>You are not in a team yet. Ask a team owner to invite you.</Notice>
      </div>
    );
  }
  const { team, actor } = membership;
  const canChangeRoles = allows(actor, 'team.changeRole');
  const canInvite = allows(actor, 'team.invite');
  const [members, invitations] = await Promise.all([
    db
      .select({ id: users.id, name: users.name, email: users.email, role: memberships.role, joinedAt: memberships.createdAt })
      .from(memberships)
      .innerJoin(users, eq(memberships.userId, users.id))
      .where(eq(memberships.teamId, team.id))
      .orderBy(asc(memberships.createdAt)),
    pendingInvitations(team.id),
  ]);

  return (
    <div className="mx-auto flex max-w-4xl flex-col gap-6">
      <PageHeader title="Team" lead={`${team.name} · ${members.length} members`} />
      <Panel title="Members">
        <table className="w-full text-left text-sm">
          <thead className="text-xs text-ink/60">
            <tr className="border-b border-hairline">
              <th className="py-1 pr-4 font-medium">Name</th>
              <th className="py-1 pr-4 font-medium">E-mail</th>
              <th className="py-1 pr-4 font-medium">Role</th>
              <th className="py-1 font-medium">Joined</th>
            </tr>
          </thead>
          <tbody>
            {members.map((m) => (
              <tr key={m.id} className="border-b border-hairline align-top last:border-0">
                <td className="py-2 pr-4">{m.name || '—'}</td>
                <td className="py-2 pr-4">{m.email}</td>
                <td className="py-2 pr-4">
                  {canChangeRoles ? (
                    <RoleSelect teamId={team.id} userId={m.id} role={m.role} memberName={m.name || m.email} />
                  ) : (
                    <Tag>{ROLE_LABELS[m.role]}</Tag>
                  )}
                </td>
                <td className="py-2">
                  <DateTime value={m.joinedAt} />
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </Panel>
      <Panel title={`Pending invitations (${invitations.length})`}>
        {invitations.length === 0 ? (
          <p className="text-ink/70">No invitation is waiting.</p>
        ) : (
          <ul className="flex flex-col gap-2">
            {invitations.map((inv) => (
              <li key={inv.id} className="flex items-center gap-3">
                <span>{inv.email}</span>
                <Tag>{ROLE_LABELS[inv.role]}</Tag>
                <span className="text-xs text-ink/60">
                  valid until <DateTime value={inv.expiresAt} />
                </span>
                {canInvite ? (
                  <span className="ml-auto">
                    <RevokeButton teamId={team.id} invitationId={inv.id} email={inv.email} />
                  </span>
                ) : null}
              </li>
            ))}
          </ul>
        )}
      </Panel>
      {canInvite ? (
        <Panel title="Invite someone">
          <InviteForm teamId={team.id} />
        </Panel>
      ) : null}
      <Panel title="What each role may do">
        <dl className="grid grid-cols-[8rem_1fr] gap-x-4 gap-y-1">
          {TEAM_ROLES.map((role) => (
            <div key={role} className="contents">
              <dt className="font-medium">{ROLE_LABELS[role]}</dt>
              <dd className="text-ink/80">{ROLE_DESCRIPTIONS[role]}</dd>
            </div>
          ))}
        </dl>
      </Panel>
    </div>
  );
}
