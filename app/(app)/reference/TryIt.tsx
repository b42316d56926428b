'use client';

import { useState } from 'react';
import { ScriptEditor } from '@/components/script-editor';
import type { Diagnostic } from '@/lib/lang';

/** A scratch editor on the reference page: type a script, see the checker's verdict live. Nothing is saved. */
export function TryIt({ initial }: { initial: string }) {
  const [script, setScript] = useState(initial);
  const [diagnostics, setDiagnostics] = useState<Diagnostic[] | null>(null);
  const errors = diagnostics?.filter((d) => d.severity === 'error').length ?? 0;
  return (
    <div className="space-y-2">
      <ScriptEditor value={script} onChange={setScript} onDiagnostics={setDiagnostics} height={300} />
      <p className="text-sm" data-testid="try-it-status" aria-live="polite">
        {diagnostics === null ? 'Checking…' : diagnostics.length === 0 ? 'clean' : `${diagnostics.length} problem${diagnostics.length === 1 ? '' : 's'}${errors ? ` (${errors} error${errors === 1 ? '' : 's'})` : ''}`}
      </p>
      {diagnostics && diagnostics.length > 0 ? (
        <ul className="space-y-1 font-mono text-xs">
          {diagnostics.map((d, i) => (
            <li key={i} className={d.severity === 'error' ? 'text-error' : 'text-warning'}>
              {d.start.line}:{d.start.column} {d.severity}: {d.message}
              {d.hint ? <span className="text-ink/70"> — {d.hint}</span> : null}
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
