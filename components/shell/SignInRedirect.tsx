'use client';

import { useEffect } from 'react';

/** Sends a signed-out visitor to sign in, coming back to the exact page (path and query) afterwards. */
export function SignInRedirect() {
  useEffect(() => {
    const here = `${window.location.pathname}${window.location.search}`;
    window.location.replace(`/sign-in?callbackUrl=${encodeURIComponent(here)}`);
  }, []);
  return <p className="p-6 text-sm">Taking you to sign in…</p>;
}
