/**
 * Seeding, mail and sessions against the real database and the running mail fake.
 */
import { eq, sql } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { db } from '@/db';
import { capturedMail, mailOutbox, memberships, teams, users } from '@/db/schema';
import { seedDemo } from '@/db/seed-demo';
import { sendMail } from '@/lib/mail';
import { decode } from 'next-auth/jwt';
import { authSecret } from '@/app/_server/auth/secret';
import { api, signInCookie } from './helpers';

async function counts() {
  const [row] = await db
    .select({
      users: sql<number>`(select count(*)::int from ${users})`,
      teams: sql<number>`(select count(*)::int from ${teams})`,
      memberships: sql<number>`(select count(*)::int from ${memberships})`,
    })
    .from(sql`(select 1) as one`);
  return row;
}

describe('demo seed', () => {
  it('changes nothing when run again', async () => {
    const before = await counts();
    const result = await seedDemo();
    expect(result.created).toBe(0);
    expect(await counts()).toEqual(before);
  });
});

describe('sendMail', () => {
  it('delivers through the local SMTP fake into captured mail and marks the outbox row sent', async () => {
    const to = `mail-test-${Date.now()}@example.com`;
    const result = await sendMail({ to, subject: 'Exposure matrix for run 12 — 405 nm', text: 'Dose steps: 80, 90, 100 mJ/cm²', kind: 'test' });
    expect(result.sent).toBe(true);
    const [outbox] = await db.select().from(mailOutbox).where(eq(mailOutbox.id, result.id));
    expect(outbox.status).toBe('sent');
    let captured: (typeof capturedMail.$inferSelect)[] = [];
    for (let i = 0; i < 40 && captured.length === 0; i++) {
      captured = await db.select().from(capturedMail).where(sql`${to} = any(${capturedMail.envelopeTo})`);
      if (captured.length === 0) await new Promise((r) => setTimeout(r, 100));
    }
    expect(captured).toHaveLength(1);
    expect(captured[0].subject).toBe('Exposure matrix for run 12 — 405 nm');
    expect(captured[0].textBody.trim()).toBe('Dose steps: 80, 90, 100 mJ/cm²');
  });

  it('keeps the message in the outbox as failed, with the reason, when no mail server answers', async () => {
    const previous = process.env.SMTP_PORT;
    // A fresh module instance so the transport is built for the closed port.
    process.env.SMTP_PORT = '9';
    try {
      const { vi } = await import('vitest');
      vi.resetModules();
      const fresh = await import('@/lib/mail/send');
      const result = await fresh.sendMail({ to: 'nobody@example.com', subject: 'kept', text: 'kept', kind: 'test' });
      expect(result.sent).toBe(false);
      const [row] = await db.select().from(mailOutbox).where(eq(mailOutbox.id, result.id));
      expect(row.status).toBe('failed');
      expect(row.lastError).toMatch(/ECONNREFUSED/);
      expect(row.textBody).toBe('kept');
    } finally {
      process.env.SMTP_PORT = previous;
    }
  });
});

describe('sessions', () => {
  it('sign a user in with the demo password and read the session back', async () => {
    const cookie = await signInCookie('fab@example.com');
    const session = await api('/api/auth/session', { cookie });
    expect(session.body.user.email).toBe('fab@example.com');
  });

  it('are sealed with the persisted secret alone, so they survive a server restart', async () => {
    const cookie = await signInCookie('viewer@example.com');
    const token = cookie.split('; ').find((c) => c.startsWith('next-auth.session-token='))!.split('=').slice(1).join('=');
    const claims = await decode({ token, secret: authSecret() });
    const [viewer] = await db.select({ id: users.id }).from(users).where(eq(users.email, 'viewer@example.com'));
    expect(claims?.sub).toBe(viewer.id);
  });

  it('refuse a wrong password', async () => {
    await expect(signInCookie('fab@example.com', 'wrong-password')).rejects.toThrow(/failed/);
  });
});
