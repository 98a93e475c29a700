import type { TextareaHTMLAttributes } from 'react';
import { Field, inputClass } from './field';

interface TextAreaFieldProps extends Omit<TextareaHTMLAttributes<HTMLTextAreaElement>, 'id' | 'onChange' | 'value'> {
  label: string;
  value: string;
  onValueChange: (value: string) => void;
  hint?: string;
  error?: string;
}

export function TextAreaField({ label, value, onValueChange, hint, error, className, rows = 4, ...rest }: TextAreaFieldProps) {
  return (
    <Field label={label} hint={hint} error={error} className={className}>
      {(control) => (
        <textarea {...rest} {...control} rows={rows} value={value} onChange={(e) => onValueChange(e.target.value)} className={inputClass} />
      )}
    </Field>
  );
}
