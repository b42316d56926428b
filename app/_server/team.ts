/** Team membership changes: roles, invitations and accepting them. Called by the thin team routes. */
import { and, eq, gt, isNull, sql } from 'drizzle-orm';
import bcrypt from 'bcryptjs';
import { db } from '@/db';
import { invitations, memberships, teams, users } from '@/db/schema';
import { hashLinkToken, newLinkToken, ROLE_LABELS, type TeamRole } from '@/lib/auth';
import { invitationEmail, sendMail } from '@/lib/mail';
import { appUrl } from './app-url';
import { recordAudit } from './audit';
import { ApiError } from './http';
import type { CurrentUser, Membership } from './session';

export const INVITATION_DAYS = 7;

export async function changeRole(owner: Membership, userId: string, role: TeamRole): Promise<void> {
  await db.transaction(async (tx) => {
    // Lock the team's memberships so two owners demoting each other cannot leave none.
    const rows = await tx
      .select({ userId: memberships.userId, role: memberships.role })
      .from(memberships)
      .where(eq(memberships.teamId, owner.team.id))
      .for('update');
    const target = rows.find((r) => r.userId === userId);
    if (!target) throw new ApiError(404, 'That person is not a member of this team.');
    const owners = rows.filter((r) => r.role === 'owner').length;
    if (target.role === 'owner' && role !== 'owner' && owners === 1) {
      throw new ApiError(409, 'A team needs at least one owner. Make someone else an owner first.');
    }
    await tx.update(memberships).set({ role }).where(and(eq(memberships.teamId, owner.team.id), eq(memberships.userId, userId)));
  });
  await recordAudit({
    teamId: owner.team.id,
    actorId: owner.user.id,
    action: 'team.changeRole',
    subjectType: 'user',
    subjectId: userId,
    details: { role },
  });
}

export async function invite(owner: Membership, email: string, role: TeamRole): Promise<{ id: string; mailSent: boolean }> {
  const [existing] = await db
    .select({ userId: users.id })
    .from(users)
    .innerJoin(memberships, and(eq(memberships.userId, users.id), eq(memberships.teamId, owner.team.id)))
    .where(eq(users.email, email));
  if (existing) throw new ApiError(409, `${email} is already a member of this team.`);
  const { token, hash } = newLinkToken();
  const expiresAt = new Date(Date.now() + INVITATION_DAYS * 24 * 60 * 60 * 1000);
  const [row] = await db
    .insert(invitations)
    .values({ teamId: owner.team.id, email, role, tokenHash: hash, invitedBy: owner.user.id, expiresAt })
    .returning({ id: invitations.id });
  const message = invitationEmail({
    url: `${appUrl()}/invite/${token}`,
    teamName: owner.team.name,
    inviterName: owner.user.name || owner.user.email,
    roleLabel: ROLE_LABELS[role],
    daysValid: INVITATION_DAYS,
  });
  const sent = await sendMail({ to: email, kind: 'invitation', ...message });
  await recordAudit({ teamId: owner.team.id, actorId: owner.user.id, action: 'team.invite', subjectType: 'invitation', subjectId: row.id, details: { email, role } });
  return { id: row.id, mailSent: sent.sent };
}

export async function pendingInvitations(teamId: string) {
  return db
    .select({ id: invitations.id, email: invitations.email, role: invitations.role, expiresAt: invitations.expiresAt, createdAt: invitations.createdAt })
    .from(invitations)
    .where(and(eq(invitations.teamId, teamId), isNull(invitations.acceptedAt), gt(invitations.expiresAt, sql`now()`)))
    .orderBy(invitations.createdAt);
}

export async function revokeInvitation(owner: Membership, invitationId: string): Promise<void> {
  const deleted = await db
    .delete(invitations)
    .where(and(eq(invitations.id, invitationId), eq(invitations.teamId, owner.team.id), isNull(invitations.acceptedAt)))
    .returning({ id: invitations.id });
  if (deleted.length === 0) throw new ApiError(404, 'No such pending invitation.');
  await recordAudit({ teamId: owner.team.id, actorId: owner.user.id, action: 'team.invite', subjectType: 'invitation', subjectId: invitationId, details: { revoked: true } });
}

/** A usable invitation by its link token, with its team and whether its address has an account. */
export async function findInvitation(token: string) {
  const [row] = await db
    .select({ invitation: invitations, teamName: teams.name })
    .from(invitations)
    .innerJoin(teams, eq(invitations.teamId, teams.id))
    .where(and(eq(invitations.tokenHash, hashLinkToken(token)), isNull(invitations.acceptedAt), gt(invitations.expiresAt, sql`now()`)));
  if (!row) return null;
  const account = await db.query.users.findFirst({ where: eq(users.email, row.invitation.email), columns: { id: true } });
  return { ...row.invitation, teamName: row.teamName, accountId: account?.id ?? null };
}

export const INVALID_INVITATION = 'This invitation link is not valid any more: it was used, revoked or has expired. Ask the team owner for a new one.';

/**
 * Accept an invitation. An address with an account must be signed in as that account; a new address
 * gets an account with the given name and password. Returns the team joined.
 */
export async function acceptInvitation(
  token: string,
  signedIn: CurrentUser | null,
  newAccount: { name?: string; password?: string },
): Promise<{ teamId: string; email: string; createdAccount: boolean }> {
  const found = await findInvitation(token);
  if (!found) throw new ApiError(404, INVALID_INVITATION);
  let userId = found.accountId;
  const createdAccount = userId === null;
  if (userId !== null) {
    if (!signedIn) throw new ApiError(401, `Sign in as ${found.email} to accept this invitation.`);
    if (signedIn.id !== userId) throw new ApiError(403, `This invitation is for ${found.email}; you are signed in as ${signedIn.email}.`);
  } else {
    const problems = [
      ...(newAccount.name ? [] : [{ path: 'name', message: 'Say what to call you.' }]),
      ...(newAccount.password ? [] : [{ path: 'password', message: 'Choose a password.' }]),
    ];
    if (problems.length > 0) throw new ApiError(400, 'The request body has problems.', problems);
  }
  const passwordHash = createdAccount ? await bcrypt.hash(newAccount.password!, 10) : null;
  await db.transaction(async (tx) => {
    // Claiming the invitation first makes a double submit accept it only once.
    const claimed = await tx
      .update(invitations)
      .set({ acceptedAt: new Date() })
      .where(and(eq(invitations.id, found.id), isNull(invitations.acceptedAt)))
      .returning({ id: invitations.id });
    if (claimed.length === 0) throw new ApiError(404, INVALID_INVITATION);
    if (userId === null) {
      const [created] = await tx
        .insert(users)
        .values({ email: found.email, name: newAccount.name!, passwordHash, emailVerified: new Date() })
        .returning({ id: users.id });
      userId = created.id;
    }
    await tx.insert(memberships).values({ teamId: found.teamId, userId, role: found.role }).onConflictDoUpdate({
      target: [memberships.teamId, memberships.userId],
      set: { role: found.role },
    });
  });
  await recordAudit({ teamId: found.teamId, actorId: userId, action: 'team.join', subjectType: 'invitation', subjectId: found.id, details: { role: found.role } });
  return { teamId: found.teamId, email: found.email, createdAccount };
}
