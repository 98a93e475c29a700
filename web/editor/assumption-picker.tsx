import type { Assumption } from '#shared/schemas/assumptions';
import { UNIT_INFO, toFieldValue, type TimeUnit } from '#shared/units/units';
import { inputClass } from '../components/ui/field';

/** An assumption as the picker lists it: name, value and unit. */
export const describeAssumption = (a: Assumption) => `${a.name} — ${a.value.toLocaleString('en-GB')} ${UNIT_INFO[a.unit].label}`;

interface AssumptionPickerProps {
  id: string;
  fieldLabel: string;
  fieldKind: string;
  timeUnit: TimeUnit;
  assumptions: readonly Assumption[];
  status: 'pending' | 'error' | 'success';
  onPick: (id: number) => void;
  onCancel: () => void;
}

/**
 * Chooses an assumption of the engagement's register for one input. Only assumptions whose
 * unit can feed the input are offered (a duration may feed a rate: it is inverted).
 */
export function AssumptionPicker({ id, fieldLabel, fieldKind, timeUnit, assumptions, status, onPick, onCancel }: AssumptionPickerProps) {
  const fitting = assumptions.filter((a) => toFieldValue(a.value, a.unit, fieldKind, timeUnit) !== null);
  if (status === 'pending') return <p className="text-sm text-ink-faint">Loading the assumption register…</p>;
  if (status === 'error') return <p className="text-sm text-danger">The assumption register could not be loaded.</p>;
  if (fitting.length === 0) {
    return (
      <p className="text-sm text-ink-soft">
        No assumption in this engagement’s register fits “{fieldLabel}”.{' '}
        <button type="button" className="text-accent underline" onClick={onCancel}>
          Back
        </button>
      </p>
    );
  }
  return (
    <select
      id={id}
      autoFocus
      aria-label={`Assumption for ${fieldLabel}`}
      className={inputClass}
      defaultValue=""
      onChange={(e) => e.target.value && onPick(Number(e.target.value))}
      onKeyDown={(e) => {
        if (e.key === 'Escape') {
          e.stopPropagation();
          onCancel();
        }
      }}
    >
      <option value="">Choose an assumption…</option>
      {fitting.map((a) => (
        <option key={a.id} value={a.id}>
          {describeAssumption(a)}
        </option>
      ))}
    </select>
  );
}
