/**
 * The demo seed (invented data): one team, "Demo · Harbour Street Optics Lab", with one account per
 * role, all with the password zonewright-demo. Idempotent: running it again changes nothing, not even
 * roles an owner has changed since.
 */
import bcrypt from 'bcryptjs';
import { eq } from 'drizzle-orm';
import { db } from './index';
import { memberships, teams, users } from './schema';
import { DEMO_PASSWORD, DEMO_ROLES, demoEmail } from '../lib/auth/demo-accounts';
import type { TeamRole } from '../lib/auth/roles';

export const DEMO_TEAM = { slug: 'demo-harbour-street', name: 'Demo · Harbour Street Optics Lab' };

// Invented people for an invented lab.
const DEMO_NAMES: Record<TeamRole, string> = {
  owner: 'Ines Marlow (demo owner)',
  designer: 'Tomas Okafor (demo designer)',
  reviewer: 'Priya Lindqvist (demo reviewer)',
  fab: 'Jonah Reyes (demo fab)',
  viewer: 'Mei Castellano (demo viewer)',
};

export async function seedDemo(): Promise<{ teamId: string; created: number }> {
  const passwordHash = await bcrypt.hash(DEMO_PASSWORD, 10);
  return db.transaction(async (tx) => {
    await tx.insert(teams).values(DEMO_TEAM).onConflictDoNothing({ target: teams.slug });
    const [team] = await tx.select({ id: teams.id }).from(teams).where(eq(teams.slug, DEMO_TEAM.slug));
    let created = 0;
    for (const role of DEMO_ROLES) {
      const email = demoEmail(role);
      const inserted = await tx
        .insert(users)
        .values({ email, name: DEMO_NAMES[role], passwordHash, emailVerified: new Date() })
        .onConflictDoNothing({ target: users.email })
        .returning({ id: users.id });
      created += inserted.length;
      const [user] = await tx.select({ id: users.id }).from(users).where(eq(users.email, email));
      await tx.insert(memberships).values({ teamId: team.id, userId: user.id, role }).onConflictDoNothing();
    }
    return { teamId: team.id, created };
  });
}
