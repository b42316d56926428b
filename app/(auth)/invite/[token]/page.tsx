import type { Metadata } from 'next';
import Link from 'next/link';
import { AcceptInvitation } from '@/components/auth/AcceptInvitation';
import { Notice } from '@/components/ui';
import { getCurrentUser } from '@/app/_server/session';
import { findInvitation, INVALID_INVITATION } from '@/app/_server/team';
import { ROLE_LABELS } from '@/lib/auth';

export const metadata: Metadata = { title: 'Invitation' };
export const dynamic = 'force-dynamic';

export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const invitation = token.length <= 200 ? await findInvitation(token) : null;
  if (!invitation) {
    return (
      <div className="flex flex-col gap-4">
        <h1 className="text-xl font-semibold">Invitation</h1>
        <Notice tone="warning">{INVALID_INVITATION}</Notice>
        <Link href="/sign-in" className="text-sm underline">
          Go to sign in
        </Link>
      </div>
    );
  }
  const user = await getCurrentUser();
  const intro = (
    <p>
      You are invited to <strong>{invitation.teamName}</strong> as {ROLE_LABELS[invitation.role].toLowerCase()}, with the address{' '}
      <strong>{invitation.email}</strong>.
    </p>
  );
  if (invitation.accountId && user?.id !== invitation.accountId) {
    const back = `/invite/${encodeURIComponent(token)}`;
    return (
      <div className="flex flex-col gap-4">
        <h1 className="text-xl font-semibold">Invitation</h1>
        {intro}
        <Notice>
          {user ? `You are signed in as ${user.email}. Sign out, then ` : ''}Sign in as {invitation.email} to accept.
        </Notice>
        <Link href={`/sign-in?callbackUrl=${encodeURIComponent(back)}`} className="text-sm underline">
          Sign in as {invitation.email}
        </Link>
      </div>
    );
  }
  return (
    <div className="flex flex-col gap-4">
      <h1 className="text-xl font-semibold">Invitation</h1>
      {intro}
      <AcceptInvitation token={token} email={invitation.email} newAccount={!invitation.accountId} />
    </div>
  );
}
