import { useId, useRef, useState } from 'react';
import type { InputField } from '#shared/queue/index';
import { isAssumptionLink } from '#shared/schemas/model-block';
import { readableDuration, TIME_UNITS, toFieldValue, type TimeUnit } from '#shared/units/units';
import { inputClass } from '../components/ui/field';
import { AssumptionPicker, describeAssumption } from './assumption-picker';
import { useBlockEnvironment } from './block-environment';
import { DURATION_WORDS } from './format-measure';
import { fromDisplay, initialDisplayUnit, tidy, toDisplay, unitWord, type DisplayUnit } from './field-units';
import { ListInput } from './list-input';
import { NumberInput } from './number-input';

const CHOICE_LABELS: Record<string, string> = {
  serviceLevel: 'Service level P(wait ≤ t)',
  meanWait: 'Mean wait in queue',
  blocking: 'Blocking probability',
  utilization: 'Utilisation cap',
  abandonment: 'Abandonment probability',
  Lq: 'Customers waiting (Lq)',
  L: 'Customers present (L)',
};

interface BlockInputFieldProps {
  field: InputField;
  /** Kind after solver criteria are applied (a mean-wait target is a duration). */
  kind: string;
  value: unknown;
  timeUnit: TimeUnit;
  error?: string;
  onChange: (value: unknown) => void;
}

/** A linked value in words: durations in their most readable unit, four significant figures. */
function readableValue(v: number, kind: 'rate' | 'duration', timeUnit: TimeUnit): string {
  const sig = (x: number) => Number(x.toPrecision(4)).toLocaleString('en-GB');
  if (kind === 'rate') return `${sig(v)} per ${timeUnit}`;
  const r = readableDuration(v, timeUnit);
  return `${sig(r.value)} ${DURATION_WORDS[r.unit]}`;
}

/** One input of a model block: the number in a unit of the author's choice, or a link to an assumption. */
export function BlockInputField({ field, kind, value, timeUnit, error, onChange }: BlockInputFieldProps) {
  const id = useId();
  const env = useBlockEnvironment();
  const [unit, setUnit] = useState<DisplayUnit>(() => initialDisplayUnit(kind, value, timeUnit));
  const [picking, setPicking] = useState(false);
  // The picker disappears once used: focus goes back to this field's link button, not to the page.
  const linkButton = useRef<HTMLButtonElement>(null);
  const endPicking = () => {
    setPicking(false);
    requestAnimationFrame(() => linkButton.current?.focus());
  };
  const linkable = ['rate', 'duration', 'count', 'probability', 'scv', 'cost', 'number'].includes(kind);
  const linked = isAssumptionLink(value) ? env.assumptions.find((a) => a.id === value.assumption) : undefined;
  const errorId = error ? `${id}-error` : undefined;
  const shownUnit: DisplayUnit = kind === 'rate' || kind === 'duration' ? (unit === 'plain' || unit === 'percent' ? timeUnit : unit) : unit;

  let control;
  if (isAssumptionLink(value)) {
    const v = linked ? toFieldValue(linked.value, linked.unit, kind, timeUnit) : null;
    control = (
      <p id={id} className="rounded-md border border-accent/40 bg-accent-tint px-3 py-2 text-sm text-accent-strong">
        {linked ? `Linked: ${describeAssumption(linked)}` : `Linked to assumption #${value.assumption} (not in the register)`}
        {v !== null && (kind === 'rate' || kind === 'duration') && <span className="text-ink-soft"> = {readableValue(v, kind, timeUnit)}</span>}
      </p>
    );
  } else if (picking) {
    control = (
      <AssumptionPicker
        id={id}
        fieldLabel={field.label}
        fieldKind={kind}
        timeUnit={timeUnit}
        assumptions={env.assumptions}
        status={env.assumptionsStatus}
        onPick={(assumption) => {
          endPicking();
          onChange({ assumption });
        }}
        onCancel={endPicking}
      />
    );
  } else if (kind === 'choice') {
    control = (
      <select id={id} className={inputClass} value={typeof value === 'string' ? value : ''} aria-describedby={errorId} onChange={(e) => onChange(e.target.value || undefined)}>
        {!field.required && <option value="">Default</option>}
        {(field.options ?? []).map((o) => (
          <option key={o} value={o}>
            {CHOICE_LABELS[o] ?? o}
          </option>
        ))}
      </select>
    );
  } else if (kind === 'rates' || kind === 'counts' || kind === 'matrix') {
    control = <ListInput id={id} value={value} matrix={kind === 'matrix'} onValueChange={onChange} describedBy={errorId} invalid={!!error} />;
  } else {
    const n = typeof value === 'number' ? tidy(toDisplay(value, kind, shownUnit, timeUnit)) : undefined;
    control = (
      <div className="flex gap-2">
        <NumberInput
          id={id}
          className="min-w-0 flex-1"
          value={n}
          aria-describedby={errorId}
          aria-invalid={error ? true : undefined}
          placeholder={field.required ? '' : 'optional'}
          onValueChange={(typed) => onChange(typed === undefined ? undefined : fromDisplay(typed, kind, shownUnit, timeUnit))}
        />
        {kind === 'rate' || kind === 'duration' ? (
          <select aria-label={`Unit of ${field.label}`} className={`${inputClass.replace('w-full', '')} w-36 shrink-0`} value={shownUnit} onChange={(e) => setUnit(e.target.value as TimeUnit)}>
            {TIME_UNITS.map((u) => (
              <option key={u} value={u}>
                {unitWord(kind, u, timeUnit)}
              </option>
            ))}
          </select>
        ) : (
          unitWord(kind, unit, timeUnit) && <span className="w-36 shrink-0 self-center text-sm text-ink-soft">{unitWord(kind, unit, timeUnit)}</span>
        )}
      </div>
    );
  }

  return (
    <div className="grid gap-1.5 sm:grid-cols-[13rem_minmax(0,1fr)_auto] sm:items-start">
      <label htmlFor={id} className="pt-2 text-sm font-medium text-ink">
        {field.label}
        {!field.required && <span className="font-normal text-ink-faint"> (optional)</span>}
      </label>
      <div>
        {control}
        {error && (
          <p id={errorId} className="mt-1 text-sm font-medium text-danger">
            {/* Engine issues are either fragments ("must be at least 1") or whole sentences. */}
            {/^[a-z]/.test(error) ? `${field.label} ${error}` : error}
          </p>
        )}
      </div>
      {linkable && !picking && (
        <button
          ref={linkButton}
          type="button"
          className="self-start rounded-md px-2 py-2 text-sm text-accent hover:bg-accent-tint"
          onClick={() => {
            if (!isAssumptionLink(value)) return setPicking(true);
            // Unlinking keeps the number the link stood for, so nothing changes until the author edits it.
            const v = linked ? toFieldValue(linked.value, linked.unit, kind, timeUnit) : null;
            onChange(v ?? undefined);
          }}
        >
          {/* Every input has this button: the field's name tells them apart for screen readers. */}
          {isAssumptionLink(value) ? 'Unlink' : 'Link to assumption'}
          <span className="sr-only"> for {field.label}</span>
        </button>
      )}
    </div>
  );
}
