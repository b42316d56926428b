'use client';

import { useRouter } from 'next/navigation';
import { useState, type FormEvent } from 'react';
import { Button, Field, Notice, Select, TextInput } from '@/components/ui';
import { ROLE_LABELS, TEAM_ROLES } from '@/lib/auth/roles';
import { callApi } from './api-call';

export function InviteForm({ teamId }: { teamId: string }) {
  const router = useRouter();
  const [result, setResult] = useState<{ tone: 'success' | 'warning' | 'error'; text: string } | null>(null);
  const [busy, setBusy] = useState(false);

  async function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const formElement = event.currentTarget;
    const form = new FormData(formElement);
    setBusy(true);
    setResult(null);
    try {
      const body = await callApi<{ mailSent: boolean; invitation: { email: string } }>('/api/team/invitations', {
        method: 'POST',
        body: { teamId, email: form.get('email'), role: form.get('role') },
      });
      setResult(
        body.mailSent
          ? { tone: 'success', text: `Invitation sent to ${body.invitation.email}.` }
          : { tone: 'warning', text: `The invitation for ${body.invitation.email} is saved, but the e-mail could not be sent now; it is kept in the outbox.` },
      );
      formElement.reset();
      router.refresh();
    } catch (e) {
      setResult({ tone: 'error', text: e instanceof Error ? e.message : String(e) });
    } finally {
      setBusy(false);
    }
  }

  return (
    <form onSubmit={submit} className="flex flex-col gap-3" aria-label="Invite by e-mail" noValidate>
      <div className="grid grid-cols-[1fr_10rem] gap-3">
        <Field label="E-mail">{(p) => <TextInput {...p} name="email" type="email" required placeholder="name@example.com" />}</Field>
        <Field label="Role">
          {(p) => (
            <Select {...p} name="role" defaultValue="designer">
              {TEAM_ROLES.map((r) => (
                <option key={r} value={r}>
                  {ROLE_LABELS[r]}
                </option>
              ))}
            </Select>
          )}
        </Field>
      </div>
      {result ? <Notice tone={result.tone}>{result.text}</Notice> : null}
      <div>
        <Button type="submit" tone="primary" disabled={busy}>
          {busy ? 'Sending…' : 'Send invitation'}
        </Button>
      </div>
    </form>
  );
}
