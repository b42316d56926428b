/**
 * Send one e-mail: it is written to mail_outbox first, then handed to SMTP, and the row records
 * the outcome, so a mail server that is down loses nothing (the row stays 'failed' with the reason).
 */
import nodemailer, { type Transporter } from 'nodemailer';
import { eq, sql } from 'drizzle-orm';
import { db } from '../../db';
import { mailOutbox } from '../../db/schema';
import { mailConfig } from './config';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html?: string;
  /** What the mail is about, e.g. 'sign-in-link', 'invitation', 'review-requested'. */
  kind: string;
}

export interface SendResult {
  id: string;
  sent: boolean;
  error?: string;
}

let transporter: Transporter | undefined;

function transport(): Transporter {
  if (!transporter) {
    const config = mailConfig();
    transporter = nodemailer.createTransport({
      host: config.host,
      port: config.port,
      secure: config.secure,
      auth: config.user ? { user: config.user, pass: config.password ?? '' } : undefined,
      // The local fake speaks plain SMTP; a hosted server negotiates TLS on its own.
      ignoreTLS: !config.secure && !config.user,
      connectionTimeout: 10_000,
    });
  }
  return transporter;
}

export async function sendMail(mail: OutgoingMail): Promise<SendResult> {
  const [row] = await db
    .insert(mailOutbox)
    .values({ toAddress: mail.to, subject: mail.subject, textBody: mail.text, htmlBody: mail.html ?? null, kind: mail.kind })
    .returning({ id: mailOutbox.id });
  try {
    await transport().sendMail({ from: mailConfig().from, to: mail.to, subject: mail.subject, text: mail.text, html: mail.html });
    await db
      .update(mailOutbox)
      .set({ status: 'sent', sentAt: new Date(), attempts: sql`${mailOutbox.attempts} + 1` })
      .where(eq(mailOutbox.id, row.id));
    return { id: row.id, sent: true };
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    console.error(`[mail] sending ${mail.kind} to ${mail.to} failed: ${message}`);
    await db
      .update(mailOutbox)
      .set({ status: 'failed', lastError: message, attempts: sql`${mailOutbox.attempts} + 1` })
      .where(eq(mailOutbox.id, row.id));
    return { id: row.id, sent: false, error: message };
  }
}
