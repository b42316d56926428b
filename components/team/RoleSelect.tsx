'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Select } from '@/components/ui';
import { ROLE_LABELS, TEAM_ROLES, type TeamRole } from '@/lib/auth/roles';
import { callApi } from './api-call';

/** An owner's control to change one member's role; the change is saved at once. */
export function RoleSelect({ teamId, userId, role, memberName }: { teamId: string; userId: string; role: TeamRole; memberName: string }) {
  const router = useRouter();
  const [value, setValue] = useState(role);
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function change(next: TeamRole) {
    setBusy(true);
    setError(null);
    const previous = value;
    setValue(next);
    try {
      await callApi(`/api/team/members/${userId}`, { method: 'PATCH', body: { teamId, role: next } });
      router.refresh();
    } catch (e) {
      setValue(previous);
      setError(e instanceof Error ? e.message : String(e));
    } finally {
      setBusy(false);
    }
  }

  return (
    <div className="flex flex-col gap-1">
      <Select aria-label={`Role of ${memberName}`} value={value} disabled={busy} onChange={(e) => change(e.target.value as TeamRole)} className="w-36">
        {TEAM_ROLES.map((r) => (
          <option key={r} value={r}>
            {ROLE_LABELS[r]}
          </option>
        ))}
      </Select>
      {error ? (
        <p role="alert" className="max-w-xs text-xs text-error">
          {error}
        </p>
      ) : null}
    </div>
  );
}
