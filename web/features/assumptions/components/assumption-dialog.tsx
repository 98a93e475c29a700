import { useState } from 'react';
import type { Assumption, CreateAssumption, MovedNumber, UpdateAssumption } from '#shared/schemas/assumptions';
import type { Member } from '#shared/schemas/engagements';
import { Banner } from '../../../components/ui/banner';
import { useCreateAssumption, useUpdateAssumption } from '../api/assumption-mutations';
import { AssumptionForm } from './assumption-form';
import { FormDialog } from './form-dialog';

export interface SavedChange {
  before: Assumption;
  after: Assumption;
  moved: MovedNumber[];
}

interface AssumptionDialogProps {
  engagementId: number;
  /** null to create; otherwise the row as the register shows it now (refreshed after a conflict). */
  editing: Assumption | null;
  members: Member[];
  /** Owner proposed for a new assumption: whoever adds it. */
  defaultOwnerId: number;
  onClose: () => void;
  onCreated: (a: Assumption) => void;
  onUpdated: (change: SavedChange) => void;
  /** Saved without a difference: closes, and the screen says so rather than leave people guessing. */
  onUnchanged: () => void;
}

/** Only the fields that differ from what was opened, so a concurrent edit of another field survives. */
function changedFields(base: Assumption, values: CreateAssumption): Omit<UpdateAssumption, 'version'> {
  const patch: Record<string, unknown> = {};
  for (const key of ['name', 'value', 'unit', 'sourceKind', 'sourceDetail', 'ownerId', 'notes'] as const) {
    if (values[key] !== base[key]) patch[key] = values[key];
  }
  return patch;
}

/** Creates or edits one assumption in a modal; a stale edit offers to start again from the newer version. */
export function AssumptionDialog({ engagementId, editing, members, defaultOwnerId, onClose, onCreated, onUpdated, onUnchanged }: AssumptionDialogProps) {
  const create = useCreateAssumption(engagementId);
  const update = useUpdateAssumption(engagementId);
  // The version the person started from; it changes only when they choose to take a newer one.
  const [base, setBase] = useState(editing);
  const [formKey, setFormKey] = useState(0);
  const stale = editing !== null && base !== null && editing.version !== base.version;

  async function save(values: CreateAssumption) {
    if (!base) return onCreated(await create.mutateAsync(values));
    const patch = changedFields(base, values);
    if (Object.keys(patch).length === 0) return onUnchanged();
    // A 409 lands above the form (its issue names no field); the register refetches and the
    // notice below offers the newer version.
    const { assumption, moved } = await update.mutateAsync({ id: base.id, patch: { ...patch, version: base.version } });
    onUpdated({ before: base, after: assumption, moved });
  }

  const notice = stale ? (
    <Banner tone="warn" title="Someone else saved this assumption while you were editing">
      Now: {editing.name} = {editing.value} ({editing.ownerName ?? 'no owner'}).{' '}
      <button
        type="button"
        className="font-semibold underline"
        onClick={() => {
          setBase(editing);
          setFormKey((k) => k + 1);
        }}
      >
        Start again from their version
      </button>
    </Banner>
  ) : null;

  return (
    <FormDialog
      title={base ? `Edit “${base.name}”` : 'New assumption'}
      description={base && base.usageCount > 0 ? `Used by ${base.usageCount} model block${base.usageCount === 1 ? '' : 's'}: a new value or unit recomputes them and lists every number that moves.` : undefined}
      onClose={onClose}
    >
      <AssumptionForm
        key={formKey}
        initial={base}
        members={members}
        defaultOwnerId={defaultOwnerId}
        submitLabel={base ? 'Save change' : 'Add to register'}
        busy={create.isPending || update.isPending}
        onSave={save}
        onCancel={onClose}
        notice={notice}
      />
    </FormDialog>
  );
}
