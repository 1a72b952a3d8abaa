import { useId, type InputHTMLAttributes } from 'react';

type Props = InputHTMLAttributes<HTMLInputElement> & { label: string; error?: string | null; hint?: string };

/** A labelled text input with its hint and, when wrong, the reason beside it. */
export function TextField({ label, error, hint, className = '', ...input }: Props) {
  const id = useId();
  const describedBy = [hint ? `${id}-hint` : null, error ? `${id}-error` : null].filter(Boolean).join(' ') || undefined;
  return (
    <div className={className}>
      <label htmlFor={id} className="block text-sm font-medium text-graphite">
        {label}
      </label>
      <input
        id={id}
        {...input}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className={`field mt-1 font-sans ${error ? 'border-pencil' : ''}`}
      />
      {hint && !error && (
        <p id={`${id}-hint`} className="mt-1 text-xs text-graphite-soft">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} className="mt-1 text-xs text-pencil">
          {error}
        </p>
      )}
    </div>
  );
}
