'use client';

/** A read-only script with clickable line numbers (a click picks that line, e.g. as a comment anchor). */
export function ScriptLines({ source, onPickLine, highlight }: { source: string; onPickLine?: (line: number) => void; highlight?: number | null }) {
  const lines = source.split('\n');
  return (
    <div className="max-h-[560px] overflow-auto rounded border border-hairline bg-white" data-testid="script-lines">
      <table className="w-full border-collapse font-mono text-xs leading-5">
        <tbody>
          {lines.map((text, i) => (
            <tr key={i} id={`line-${i + 1}`} className={highlight === i + 1 ? 'bg-accent/10' : undefined}>
              <td className="w-10 select-none border-r border-hairline pr-2 text-right align-top text-ink/50">
                {onPickLine ? (
                  <button type="button" className="hover:text-ink hover:underline" title={`Comment on line ${i + 1}`} onClick={() => onPickLine(i + 1)}>
                    {i + 1}
                  </button>
                ) : (
                  i + 1
                )}
              </td>
              <td className="whitespace-pre-wrap break-all pl-3">{text || ' '}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
