import { useState } from 'react';
import { inputClass } from '../components/ui/field';

interface ListInputProps {
  id: string;
  /** A list of numbers, or (matrix) a list of rows. */
  value: unknown;
  matrix: boolean;
  onValueChange: (value: number[] | number[][] | undefined) => void;
  describedBy?: string;
  invalid?: boolean;
}

const toText = (v: unknown, matrix: boolean): string => {
  if (!Array.isArray(v)) return '';
  return matrix ? (v as unknown[]).map((row) => (Array.isArray(row) ? row.join(', ') : '')).join('\n') : v.join(', ');
};

const parseRow = (line: string): number[] | null => {
  const parts = line.split(/[,;\s]+/).filter(Boolean).map(Number);
  return parts.every(Number.isFinite) ? parts : null;
};

/** Numbers separated by commas (a matrix: one row per line), as the engine's lists. */
export function ListInput({ id, value, matrix, onValueChange, describedBy, invalid }: ListInputProps) {
  const [text, setText] = useState(() => toText(value, matrix));
  const [bad, setBad] = useState(false);
  const update = (next: string) => {
    setText(next);
    if (next.trim() === '') return onValueChange(undefined);
    const rows = matrix ? next.split('\n').filter((l) => l.trim()).map(parseRow) : [parseRow(next)];
    const ok = rows.every((r): r is number[] => r !== null);
    setBad(!ok);
    if (ok) onValueChange(matrix ? rows : rows[0]);
  };
  const common = {
    id,
    value: text,
    'aria-describedby': describedBy,
    'aria-invalid': invalid || bad || undefined,
    className: `${inputClass} font-mono tabular-nums`,
  };
  return matrix ? <textarea {...common} rows={3} onChange={(e) => update(e.target.value)} /> : <input {...common} type="text" onChange={(e) => update(e.target.value)} />;
}
