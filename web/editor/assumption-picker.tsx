import { useRef } from 'react';
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

/** Keys that move a closed select's choice in Chromium and fire "change" at once. */
const BROWSING_KEYS = new Set(['ArrowUp', 'ArrowDown', 'Home', 'End', 'PageUp', 'PageDown']);

/**
 * Chooses an assumption of the engagement's register for one input. Only assumptions whose
 * unit can feed the input are offered (a duration may feed a rate: it is inverted). A mouse pick
 * links at once; by keyboard the arrows (or typed letters) only move the choice and Enter links,
 * so browsing the list does not link the first assumption passed on the way.
 */
export function AssumptionPicker({ id, fieldLabel, fieldKind, timeUnit, assumptions, status, onPick, onCancel }: AssumptionPickerProps) {
  const browsing = useRef(false);
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
    <>
      <select
        id={id}
        autoFocus
        aria-label={`Assumption for ${fieldLabel}`}
        aria-describedby={`${id}-keys`}
        className={inputClass}
        defaultValue=""
        onChange={(e) => {
          if (browsing.current) browsing.current = false;
          else if (e.target.value) onPick(Number(e.target.value));
        }}
        onKeyDown={(e) => {
          if (e.key === 'Escape') {
            e.stopPropagation();
            onCancel();
          } else if (e.key === 'Enter') {
            e.preventDefault();
            e.stopPropagation();
            if (e.currentTarget.value) onPick(Number(e.currentTarget.value));
          } else if (BROWSING_KEYS.has(e.key) || (e.key.length === 1 && !e.ctrlKey && !e.metaKey && !e.altKey)) {
            browsing.current = true;
          }
        }}
        // A key that moved nothing fires no change; the next mouse pick must still link.
        onKeyUp={() => {
          browsing.current = false;
        }}
      >
        <option value="">Choose an assumption…</option>
        {fitting.map((a) => (
          <option key={a.id} value={a.id}>
            {describeAssumption(a)}
          </option>
        ))}
      </select>
      <span id={`${id}-keys`} className="sr-only">
        Arrow keys choose, Enter links, Escape cancels.
      </span>
    </>
  );
}

