import type { ReactNode } from 'react';

export type NoticeTone = 'info' | 'warning' | 'error' | 'success';

const TONES: Record<NoticeTone, string> = {
  info: 'border-hairline bg-white text-ink',
  warning: 'border-warning/60 bg-warning/5 text-ink',
  error: 'border-error/60 bg-error/5 text-error',
  success: 'border-added/60 bg-added/5 text-ink',
};

/** A bordered message box; errors and warnings are announced to screen readers. */
export function Notice({ tone = 'info', title, children }: { tone?: NoticeTone; title?: string; children?: ReactNode }) {
  const urgent = tone === 'error' || tone === 'warning';
  return (
    <div role={urgent ? 'alert' : 'status'} className={`rounded border px-3 py-2 text-sm ${TONES[tone]}`}>
      {title ? <p className="font-medium">{title}</p> : null}
      {children ? <div className={title ? 'mt-1' : ''}>{children}</div> : null}
    </div>
  );
}
