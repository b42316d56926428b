import type { ReactNode } from 'react';

/** A hairline-bordered section with an optional heading row (no shadow: shadows are for floating menus). */
export function Panel({ title, actions, children, id }: { title?: string; actions?: ReactNode; children: ReactNode; id?: string }) {
  return (
    <section id={id} className="rounded border border-hairline bg-white">
      {title || actions ? (
        <header className="flex items-center justify-between gap-4 border-b border-hairline px-4 py-2">
          {title ? <h2 className="text-sm font-semibold">{title}</h2> : <span />}
          {actions}
        </header>
      ) : null}
      <div className="p-4">{children}</div>
    </section>
  );
}
