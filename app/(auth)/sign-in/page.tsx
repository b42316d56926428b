import type { Metadata } from 'next';
import { redirect } from 'next/navigation';
import { EmailLinkForm } from '@/components/auth/EmailLinkForm';
import { PasswordSignInForm } from '@/components/auth/PasswordSignInForm';
import { safeReturnPath } from '@/components/auth/safe-return';
import { Notice } from '@/components/ui';
import { getCurrentUser } from '@/app/_server/session';
import { isLocalRun } from '@/lib/mail';
import { DEMO_PASSWORD, DEMO_ROLES } from '@/lib/auth/demo-accounts';

export const metadata: Metadata = { title: 'Sign in' };
export const dynamic = 'force-dynamic';

// Errors next-auth sends back here, in words that say what to do next.
const LINK_ERRORS: Record<string, string> = {
  Verification: 'That sign-in link has expired or was already used. Ask for a new one below.',
  AccessDenied: 'That address has no Zonewright account. Ask a team owner to invite you.',
  EmailSignin: 'The sign-in link could not be sent. Try again in a moment.',
  SessionRequired: 'Sign in to see that page.',
};

export default async function SignInPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const params = await searchParams;
  const returnTo = safeReturnPath(params.callbackUrl);
  if (await getCurrentUser()) redirect(returnTo);
  const error = typeof params.error === 'string' ? (LINK_ERRORS[params.error] ?? 'Signing in failed. Try again.') : null;

  return (
    <div className="flex flex-col gap-6">
      <h1 className="text-xl font-semibold">Sign in</h1>
      {error ? <Notice tone="error">{error}</Notice> : null}
      <PasswordSignInForm returnTo={returnTo} />
      <div className="flex items-center gap-3 text-xs text-ink/60">
        <span className="h-px flex-1 bg-hairline" />
        or
        <span className="h-px flex-1 bg-hairline" />
      </div>
      <EmailLinkForm returnTo={returnTo} />
      {isLocalRun() ? (
        <Notice title="Local run: demo accounts (demo data)">
          <p>
            {DEMO_ROLES.map((role) => `${role}@example.com`).join(', ')}; password <code>{DEMO_PASSWORD}</code>. Mail sent
            by this run lands in the Mailbox after you sign in.
          </p>
        </Notice>
      ) : null}
    </div>
  );
}
