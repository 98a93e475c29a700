import { useState, type InputHTMLAttributes } from 'react';
import { inputClass } from '../components/ui/field';

interface NumberInputProps extends Omit<InputHTMLAttributes<HTMLInputElement>, 'value' | 'onChange' | 'type'> {
  value: number | undefined;
  /** Called with the parsed number, or undefined when the box is emptied. */
  onValueChange: (value: number | undefined) => void;
}

const parse = (text: string): number | undefined | null => {
  const t = text.trim().replace(/,/g, '');
  if (t === '') return undefined;
  const n = Number(t);
  return Number.isFinite(n) ? n : null;
};

/**
 * A number box that keeps what the person is typing ("0.", "1e") while passing on every value
 * that parses. When the value changes from outside (a unit switch), the text follows it.
 */
export function NumberInput({ value, onValueChange, className = '', ...rest }: NumberInputProps) {
  const shown = value === undefined ? '' : String(value);
  const [text, setText] = useState(shown);
  const [lastShown, setLastShown] = useState(shown);
  // Adopt an outside change (React's "adjust state on prop change" pattern, no effect needed).
  if (shown !== lastShown) {
    setLastShown(shown);
    if (parse(text) !== value) setText(shown);
  }
  const invalid = parse(text) === null;
  return (
    <input
      {...rest}
      type="text"
      inputMode="decimal"
      autoComplete="off"
      value={text}
      aria-invalid={rest['aria-invalid'] ?? (invalid || undefined)}
      onChange={(e) => {
        setText(e.target.value);
        const n = parse(e.target.value);
        if (n !== null) onValueChange(n);
      }}
      className={`${/(^|\s)w-/.test(className) ? inputClass.replace('w-full', '') : inputClass} text-right tabular-nums ${className}`}
    />
  );
}
