import { Select } from '@/components/ui';
import { buttonClass } from '@/components/ui';
import { STATE_LABELS, isRevisionState } from '@/lib/workflow/states';

export interface PickableRevision {
  id: string;
  number: number;
  message: string;
  state: string;
}

function optionText(r: PickableRevision): string {
  const state = isRevisionState(r.state) ? STATE_LABELS[r.state] : r.state;
  const message = r.message.length > 48 ? `${r.message.slice(0, 47)}…` : r.message;
  return `${r.number} · ${state}${message ? ` · ${message}` : ''}`;
}

/** Two revision choosers and a Compare button; a plain GET form, so it works before any script loads. */
export function RevisionPicker({ revisions, a, b }: { revisions: PickableRevision[]; a: string; b: string }) {
  return (
    <form method="get" action="/compare" className="flex flex-wrap items-end gap-3" aria-label="Choose revisions">
      <RevisionSelect name="a" caption="A (before)" value={a} revisions={revisions} />
      <RevisionSelect name="b" caption="B (after)" value={b} revisions={revisions} />
      <button type="submit" className={buttonClass('secondary')}>
        Compare
      </button>
    </form>
  );
}

function RevisionSelect({ name, caption, value, revisions }: { name: 'a' | 'b'; caption: string; value: string; revisions: PickableRevision[] }) {
  return (
    <label className="flex flex-col gap-1 text-sm">
      <span className="font-medium">{caption}</span>
      <Select name={name} defaultValue={value} className="w-72">
        {revisions.map((r) => (
          <option key={r.id} value={r.id}>
            {optionText(r)}
          </option>
        ))}
      </Select>
    </label>
  );
}
