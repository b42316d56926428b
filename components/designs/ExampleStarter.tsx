'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button, Notice, Select } from '@/components/ui';
import { ApiFailure, callApi, sendJson } from '@/components/workspace/api';

export interface ExampleInfo {
  /** file name in examples/ without ".zw" */
  id: string;
  title: string;
  summary: string;
}

/** Starts a new design from one of the bundled example scripts, in a team where the user may create designs. */
export function ExampleStarter({ examples, teams }: { examples: ExampleInfo[]; teams: { id: string; name: string }[] }) {
  const router = useRouter();
  const [teamId, setTeamId] = useState(teams[0]?.id ?? '');
  const [busy, setBusy] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);

  const start = async (example: ExampleInfo) => {
    setBusy(example.id);
    setError(null);
    try {
      const { design } = await callApi<{ design: { id: string } }>(
        '/api/designs',
        sendJson('POST', { teamId, name: example.title, description: example.summary.slice(0, 2000), example: example.id }),
      );
      router.push(`/designs/${design.id}`);
    } catch (e) {
      setError(e instanceof ApiFailure ? e.message : String(e));
      setBusy(null);
    }
  };

  if (teams.length === 0) return <p className="text-ink/70">Only owners and designers start designs.</p>;
  return (
    <div className="flex flex-col gap-3" data-testid="examples">
      {teams.length > 1 ? (
        <label className="flex items-center gap-2 text-sm">
          Team
          <Select className="w-64" value={teamId} onChange={(e) => setTeamId(e.target.value)}>
            {teams.map((t) => (
              <option key={t.id} value={t.id}>
                {t.name}
              </option>
            ))}
          </Select>
        </label>
      ) : null}
      {error ? <Notice tone="error">{error}</Notice> : null}
      <ul className="grid grid-cols-1 gap-3 md:grid-cols-2">
        {examples.map((ex) => (
          <li key={ex.id} className="flex flex-col gap-2 rounded border border-hairline bg-white p-3">
            <p className="font-medium">{ex.title}</p>
            <p className="flex-1 text-xs text-ink/70">{ex.summary}</p>
            <div>
              <Button onClick={() => void start(ex)} disabled={busy !== null} aria-label={`Start a design from the example ${ex.title}`}>
                {busy === ex.id ? 'Creating…' : 'Start from this example'}
              </Button>
            </div>
          </li>
        ))}
      </ul>
    </div>
  );
}
