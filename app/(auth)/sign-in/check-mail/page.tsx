import type { Metadata } from 'next';
import Link from 'next/link';
import { Notice } from '@/components/ui';
import { isLocalRun } from '@/lib/mail';

export const metadata: Metadata = { title: 'Check your mail' };
export const dynamic = 'force-dynamic';

export default async function CheckMailPage({ searchParams }: { searchParams: Promise<{ email?: string }> }) {
  const { email } = await searchParams;
  return (
    <div className="flex flex-col gap-4">
      <h1 className="text-xl font-semibold">Check your mail</h1>
      <p>
        If {email ? <strong>{email}</strong> : 'that address'} has a Zonewright account, a sign-in link is on its way. It works
        once, within 15 minutes.
      </p>
      {isLocalRun() ? (
        <Notice>This is a local run: mail goes to the local Mailbox, which any signed-in user can open.</Notice>
      ) : null}
      <Link href="/sign-in" className="text-sm underline">
        Back to sign in
      </Link>
    </div>
  );
}
