import type { Metadata } from 'next';
import Link from 'next/link';
import { DateTime, Notice, PageHeader, Panel } from '@/components/ui';
import { listCapturedMail } from '@/app/_server/mailbox';
import { allows, pageUser } from '@/app/_server/session';

export const metadata: Metadata = { title: 'Mailbox' };
export const dynamic = 'force-dynamic';

export default async function MailboxPage() {
  const user = await pageUser('/mailbox');
  if (!allows({ userId: user.id, role: null }, 'mailbox.view')) {
    return (
      <div className="mx-auto max-w-3xl">
        <PageHeader title="Mailbox" />
        <Notice>The Mailbox exists only on local runs, where mail goes to the local SMTP fake. This server sends real mail.</Notice>
      </div>
    );
  }
  const messages = await listCapturedMail({ limit: 200 });
  return (
    <div className="mx-auto flex max-w-4xl flex-col gap-6">
      <PageHeader
        title="Mailbox"
        lead="Local run: every e-mail the app sends is caught here instead of being delivered. Everyone signed in sees all of it."
      />
      <Panel title={`Messages (${messages.length})`}>
        {messages.length === 0 ? (
          <p className="text-ink/70">No mail yet.</p>
        ) : (
          <table className="w-full text-left text-sm">
            <thead className="text-xs text-ink/60">
              <tr className="border-b border-hairline">
                <th className="py-1 pr-4 font-medium">To</th>
                <th className="py-1 pr-4 font-medium">Subject</th>
                <th className="py-1 font-medium">Received</th>
              </tr>
            </thead>
            <tbody>
              {messages.map((m) => (
                <tr key={m.id} className="border-b border-hairline last:border-0">
                  <td className="py-2 pr-4">{m.to.join(', ')}</td>
                  <td className="py-2 pr-4">
                    <Link href={`/mailbox/${m.id}`}>{m.subject || '(no subject)'}</Link>
                  </td>
                  <td className="py-2">
                    <DateTime value={m.receivedAt} />
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </Panel>
    </div>
  );
}
