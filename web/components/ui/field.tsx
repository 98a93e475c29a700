import { useId, type ReactNode } from 'react';

export interface FieldControlProps {
  id: string;
  'aria-invalid': boolean | undefined;
  'aria-describedby': string | undefined;
}

interface FieldProps {
  label: string;
  hint?: string;
  error?: string;
  /** Renders the input with the ids that tie it to its label, hint and error. */
  children: (control: FieldControlProps) => ReactNode;
  className?: string;
}

/** A label, the input, an optional hint and the error text that belongs to it. */
export function Field({ label, hint, error, children, className = '' }: FieldProps) {
  const id = useId();
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  const describedBy = [hintId, errorId].filter(Boolean).join(' ') || undefined;
  return (
    <div className={`flex flex-col gap-1.5 ${className}`}>
      <label htmlFor={id} className="text-sm font-medium text-ink">
        {label}
      </label>
      {hint && (
        <p id={hintId} className="text-sm text-ink-faint">
          {hint}
        </p>
      )}
      {children({ id, 'aria-invalid': error ? true : undefined, 'aria-describedby': describedBy })}
      {error && (
        <p id={errorId} className="text-sm font-medium text-danger">
          {error}
        </p>
      )}
    </div>
  );
}

/** The shared look of text inputs, selects and text areas. */
export const inputClass =
  'w-full rounded-md border border-rule-strong bg-sheet px-3 py-2 text-sm text-ink placeholder:text-ink-faint ' +
  'focus:border-accent focus:outline-2 focus:outline-offset-0 focus:outline-accent aria-[invalid=true]:border-danger';
