/**
 * Who is calling, and in which team. Route handlers use the require* helpers (they throw ApiError
 * 401/403/404); pages use the page* helpers (they redirect to sign-in).
 */
import { and, asc, eq } from 'drizzle-orm';
import { getServerSession } from 'next-auth';
import { cookies } from 'next/headers';
import { redirect } from 'next/navigation';
import { db } from '@/db';
import { memberships, teams, users } from '@/db/schema';
import { ACTION_LABELS, can, type Action, type Actor, type Resource, type TeamRole } from '@/lib/auth';
import { isLocalRun } from '@/lib/mail';
import { authOptions } from './auth/options';
import { ApiError } from './http';

export type CurrentUser = typeof users.$inferSelect;

export interface Membership {
  user: CurrentUser;
  team: typeof teams.$inferSelect;
  role: TeamRole;
  actor: Actor;
}

/** The cookie that remembers which team a member of several teams is working in. */
export const TEAM_COOKIE = 'zw-team';

/** The signed-in user, read fresh from the database (a deleted user is signed out), or null. */
export async function getCurrentUser(): Promise<CurrentUser | null> {
  const session = await getServerSession(authOptions());
  const id = session?.user?.id;
  if (!id) return null;
  return (await db.query.users.findFirst({ where: eq(users.id, id) })) ?? null;
}

export async function requireUser(): Promise<CurrentUser> {
  const user = await getCurrentUser();
  if (!user) throw new ApiError(401, 'Sign in first.');
  return user;
}

async function membershipIn(user: CurrentUser, teamId: string): Promise<Membership | null> {
  const [row] = await db
    .select({ team: teams, role: memberships.role })
    .from(memberships)
    .innerJoin(teams, eq(memberships.teamId, teams.id))
    .where(and(eq(memberships.userId, user.id), eq(memberships.teamId, teamId)));
  return row ? { user, team: row.team, role: row.role, actor: { userId: user.id, role: row.role } } : null;
}

/** Every team the user belongs to, oldest membership first. */
export async function teamsOf(userId: string): Promise<{ team: typeof teams.$inferSelect; role: TeamRole }[]> {
  return db
    .select({ team: teams, role: memberships.role })
    .from(memberships)
    .innerJoin(teams, eq(memberships.teamId, teams.id))
    .where(eq(memberships.userId, userId))
    .orderBy(asc(memberships.createdAt));
}

/** The team the user works in now: the remembered one if still a member, else their first. */
export async function currentMembership(user: CurrentUser): Promise<Membership | null> {
  const remembered = (await cookies()).get(TEAM_COOKIE)?.value;
  if (remembered && /^[0-9a-f-]{36}$/i.test(remembered)) {
    const found = await membershipIn(user, remembered);
    if (found) return found;
  }
  const [first] = await teamsOf(user.id);
  return first ? { user, team: first.team, role: first.role, actor: { userId: user.id, role: first.role } } : null;
}

/**
 * The caller's membership in `teamId` (or in their current team when omitted).
 * 401 when signed out; 404 for an unknown team; 403 when not a member.
 */
export async function requireMember(teamId?: string): Promise<Membership> {
  const user = await requireUser();
  if (!teamId) {
    const current = await currentMembership(user);
    if (!current) throw new ApiError(403, 'You are not a member of any team yet. Ask a team owner to invite you.');
    return current;
  }
  const found = await membershipIn(user, teamId);
  if (found) return found;
  const team = await db.query.teams.findFirst({ where: eq(teams.id, teamId), columns: { id: true } });
  if (!team) throw new ApiError(404, 'No such team.');
  throw new ApiError(403, 'You are not a member of this team.');
}

/** 403 unless `can` allows the action; the message names the action and the role. */
export function authorize(actor: Actor, action: Action, resource?: Resource): void {
  if (can(actor, action, { localRun: isLocalRun(), ...resource })) return;
  const who = actor.role ? `${/^[aeiou]/.test(actor.role) ? 'an' : 'a'} ${actor.role}` : 'someone outside the team';
  throw new ApiError(403, `As ${who} you may not ${ACTION_LABELS[action]}.`);
}

/** For pages: the signed-in user, or a redirect to the sign-in page that comes back here. */
export async function pageUser(returnTo: string): Promise<CurrentUser> {
  const user = await getCurrentUser();
  if (!user) redirect(`/sign-in?callbackUrl=${encodeURIComponent(returnTo)}`);
  return user;
}

/** For pages: the signed-in user's current membership (null when in no team). */
export async function pageMembership(returnTo: string): Promise<{ user: CurrentUser; membership: Membership | null }> {
  const user = await pageUser(returnTo);
  return { user, membership: await currentMembership(user) };
}

/** `can` with the server's facts filled in (whether this is a local run). */
export function allows(actor: Actor | null, action: Action, resource?: Resource): boolean {
  return can(actor, action, { localRun: isLocalRun(), ...resource });
}
