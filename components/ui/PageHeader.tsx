import type { ReactNode } from 'react';

export function PageHeader({ title, lead, actions }: { title: string; lead?: ReactNode; actions?: ReactNode }) {
  return (
    <div className="mb-6 flex items-end justify-between gap-4">
      <div>
        <h1 className="text-xl font-semibold">{title}</h1>
        {lead ? <p className="mt-1 text-sm text-ink/70">{lead}</p> : null}
      </div>
      {actions}
    </div>
  );
}
