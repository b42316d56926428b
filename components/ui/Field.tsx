import { useId, type InputHTMLAttributes, type ReactNode, type SelectHTMLAttributes } from 'react';

export const controlClass =
  'h-8 w-full rounded border border-hairline bg-white px-2 text-sm text-ink placeholder:text-ink/40 ' +
  'focus:outline-none focus:ring-2 focus:ring-accent focus:border-accent aria-[invalid=true]:border-error';

interface FieldProps {
  label: string;
  hint?: ReactNode;
  error?: string;
  children: (props: { id: string; 'aria-invalid': boolean; 'aria-describedby'?: string }) => ReactNode;
}

/** A label, a control and its hint or error, wired together for screen readers. */
export function Field({ label, hint, error, children }: FieldProps) {
  const id = useId();
  const noteId = `${id}-note`;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-medium">
        {label}
      </label>
      {children({ id, 'aria-invalid': Boolean(error), 'aria-describedby': hint || error ? noteId : undefined })}
      {error ? (
        <p id={noteId} className="text-xs text-error">
          {error}
        </p>
      ) : hint ? (
        <p id={noteId} className="text-xs text-ink/60">
          {hint}
        </p>
      ) : null}
    </div>
  );
}

export function TextInput({ className = '', ...rest }: InputHTMLAttributes<HTMLInputElement>) {
  return <input className={`${controlClass} ${className}`} {...rest} />;
}

export function Select({ className = '', ...rest }: SelectHTMLAttributes<HTMLSelectElement>) {
  return <select className={`${controlClass} pr-6 ${className}`} {...rest} />;
}
