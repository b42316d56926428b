import { and, arrayContains, desc, eq } from 'drizzle-orm';
import { db } from '@/db';
import { capturedMail } from '@/db/schema';

/** Captured messages, newest first; `to` keeps those addressed to one recipient. */
export async function listCapturedMail(options: { to?: string; limit?: number } = {}) {
  return db
    .select({
      id: capturedMail.id,
      from: capturedMail.envelopeFrom,
      to: capturedMail.envelopeTo,
      subject: capturedMail.subject,
      text: capturedMail.textBody,
      receivedAt: capturedMail.receivedAt,
    })
    .from(capturedMail)
    .where(options.to ? arrayContains(capturedMail.envelopeTo, [options.to.toLowerCase()]) : undefined)
    .orderBy(desc(capturedMail.receivedAt))
    .limit(options.limit ?? 100);
}

export async function capturedMessage(id: string) {
  return (await db.select().from(capturedMail).where(and(eq(capturedMail.id, id))))[0] ?? null;
}
