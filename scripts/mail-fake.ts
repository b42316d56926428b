/**
 * The local SMTP fake: accepts every message on 127.0.0.1:SMTP_PORT (default 2525) and stores it in
 * the captured_mail table of DATABASE_URL, where the Mailbox page reads it. Stands in for a hosted
 * mail service on local runs and in tests; it never relays anything.
 */
import { SMTPServer } from 'smtp-server';
import { simpleParser, type AddressObject } from 'mailparser';
import { closeDb, db } from '../db';
import { capturedMail } from '../db/schema';

const MAX_MESSAGE_BYTES = 10 * 1024 * 1024;

function addressText(value: AddressObject | AddressObject[] | undefined): string[] {
  const list = Array.isArray(value) ? value : value ? [value] : [];
  return list.flatMap((entry) => entry.value.map((a) => a.address ?? '')).filter(Boolean);
}

async function store(raw: Buffer, envelopeFrom: string, envelopeTo: string[]): Promise<void> {
  const parsed = await simpleParser(raw);
  await db.insert(capturedMail).values({
    envelopeFrom: envelopeFrom || addressText(parsed.from)[0] || '',
    envelopeTo: envelopeTo.length > 0 ? envelopeTo : addressText(parsed.to),
    subject: parsed.subject ?? '',
    textBody: parsed.text ?? '',
    htmlBody: typeof parsed.html === 'string' ? parsed.html : null,
    raw: raw.toString('utf8'),
  });
}

function main(): void {
  const port = Number(process.env.SMTP_PORT || 2525);
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    size: MAX_MESSAGE_BYTES,
    banner: 'Zonewright local mail fake',
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (chunk: Buffer) => chunks.push(chunk));
      stream.on('end', () => {
        if ((stream as unknown as { sizeExceeded?: boolean }).sizeExceeded) {
          callback(Object.assign(new Error('message too large'), { responseCode: 552 }));
          return;
        }
        const from = session.envelope.mailFrom ? session.envelope.mailFrom.address : '';
        const to = session.envelope.rcptTo.map((r) => r.address);
        store(Buffer.concat(chunks), from, to).then(
          () => callback(),
          (error: unknown) => {
            console.error(`[mail-fake] could not store a message: ${error instanceof Error ? error.message : String(error)}`);
            callback(Object.assign(new Error('temporary storage failure'), { responseCode: 451 }));
          },
        );
      });
    },
  });
  server.on('error', (error) => console.error(`[mail-fake] ${error.message}`));
  server.listen(port, '127.0.0.1', () => console.log(`[mail-fake] listening on 127.0.0.1:${port}`));

  const stop = () => server.close(() => closeDb().finally(() => process.exit(0)));
  process.on('SIGTERM', stop);
  process.on('SIGINT', stop);
}

main();
