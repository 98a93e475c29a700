import type { InputHTMLAttributes } from 'react';
import { Field, inputClass } from './field';

interface TextFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, 'id' | 'onChange' | 'value'> {
  label: string;
  value: string;
  onValueChange: (value: string) => void;
  hint?: string;
  error?: string;
}

export function TextField({ label, value, onValueChange, hint, error, className, ...rest }: TextFieldProps) {
  return (
    <Field label={label} hint={hint} error={error} className={className}>
      {(control) => <input {...rest} {...control} value={value} onChange={(e) => onValueChange(e.target.value)} className={inputClass} />}
    </Field>
  );
}
