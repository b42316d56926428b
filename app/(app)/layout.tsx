import Link from 'next/link';
import type { ReactNode } from 'react';
import { AppNav } from '@/components/shell/AppNav';
import { SignInRedirect } from '@/components/shell/SignInRedirect';
import { visibleNav } from '@/components/shell/visible-nav';
import { SignOutButton } from '@/components/auth/SignOutButton';
import { Tag } from '@/components/ui';
import { allows, currentMembership, getCurrentUser } from '@/app/_server/session';
import { ROLE_LABELS } from '@/lib/auth';

export const dynamic = 'force-dynamic';

export default async function AppLayout({ children }: { children: ReactNode }) {
  const user = await getCurrentUser();
  // A layout does not know the page's path; the client-side redirect keeps it for after sign-in.
  if (!user) return <SignInRedirect />;
  const membership = await currentMembership(user);
  const links = visibleNav(membership?.actor ?? { userId: user.id, role: null }, allows);

  return (
    <div className="flex min-h-screen flex-col">
      <header className="flex h-12 items-center gap-6 border-b border-hairline bg-paper px-4">
        <Link href="/desk" className="text-sm font-semibold tracking-tight no-underline">
          Zonewright
        </Link>
        <AppNav links={links} />
        <div className="ml-auto flex items-center gap-3 text-sm">
          {membership ? (
            <span className="flex items-center gap-2" data-testid="current-team">
              <span className="text-ink/70">{membership.team.name}</span>
              <Tag title="Your role in this team">{ROLE_LABELS[membership.role]}</Tag>
            </span>
          ) : null}
          <span className="text-ink/70" data-testid="current-user">
            {user.name || user.email}
          </span>
          <SignOutButton />
        </div>
      </header>
      <main className="flex-1 px-6 py-6">{children}</main>
    </div>
  );
}
