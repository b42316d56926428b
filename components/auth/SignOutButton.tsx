'use client';

import { signOut } from 'next-auth/react';
import { Button } from '@/components/ui';

export function SignOutButton() {
  return (
    <Button tone="quiet" onClick={() => signOut({ callbackUrl: '/sign-in' })}>
      Sign out
    </Button>
  );
}
