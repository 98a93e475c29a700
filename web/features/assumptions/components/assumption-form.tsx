import { useState, type FormEvent, type ReactNode } from 'react';
import { ASSUMPTION_NAME_MAX, ASSUMPTION_TEXT_MAX, createAssumptionSchema, type Assumption, type CreateAssumption } from '#shared/schemas/assumptions';
import type { Member } from '#shared/schemas/engagements';
import { ROLE_LABELS } from '#shared/schemas/roles';
import { Banner } from '../../../components/ui/banner';
import { Button } from '../../../components/ui/button';
import { SelectField } from '../../../components/ui/select-field';
import { TextAreaField } from '../../../components/ui/text-area-field';
import { TextField } from '../../../components/ui/text-field';
import { useFormErrors } from '../../../lib/use-form-errors';
import { formatValue, parseValue } from '../lib/format-value';
import { SOURCE_OPTIONS } from '../lib/source-labels';
import { UNIT_OPTIONS } from '../lib/unit-options';

const FIELDS = ['name', 'value', 'unit', 'sourceKind', 'sourceDetail', 'ownerId', 'notes'] as const;

interface Draft {
  name: string;
  value: string;
  unit: string;
  sourceKind: string;
  sourceDetail: string;
  ownerId: string;
  notes: string;
}

const toDraft = (a: Assumption | null, defaultOwnerId: number): Draft => ({
  name: a?.name ?? '',
  // No grouping commas in an input people edit: "1250.5", not "1,250.5".
  value: a ? formatValue(a.value).replace(/,/g, '') : '',
  unit: a?.unit ?? '',
  sourceKind: a?.sourceKind ?? '',
  sourceDetail: a?.sourceDetail ?? '',
  ownerId: a ? (a.ownerId ? String(a.ownerId) : '') : String(defaultOwnerId),
  notes: a?.notes ?? '',
});

interface AssumptionFormProps {
  initial: Assumption | null;
  /** Owners are the engagement's people who keep the register (clients do not see it). */
  members: Member[];
  defaultOwnerId: number;
  submitLabel: string;
  busy: boolean;
  /** Rejects with the API's error, which lands on the field it names or above the form. */
  onSave: (values: CreateAssumption) => Promise<unknown>;
  onCancel: () => void;
  /** Shown above the fields, e.g. a conflict notice with its own action. */
  notice?: ReactNode;
}

/** Name, value with unit, where it comes from, who owns it, notes: for creating and editing. */
export function AssumptionForm({ initial, members, defaultOwnerId, submitLabel, busy, onSave, onCancel, notice }: AssumptionFormProps) {
  const form = useFormErrors(FIELDS);
  const [draft, setDraft] = useState<Draft>(() => toDraft(initial, defaultOwnerId));
  const set = (key: keyof Draft) => (value: string) => setDraft((d) => ({ ...d, [key]: value }));

  const owners = members
    .filter((m) => m.role !== 'client' || m.userId === initial?.ownerId)
    .map((m) => ({ value: String(m.userId), label: `${m.name} · ${ROLE_LABELS[m.role]}` }));

  function submit(e: FormEvent) {
    e.preventDefault();
    const values = form.validate(createAssumptionSchema, {
      ...draft,
      value: parseValue(draft.value),
      unit: draft.unit || undefined,
      sourceKind: draft.sourceKind || undefined,
      ownerId: draft.ownerId ? Number(draft.ownerId) : null,
    });
    if (values) onSave(values).catch(form.fromError);
  }

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4">
      {notice}
      {form.formError && <Banner tone="danger">{form.formError}</Banner>}
      <TextField label="Name" hint='What the value is, e.g. "Weekday peak arrivals".' value={draft.name} onValueChange={set('name')} maxLength={ASSUMPTION_NAME_MAX} error={form.fieldErrors.name} required autoFocus />
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label="Value" inputMode="decimal" autoComplete="off" value={draft.value} onValueChange={set('value')} error={form.fieldErrors.value} className="[&_input]:text-right [&_input]:tabular-nums" required />
        <SelectField label="Unit" value={draft.unit} onValueChange={set('unit')} options={UNIT_OPTIONS} placeholder="Choose a unit" error={form.fieldErrors.unit} required />
      </div>
      <div className="grid gap-4 sm:grid-cols-2">
        <SelectField label="Source" value={draft.sourceKind} onValueChange={set('sourceKind')} options={SOURCE_OPTIONS} placeholder="Where it comes from" error={form.fieldErrors.sourceKind} required />
        <SelectField label="Owner" value={draft.ownerId} onValueChange={set('ownerId')} options={owners} placeholder="Nobody yet" error={form.fieldErrors.ownerId} />
      </div>
      <TextField label="Source detail" hint="Which dataset, document or conversation; who said so and when." value={draft.sourceDetail} onValueChange={set('sourceDetail')} maxLength={ASSUMPTION_TEXT_MAX} error={form.fieldErrors.sourceDetail} />
      <TextAreaField label="Notes" rows={3} value={draft.notes} onValueChange={set('notes')} maxLength={ASSUMPTION_TEXT_MAX} error={form.fieldErrors.notes} />
      <div className="flex justify-end gap-2">
        <Button variant="quiet" onClick={onCancel}>
          Cancel
        </Button>
        <Button type="submit" variant="primary" busy={busy}>
          {submitLabel}
        </Button>
      </div>
    </form>
  );
}
