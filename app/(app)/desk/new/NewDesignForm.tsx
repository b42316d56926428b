'use client';

import { useRouter } from 'next/navigation';
import { useState, type FormEvent } from 'react';
import { Button, Field, Notice, TextInput } from '@/components/ui';
import { controlClass } from '@/components/ui/Field';

interface Problem {
  path: string;
  message: string;
}

export function NewDesignForm({ teamId }: { teamId: string }) {
  const router = useRouter();
  const [problems, setProblems] = useState<Problem[]>([]);
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const problemAt = (path: string) => problems.find((p) => p.path === path)?.message;

  async function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    setBusy(true);
    setError(null);
    setProblems([]);
    try {
      const response = await fetch('/api/designs', {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({ teamId, name: form.get('name'), description: form.get('description') }),
      });
      const body = await response.json().catch(() => null);
      if (response.ok && body?.design?.id) {
        router.push(`/designs/${body.design.id}`);
        return;
      }
      setProblems(Array.isArray(body?.problems) ? body.problems : []);
      setError(body?.error ?? `The design could not be created (HTTP ${response.status}).`);
    } catch {
      setError('The server could not be reached. Nothing was saved; try again.');
    } finally {
      setBusy(false);
    }
  }

  return (
    <form onSubmit={submit} className="flex flex-col gap-4" noValidate>
      <Field label="Name" error={problemAt('name')} hint="For example: 405 nm bifocal test lens, f = 5 mm and 8 mm">
        {(p) => <TextInput {...p} name="name" maxLength={120} required autoFocus />}
      </Field>
      <Field label="Description" error={problemAt('description')} hint="Optional: what it is for, which run it belongs to.">
        {(p) => <textarea {...p} name="description" rows={3} maxLength={2000} className={`${controlClass} h-auto py-1`} />}
      </Field>
      {error ? <Notice tone="error">{error}</Notice> : null}
      <div>
        <Button type="submit" tone="primary" disabled={busy}>
          {busy ? 'Creating…' : 'Create design'}
        </Button>
      </div>
    </form>
  );
}
