import { and, desc, eq, ne, sql } from 'drizzle-orm';
import { db } from '@/db';
import { auditEvents, designs, revisions, users } from '@/db/schema';

export async function teamDesigns(teamId: string) {
  const latest = db
    .select({ designId: revisions.designId, number: revisions.number, state: revisions.state })
    .from(revisions)
    .where(sql`${revisions.number} = (select max(r2.number) from ${revisions} r2 where r2.design_id = ${revisions.designId})`)
    .as('latest');
  return db
    .select({
      id: designs.id,
      name: designs.name,
      description: designs.description,
      updatedAt: designs.updatedAt,
      latestNumber: latest.number,
      latestState: latest.state,
    })
    .from(designs)
    .leftJoin(latest, eq(latest.designId, designs.id))
    .where(eq(designs.teamId, teamId))
    .orderBy(desc(designs.updatedAt))
    .limit(200);
}

/** Revisions of the team in a state, newest first; `notAuthoredBy` leaves out the reader's own. */
export async function teamRevisionsIn(teamId: string, state: string, notAuthoredBy?: string) {
  return db
    .select({
      id: revisions.id,
      number: revisions.number,
      message: revisions.message,
      createdAt: revisions.createdAt,
      designId: designs.id,
      designName: designs.name,
      authorName: users.name,
    })
    .from(revisions)
    .innerJoin(designs, eq(revisions.designId, designs.id))
    .leftJoin(users, eq(revisions.authorId, users.id))
    .where(
      and(
        eq(designs.teamId, teamId),
        eq(revisions.state, state),
        notAuthoredBy ? sql`${revisions.authorId} is distinct from ${notAuthoredBy}` : undefined,
      ),
    )
    .orderBy(desc(revisions.createdAt))
    .limit(50);
}

export async function recentActivity(teamId: string) {
  return db
    .select({ id: auditEvents.id, action: auditEvents.action, details: auditEvents.details, createdAt: auditEvents.createdAt, actorName: users.name, subjectType: auditEvents.subjectType })
    .from(auditEvents)
    .leftJoin(users, eq(auditEvents.actorId, users.id))
    .where(and(eq(auditEvents.teamId, teamId), ne(auditEvents.action, 'auth.signIn')))
    .orderBy(desc(auditEvents.createdAt))
    .limit(12);
}
