'use client';

import { useId, useRef, type ReactNode } from 'react';

export interface TabSpec<T extends string> {
  id: T;
  label: string;
  badge?: ReactNode;
}

/** Tabs with the WAI-ARIA keyboard pattern (arrow keys move between tabs). Panels stay mounted when hidden. */
export function Tabs<T extends string>({
  tabs,
  active,
  onChange,
  panels,
  label,
}: {
  tabs: TabSpec<T>[];
  active: T;
  onChange: (id: T) => void;
  panels: Record<T, ReactNode>;
  label: string;
}) {
  const base = useId();
  const refs = useRef<Record<string, HTMLButtonElement | null>>({});
  const move = (delta: number) => {
    const index = tabs.findIndex((t) => t.id === active);
    const next = tabs[(index + delta + tabs.length) % tabs.length];
    onChange(next.id);
    refs.current[next.id]?.focus();
  };
  return (
    <div className="flex min-h-0 flex-col">
      <div role="tablist" aria-label={label} className="flex gap-1 border-b border-hairline">
        {tabs.map((t) => (
          <button
            key={t.id}
            ref={(el) => {
              refs.current[t.id] = el;
            }}
            role="tab"
            type="button"
            id={`${base}-tab-${t.id}`}
            aria-controls={`${base}-panel-${t.id}`}
            aria-selected={t.id === active}
            tabIndex={t.id === active ? 0 : -1}
            onClick={() => onChange(t.id)}
            onKeyDown={(e) => {
              if (e.key === 'ArrowRight') move(1);
              if (e.key === 'ArrowLeft') move(-1);
            }}
            className={`-mb-px flex items-center gap-2 border-b-2 px-3 py-2 text-sm focus-visible:outline-none focus-visible:ring-2 focus-visible:ring-accent ${
              t.id === active ? 'border-ink font-medium text-ink' : 'border-transparent text-ink/60 hover:text-ink'
            }`}
          >
            {t.label}
            {t.badge}
          </button>
        ))}
      </div>
      {tabs.map((t) => (
        <div
          key={t.id}
          role="tabpanel"
          id={`${base}-panel-${t.id}`}
          aria-labelledby={`${base}-tab-${t.id}`}
          hidden={t.id !== active}
          className="min-h-0 flex-1 pt-4"
        >
          {panels[t.id]}
        </div>
      ))}
    </div>
  );
}
