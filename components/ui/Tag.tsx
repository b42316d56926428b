import type { ReactNode } from 'react';

/** A small outlined label, e.g. a role or a revision state. */
export function Tag({ children, title }: { children: ReactNode; title?: string }) {
  return (
    <span title={title} className="inline-flex h-5 items-center rounded border border-hairline bg-paper px-2 text-xs text-ink/80">
      {children}
    </span>
  );
}
