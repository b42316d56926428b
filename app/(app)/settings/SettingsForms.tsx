'use client';

import { useActionState } from 'react';
import { Button, Field, Notice, TextInput } from '@/components/ui';
import { MIN_PASSWORD_LENGTH } from '@/lib/auth/team-schemas';
import { changePassword, saveProfile, savePreferences, type FormState } from './actions';

const initial: FormState = { ok: false, message: '' };

function Outcome({ state }: { state: FormState }) {
  if (!state.message) return null;
  return <Notice tone={state.ok ? 'success' : 'error'}>{state.message}</Notice>;
}

export function ProfileForm({ name, email }: { name: string; email: string }) {
  const [state, action, pending] = useActionState(saveProfile, initial);
  return (
    <form action={action} className="flex flex-col gap-3" aria-label="Profile">
      <Field label="Name" error={state.problems?.name}>
        {(p) => <TextInput {...p} name="name" defaultValue={name} maxLength={120} required />}
      </Field>
      <p className="text-sm text-ink/70">
        E-mail: <strong>{email}</strong> (the address you sign in with)
      </p>
      <Outcome state={state} />
      <div>
        <Button type="submit" tone="primary" disabled={pending}>
          Save profile
        </Button>
      </div>
    </form>
  );
}

export function PasswordForm({ hasPassword }: { hasPassword: boolean }) {
  const [state, action, pending] = useActionState(changePassword, initial);
  return (
    <form action={action} className="flex flex-col gap-3" aria-label="Password">
      {hasPassword ? (
        <Field label="Current password" error={state.problems?.current}>
          {(p) => <TextInput {...p} name="current" type="password" autoComplete="current-password" />}
        </Field>
      ) : (
        <p className="text-sm text-ink/70">You sign in by e-mail link; set a password to sign in with it too.</p>
      )}
      <Field label="New password" hint={`At least ${MIN_PASSWORD_LENGTH} characters.`} error={state.problems?.next}>
        {(p) => <TextInput {...p} name="next" type="password" autoComplete="new-password" />}
      </Field>
      <Field label="New password again" error={state.problems?.confirm}>
        {(p) => <TextInput {...p} name="confirm" type="password" autoComplete="new-password" />}
      </Field>
      <Outcome state={state} />
      <div>
        <Button type="submit" disabled={pending}>
          Change password
        </Button>
      </div>
    </form>
  );
}

export function PreferencesForm({ fields, values }: { fields: Record<string, string>; values: Record<string, boolean> }) {
  const [state, action, pending] = useActionState(savePreferences, initial);
  return (
    <form action={action} className="flex flex-col gap-3" aria-label="E-mail preferences">
      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 text-sm text-ink/70">Send me an e-mail when:</legend>
        {Object.entries(fields).map(([field, label]) => (
          <label key={field} className="flex items-center gap-2">
            <input type="checkbox" name={field} defaultChecked={values[field]} className="h-4 w-4 accent-accent" />
            {label}
          </label>
        ))}
      </fieldset>
      <Outcome state={state} />
      <div>
        <Button type="submit" disabled={pending}>
          Save e-mail preferences
        </Button>
      </div>
    </form>
  );
}
