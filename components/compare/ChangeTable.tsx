import type { ParameterRow } from '@/lib/workflow/parameter-diff';
import { parameterLabel } from '@/lib/workflow/parameter-label';
import { formatDelta, formatValue } from './format';

const MARK: Record<ParameterRow['change'], { text: string; className: string }> = {
  changed: { text: 'changed', className: 'text-ink' },
  added: { text: 'added', className: 'text-added' },
  removed: { text: 'removed', className: 'text-removed' },
  unchanged: { text: '', className: 'text-ink/50' },
};

function Rows({ rows }: { rows: ParameterRow[] }) {
  return (
    <>
      {rows.map((row) => (
        <tr key={row.path} className="border-t border-hairline align-top" data-change={row.change}>
          <td className="py-1 pr-4 text-xs" title={row.path} data-testid="change-label">
            {parameterLabel(row.path)}
          </td>
          <td className={`py-1 pr-4 font-mono text-xs ${row.change === 'removed' || row.change === 'changed' ? 'text-removed' : ''}`}>{formatValue(row.before)}</td>
          <td className={`py-1 pr-4 font-mono text-xs ${row.change === 'added' || row.change === 'changed' ? 'text-added' : ''}`}>{formatValue(row.after)}</td>
          <td className="py-1 pr-4 font-mono text-xs">{formatDelta(row.delta)}</td>
          <td className={`py-1 text-xs ${MARK[row.change].className}`}>{MARK[row.change].text}</td>
        </tr>
      ))}
    </>
  );
}

/**
 * Values of revision A and B side by side: what changed first, unchanged values folded away.
 * Before-values that changed are amber, after-values teal, as everywhere differences are shown.
 */
export function ChangeTable({ rows, labelA, labelB, empty }: { rows: ParameterRow[]; labelA: string; labelB: string; empty: string }) {
  if (rows.length === 0) return <p className="text-sm text-ink/60">{empty}</p>;
  const changed = rows.filter((r) => r.change !== 'unchanged');
  const same = rows.filter((r) => r.change === 'unchanged');
  const head = (
    <thead>
      <tr className="text-left text-xs text-ink/70">
        <th className="py-1 pr-4 font-medium">value</th>
        <th className="py-1 pr-4 font-medium">{labelA}</th>
        <th className="py-1 pr-4 font-medium">{labelB}</th>
        <th className="py-1 pr-4 font-medium">difference</th>
        <th className="py-1 font-medium" />
      </tr>
    </thead>
  );
  return (
    <div className="flex flex-col gap-2">
      <p className="text-sm">
        {changed.length === 0 ? 'No value differs.' : `${changed.length} of ${rows.length} values differ.`}
      </p>
      {changed.length > 0 ? (
        <table className="w-full border-collapse">
          {head}
          <tbody>
            <Rows rows={changed} />
          </tbody>
        </table>
      ) : null}
      {same.length > 0 ? (
        <details>
          <summary className="cursor-pointer text-sm text-ink/70">Unchanged values ({same.length})</summary>
          <table className="mt-2 w-full border-collapse">
            {head}
            <tbody>
              <Rows rows={same} />
            </tbody>
          </table>
        </details>
      ) : null}
    </div>
  );
}
