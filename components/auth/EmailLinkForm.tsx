'use client';

import { signIn } from 'next-auth/react';
import { useRouter } from 'next/navigation';
import { useState, type FormEvent } from 'react';
import { Button, Field, Notice, TextInput } from '@/components/ui';

/** Ask for a one-time sign-in link by e-mail. */
export function EmailLinkForm({ returnTo }: { returnTo: string }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const email = String(new FormData(event.currentTarget).get('email') ?? '').trim();
    if (!/^[^\s@]+@[^\s@]+\.[^\s@]+$/.test(email)) {
      setError('Enter an e-mail address such as name@example.com.');
      return;
    }
    setBusy(true);
    setError(null);
    try {
      const result = await signIn('email', { email, redirect: false, callbackUrl: returnTo });
      if (!result || result.error) {
        setError('The sign-in link could not be sent. Try again in a moment.');
        return;
      }
      router.push(`/sign-in/check-mail?email=${encodeURIComponent(email)}`);
    } catch {
      setError('The server could not be reached. Check your connection and try again.');
    } finally {
      setBusy(false);
    }
  }

  return (
    <form onSubmit={submit} className="flex flex-col gap-3" aria-label="Sign in with an e-mail link" noValidate>
      <Field label="E-mail" hint="We send a link that signs you in once, within 15 minutes.">
        {(p) => <TextInput {...p} name="email" type="email" autoComplete="email" required />}
      </Field>
      {error ? <Notice tone="error">{error}</Notice> : null}
      <Button type="submit" disabled={busy}>
        {busy ? 'Sending…' : 'E-mail me a sign-in link'}
      </Button>
    </form>
  );
}
