/**
 * next-auth's storage for the e-mail link provider, on our own tables. Sessions are JWT cookies,
 * so only users, linked accounts and one-time tokens are stored here.
 */
import { and, eq } from 'drizzle-orm';
import type { Adapter, AdapterAccount, AdapterUser } from 'next-auth/adapters';
import { db } from '@/db';
import { accounts, users, verificationTokens } from '@/db/schema';

type UserRow = typeof users.$inferSelect;

function toAdapterUser(row: UserRow): AdapterUser {
  return { id: row.id, email: row.email, name: row.name, emailVerified: row.emailVerified, image: row.image };
}

export function zonewrightAdapter(): Adapter {
  return {
    async createUser(user: Omit<AdapterUser, 'id'>) {
      const [row] = await db
        .insert(users)
        .values({ email: user.email.toLowerCase(), name: user.name ?? '', emailVerified: user.emailVerified, image: user.image })
        .returning();
      return toAdapterUser(row);
    },
    async getUser(id) {
      const row = await db.query.users.findFirst({ where: eq(users.id, id) });
      return row ? toAdapterUser(row) : null;
    },
    async getUserByEmail(email) {
      const row = await db.query.users.findFirst({ where: eq(users.email, email.toLowerCase()) });
      return row ? toAdapterUser(row) : null;
    },
    async getUserByAccount({ provider, providerAccountId }) {
      const [row] = await db
        .select({ user: users })
        .from(accounts)
        .innerJoin(users, eq(accounts.userId, users.id))
        .where(and(eq(accounts.provider, provider), eq(accounts.providerAccountId, providerAccountId)));
      return row ? toAdapterUser(row.user) : null;
    },
    async updateUser({ id, ...changes }) {
      const [row] = await db
        .update(users)
        .set({
          ...(changes.name !== undefined ? { name: changes.name ?? '' } : {}),
          ...(changes.emailVerified !== undefined ? { emailVerified: changes.emailVerified } : {}),
          ...(changes.image !== undefined ? { image: changes.image } : {}),
          updatedAt: new Date(),
        })
        .where(eq(users.id, id))
        .returning();
      return toAdapterUser(row);
    },
    async linkAccount(account: AdapterAccount) {
      await db
        .insert(accounts)
        .values({ userId: account.userId, type: account.type, provider: account.provider, providerAccountId: account.providerAccountId })
        .onConflictDoNothing();
    },
    async createVerificationToken(token) {
      await db.insert(verificationTokens).values(token);
      return token;
    },
    async useVerificationToken({ identifier, token }) {
      const [row] = await db
        .delete(verificationTokens)
        .where(and(eq(verificationTokens.identifier, identifier), eq(verificationTokens.token, token)))
        .returning();
      return row ?? null;
    },
  };
}
