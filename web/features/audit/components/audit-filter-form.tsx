import { useState, type FormEvent } from 'react';
import { useQuery } from '@tanstack/react-query';
import { AUDIT_ACTIONS, type AuditAction } from '#shared/schemas/audit';
import { Button } from '../../../components/ui/button';
import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { engagementListQuery } from '../../engagements/api/engagement-queries';
import { userListQuery } from '../../users/api/user-queries';
import type { AuditFilters } from '../api/audit-filters';
import { auditActionLabel } from './audit-action-labels';

const actionOptions = AUDIT_ACTIONS.map((a) => ({ value: a, label: auditActionLabel(a) }));

interface Draft {
  action: string;
  actorId: string;
  engagementId: string;
  from: string;
  to: string;
  q: string;
}

const toDraft = (f: AuditFilters): Draft => ({
  action: f.action ?? '',
  actorId: f.actorId ? String(f.actorId) : '',
  engagementId: f.engagementId ? String(f.engagementId) : '',
  from: f.from ?? '',
  to: f.to ?? '',
  q: f.q ?? '',
});

const fromDraft = (d: Draft): AuditFilters => ({
  action: (d.action || undefined) as AuditAction | undefined,
  actorId: d.actorId ? Number(d.actorId) : undefined,
  engagementId: d.engagementId ? Number(d.engagementId) : undefined,
  from: d.from || undefined,
  to: d.to || undefined,
  q: d.q.trim() || undefined,
});

/** Filters are applied on submit, not per keystroke, so the trail is queried once per question. */
export function AuditFilterForm({ value, onApply }: { value: AuditFilters; onApply: (f: AuditFilters) => void }) {
  const [draft, setDraft] = useState<Draft>(() => toDraft(value));
  const users = useQuery(userListQuery());
  const engagements = useQuery(engagementListQuery());
  const set = (key: keyof Draft) => (v: string) => setDraft((d) => ({ ...d, [key]: v }));
  const rangeBackwards = draft.from && draft.to && draft.from > draft.to;

  function submit(e: FormEvent) {
    e.preventDefault();
    if (!rangeBackwards) onApply(fromDraft(draft));
  }

  return (
    <form onSubmit={submit} aria-label="Filter the audit trail" className="mb-8 rounded-lg border border-rule bg-sheet px-5 py-5">
      <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
        <SelectField label="Action" value={draft.action} onValueChange={set('action')} options={actionOptions} placeholder="Any action" />
        <SelectField
          label="Person"
          value={draft.actorId}
          onValueChange={set('actorId')}
          placeholder="Anyone"
          options={(users.data ?? []).map((u) => ({ value: String(u.id), label: `${u.name} (${u.email})` }))}
        />
        <SelectField
          label="Engagement"
          value={draft.engagementId}
          onValueChange={set('engagementId')}
          placeholder="Any engagement"
          options={(engagements.data ?? []).map((e) => ({ value: String(e.id), label: e.name }))}
        />
        <TextField label="From (day)" type="date" value={draft.from} onValueChange={set('from')} />
        <TextField label="To (day)" type="date" value={draft.to} onValueChange={set('to')} error={rangeBackwards ? 'Choose a day on or after the first one' : undefined} />
        <TextField label="Containing" type="search" value={draft.q} onValueChange={set('q')} maxLength={200} placeholder="e-mail, subject or detail" />
      </div>
      <div className="mt-5 flex justify-end gap-2">
        <Button
          variant="quiet"
          onClick={() => {
            setDraft(toDraft({}));
            onApply({});
          }}
        >
          Clear filters
        </Button>
        <Button type="submit" variant="primary">
          Show entries
        </Button>
      </div>
    </form>
  );
}
