'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button } from '@/components/ui';
import { callApi } from './api-call';

export function RevokeButton({ teamId, invitationId, email }: { teamId: string; invitationId: string; email: string }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  return (
    <span className="flex items-center gap-2">
      <Button
        tone="danger"
        aria-label={`Revoke the invitation for ${email}`}
        onClick={async () => {
          setError(null);
          try {
            await callApi(`/api/team/invitations/${invitationId}?teamId=${teamId}`, { method: 'DELETE' });
            router.refresh();
          } catch (e) {
            setError(e instanceof Error ? e.message : String(e));
          }
        }}
      >
        Revoke
      </Button>
      {error ? <span className="text-xs text-error">{error}</span> : null}
    </span>
  );
}
