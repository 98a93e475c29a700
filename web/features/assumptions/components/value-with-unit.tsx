import type { Assumption } from '#shared/schemas/assumptions';
import { formatValue } from '../lib/format-value';
import { unitLabel } from '../lib/unit-options';

/** "140 per hour", with the number in tabular figures; a percentage reads "85 %". */
export function ValueWithUnit({ a }: { a: Pick<Assumption, 'value' | 'unit'> }) {
  return (
    <span className="whitespace-nowrap">
      <strong className="font-semibold tabular-nums">{formatValue(a.value)}</strong> {a.unit === 'percent' ? '%' : unitLabel(a.unit)}
    </span>
  );
}
