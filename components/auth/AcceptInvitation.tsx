'use client';

import { signIn } from 'next-auth/react';
import { useRouter } from 'next/navigation';
import { useState, type FormEvent } from 'react';
import { callApi } from '@/components/team/api-call';
import { Button, Field, Notice, TextInput } from '@/components/ui';
import { MIN_PASSWORD_LENGTH } from '@/lib/auth/team-schemas';

/** Accept an invitation: one button for an existing account, a name and password for a new one. */
export function AcceptInvitation({ token, email, newAccount }: { token: string; email: string; newAccount: boolean }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const password = String(form.get('password') ?? '');
    if (newAccount && password !== String(form.get('confirm') ?? '')) {
      setError('The two passwords differ.');
      return;
    }
    setBusy(true);
    setError(null);
    try {
      await callApi('/api/team/invitations/accept', {
        method: 'POST',
        body: newAccount ? { token, name: String(form.get('name') ?? ''), password } : { token },
      });
      if (newAccount) {
        const result = await signIn('password', { email, password, redirect: false });
        if (!result || result.error) throw new Error('Your account is ready, but signing in failed. Sign in with your new password.');
      }
      router.replace('/desk');
      router.refresh();
    } catch (e) {
      setError(e instanceof Error ? e.message : String(e));
    } finally {
      setBusy(false);
    }
  }

  return (
    <form onSubmit={submit} className="flex flex-col gap-3" aria-label="Accept the invitation" noValidate>
      {newAccount ? (
        <>
          <Field label="Your name">{(p) => <TextInput {...p} name="name" autoComplete="name" required maxLength={120} />}</Field>
          <Field label="Password" hint={`At least ${MIN_PASSWORD_LENGTH} characters.`}>
            {(p) => <TextInput {...p} name="password" type="password" autoComplete="new-password" required />}
          </Field>
          <Field label="Password again">{(p) => <TextInput {...p} name="confirm" type="password" autoComplete="new-password" required />}</Field>
        </>
      ) : null}
      {error ? <Notice tone="error">{error}</Notice> : null}
      <Button type="submit" tone="primary" disabled={busy}>
        {busy ? 'Joining…' : newAccount ? 'Create account and join' : 'Join the team'}
      </Button>
    </form>
  );
}
