import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { LinkifiedText } from '@/components/shell/LinkifiedText';
import { DateTime, Notice, PageHeader, Panel } from '@/components/ui';
import { capturedMessage } from '@/app/_server/mailbox';
import { allows, pageUser } from '@/app/_server/session';

export const metadata: Metadata = { title: 'Mailbox' };
export const dynamic = 'force-dynamic';

export default async function MailboxMessagePage({ params }: { params: Promise<{ messageId: string }> }) {
  const { messageId } = await params;
  const user = await pageUser(`/mailbox/${messageId}`);
  if (!allows({ userId: user.id, role: null }, 'mailbox.view')) {
    return <Notice>The Mailbox exists only on local runs.</Notice>;
  }
  const message = /^[0-9a-f-]{36}$/i.test(messageId) ? await capturedMessage(messageId) : null;
  if (!message) notFound();
  return (
    <div className="mx-auto flex max-w-3xl flex-col gap-4">
      <Link href="/mailbox" className="text-sm">
        ← Mailbox
      </Link>
      <PageHeader title={message.subject || '(no subject)'} />
      <Panel>
        <dl className="mb-4 grid grid-cols-[6rem_1fr] gap-y-1 text-sm">
          <dt className="text-ink/60">From</dt>
          <dd>{message.envelopeFrom}</dd>
          <dt className="text-ink/60">To</dt>
          <dd>{message.envelopeTo.join(', ')}</dd>
          <dt className="text-ink/60">Received</dt>
          <dd>
            <DateTime value={message.receivedAt} />
          </dd>
        </dl>
        <LinkifiedText text={message.textBody} />
      </Panel>
    </div>
  );
}
