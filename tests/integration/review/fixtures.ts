/**
 * A fresh team per test file in the real database: one member per role, a second reviewer and a
 * non-member, with unique addresses so test files can share one database. Revisions are inserted
 * directly (the moves, not the saving, are under test here).
 */
import { randomUUID } from 'node:crypto';
import bcrypt from 'bcryptjs';
import { and, eq, sql } from 'drizzle-orm';
import { db } from '@/db';
import { auditEvents, capturedMail, designs, memberships, revisions, teams, users } from '@/db/schema';
import type { TeamRole } from '@/lib/auth/roles';
import type { RevisionState } from '@/lib/workflow/states';

export type Person = { id: string; email: string; name: string };
export interface TestTeam {
  id: string;
  name: string;
  members: Record<TeamRole | 'reviewer2', Person>;
  outsider: Person;
  designId: string;
}

/** Every fixture account signs in with this password (hashed at low cost: these are throwaway accounts). */
export const TEST_PASSWORD = 'review-test-password';
const TEST_PASSWORD_HASH = bcrypt.hashSync(TEST_PASSWORD, 4);

async function person(tag: string, label: string): Promise<Person> {
  const email = `${tag}-${label}@review.test`;
  const [row] = await db.insert(users).values({ email, name: `${label} ${tag}`, passwordHash: TEST_PASSWORD_HASH }).returning({ id: users.id });
  return { id: row.id, email, name: `${label} ${tag}` };
}

export async function makeTeam(): Promise<TestTeam> {
  const tag = randomUUID().slice(0, 8);
  const name = `Review test team ${tag}`;
  const [team] = await db.insert(teams).values({ name, slug: `review-${tag}` }).returning({ id: teams.id });
  const roles: Array<[TeamRole | 'reviewer2', TeamRole]> = [
    ['owner', 'owner'],
    ['designer', 'designer'],
    ['reviewer', 'reviewer'],
    ['reviewer2', 'reviewer'],
    ['fab', 'fab'],
    ['viewer', 'viewer'],
  ];
  const members = {} as TestTeam['members'];
  for (const [label, role] of roles) {
    members[label] = await person(tag, label);
    await db.insert(memberships).values({ teamId: team.id, userId: members[label].id, role });
  }
  const outsider = await person(tag, 'outsider');
  const [design] = await db
    .insert(designs)
    .values({ teamId: team.id, name: `Bifocal test lens ${tag}`, createdBy: members.designer.id })
    .returning({ id: designs.id });
  return { id: team.id, name, members, outsider, designId: design.id };
}

/** A revision of the team's design in the given state, with a finished bundle unless told otherwise. */
export async function makeRevision(
  team: TestTeam,
  options: {
    state?: RevisionState;
    authorId?: string;
    buildStatus?: 'queued' | 'running' | 'ready' | 'failed';
    source?: string;
    /** a zip to store as the revision's bundle */
    bundle?: Uint8Array;
  } = {},
): Promise<string> {
  const [row] = await db
    .update(designs)
    .set({ lastRevisionNumber: sql`${designs.lastRevisionNumber} + 1` })
    .where(eq(designs.id, team.designId))
    .returning({ number: designs.lastRevisionNumber });
  const [revision] = await db
    .insert(revisions)
    .values({
      designId: team.designId,
      number: row.number,
      authorId: options.authorId ?? team.members.designer.id,
      message: `test revision ${row.number}`,
      source: options.source ?? 'wavelength 405 nm\nfocus 0 0 5 mm\n',
      state: options.state ?? 'draft',
      buildStatus: options.buildStatus ?? 'ready',
      bundleSha256: options.buildStatus && options.buildStatus !== 'ready' ? null : 'ab'.repeat(32),
      bundle: options.bundle ? Buffer.from(options.bundle) : null,
    })
    .returning({ id: revisions.id });
  return revision.id;
}

export async function stateOf(revisionId: string): Promise<string> {
  const [row] = await db.select({ state: revisions.state }).from(revisions).where(eq(revisions.id, revisionId));
  return row.state;
}

export async function auditFor(revisionId: string) {
  return db
    .select()
    .from(auditEvents)
    .where(and(eq(auditEvents.subjectType, 'revision'), eq(auditEvents.subjectId, revisionId)));
}

/** Messages the local SMTP fake stored for this address. */
export async function mailTo(email: string) {
  return db
    .select({ subject: capturedMail.subject, text: capturedMail.textBody, html: capturedMail.htmlBody })
    .from(capturedMail)
    .where(sql`${email} = ANY(${capturedMail.envelopeTo})`);
}

export async function setPreference(userId: string, values: Partial<typeof users.$inferInsert>): Promise<void> {
  await db.update(users).set(values).where(eq(users.id, userId));
}

export const APP_URL = process.env.APP_URL ?? 'http://127.0.0.1:3100';
