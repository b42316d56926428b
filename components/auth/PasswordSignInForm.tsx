'use client';

import { signIn } from 'next-auth/react';
import { useRouter } from 'next/navigation';
import { useState, type FormEvent } from 'react';
import { Button, Field, Notice, TextInput } from '@/components/ui';

/** One message for a wrong password and an unknown address, so the form reveals nothing. */
export const WRONG_CREDENTIALS = 'That e-mail and password do not match an account.';

export function PasswordSignInForm({ returnTo }: { returnTo: string }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    setBusy(true);
    setError(null);
    try {
      const result = await signIn('password', {
        email: String(form.get('email') ?? ''),
        password: String(form.get('password') ?? ''),
        redirect: false,
      });
      if (!result || result.error) {
        setError(result?.error === 'CredentialsSignin' || !result ? WRONG_CREDENTIALS : 'Signing in failed. Try again in a moment.');
        return;
      }
      router.replace(returnTo);
      router.refresh();
    } catch {
      setError('The server could not be reached. Check your connection and try again.');
    } finally {
      setBusy(false);
    }
  }

  return (
    <form onSubmit={submit} className="flex flex-col gap-3" aria-label="Sign in with password" noValidate>
      <Field label="E-mail">{(p) => <TextInput {...p} name="email" type="email" autoComplete="username" required />}</Field>
      <Field label="Password">
        {(p) => <TextInput {...p} name="password" type="password" autoComplete="current-password" required />}
      </Field>
      {error ? <Notice tone="error">{error}</Notice> : null}
      <Button type="submit" tone="primary" disabled={busy}>
        {busy ? 'Signing in…' : 'Sign in'}
      </Button>
    </form>
  );
}
