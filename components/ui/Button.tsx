import type { ButtonHTMLAttributes } from 'react';

export type ButtonTone = 'primary' | 'secondary' | 'quiet' | 'danger';

const TONES: Record<ButtonTone, string> = {
  // Accent is kept for the one primary action on a screen.
  primary: 'bg-accent text-white border-accent hover:bg-[#4c33b3]',
  secondary: 'bg-white text-ink border-hairline hover:border-ink/40',
  quiet: 'bg-transparent text-ink border-transparent hover:bg-open/60',
  danger: 'bg-white text-error border-hairline hover:border-error',
};

export function buttonClass(tone: ButtonTone = 'secondary', extra = ''): string {
  return [
    'inline-flex items-center justify-center gap-2 h-8 px-3 rounded border text-sm font-medium',
    'focus-visible:outline-none focus-visible:ring-2 focus-visible:ring-accent focus-visible:ring-offset-1',
    'disabled:opacity-50 disabled:cursor-not-allowed',
    TONES[tone],
    extra,
  ].join(' ');
}

export function Button({ tone = 'secondary', className = '', type = 'button', ...rest }: ButtonHTMLAttributes<HTMLButtonElement> & { tone?: ButtonTone }) {
  return <button type={type} className={buttonClass(tone, className)} {...rest} />;
}
