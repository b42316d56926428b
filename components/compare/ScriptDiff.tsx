'use client';

import { ScriptDiffEditor } from '@/components/script-editor';
import { lineChangeCounts } from '@/lib/workflow/line-diff';

/** The two scripts side by side in the diff editor, with the count of lines added and removed. */
export function ScriptDiff({ original, modified }: { original: string; modified: string }) {
  const { added, removed } = lineChangeCounts(original, modified);
  return (
    <div className="flex flex-col gap-2" data-testid="script-diff">
      <p className="text-sm">
        {added === 0 && removed === 0 ? (
          'The scripts are identical.'
        ) : (
          <>
            <span className="font-mono text-added">+{added}</span> <span className="font-mono text-removed">−{removed}</span> lines (A on the left, B on the right)
          </>
        )}
      </p>
      <ScriptDiffEditor original={original} modified={modified} />
    </div>
  );
}
