import type { SelectHTMLAttributes } from 'react';
import { Field, inputClass } from './field';

export interface SelectOption {
  value: string;
  label: string;
}

interface SelectFieldProps extends Omit<SelectHTMLAttributes<HTMLSelectElement>, 'id' | 'onChange' | 'value'> {
  label: string;
  value: string;
  onValueChange: (value: string) => void;
  options: readonly SelectOption[];
  /** A first, empty choice such as "Any action" or "Choose a person". */
  placeholder?: string;
  hint?: string;
  error?: string;
}

export function SelectField({ label, value, onValueChange, options, placeholder, hint, error, className, ...rest }: SelectFieldProps) {
  return (
    <Field label={label} hint={hint} error={error} className={className}>
      {(control) => (
        <select {...rest} {...control} value={value} onChange={(e) => onValueChange(e.target.value)} className={inputClass}>
          {placeholder !== undefined && <option value="">{placeholder}</option>}
          {options.map((o) => (
            <option key={o.value} value={o.value}>
              {o.label}
            </option>
          ))}
        </select>
      )}
    </Field>
  );
}
