import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import type { Assumption } from '#shared/schemas/assumptions';
import { QueryErrorNotice } from '../../../app/query-error-notice';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { Loading } from '../../../components/ui/loading';
import { useToast } from '../../../components/ui/use-toast';
import { isApiError } from '../../../lib/api-error';
import { useCurrentUser } from '../../auth/api/use-current-user';
import { engagementMembersQuery } from '../../engagements/api/engagement-queries';
import { useDeleteAssumption } from '../api/assumption-mutations';
import { assumptionsQuery } from '../api/assumption-queries';
import { NO_FILTER, registerView, type RegisterFilter, type SortOrder } from '../lib/register-view';
import { AssumptionDialog, type SavedChange } from './assumption-dialog';
import { AssumptionTable } from './assumption-table';
import { DeleteRefusal, type Refusal } from './delete-refusal';
import { MovedNumbersPanel } from './moved-numbers-panel';
import { RegisterFilters } from './register-filters';

interface AssumptionRegisterProps {
  engagementId: number;
  canWrite: boolean;
  creating: boolean;
  onCreatingChange: (creating: boolean) => void;
}

/** Filters, the table, the edit dialog and what an edit or a refused delete left behind. */
export function AssumptionRegister({ engagementId, canWrite, creating, onCreatingChange }: AssumptionRegisterProps) {
  const userId = useCurrentUser().id;
  const list = useQuery(assumptionsQuery(engagementId));
  const members = useQuery({ ...engagementMembersQuery(engagementId), enabled: canWrite });
  const remove = useDeleteAssumption(engagementId);
  const toast = useToast();
  const [filter, setFilter] = useState<RegisterFilter>(NO_FILTER);
  const [order, setOrder] = useState<SortOrder>({ key: 'name', direction: 'asc' });
  const [editingId, setEditingId] = useState<number | null>(null);
  const [change, setChange] = useState<SavedChange | null>(null);
  const [refusal, setRefusal] = useState<Refusal | null>(null);

  if (list.isPending) return <Loading label="Loading the register…" />;
  if (list.isError) return <QueryErrorNotice error={list.error} what="assumption register" onRetry={() => list.refetch()} />;

  const rows = registerView(list.data, filter, order);
  const editing = editingId === null ? null : (list.data.find((a) => a.id === editingId) ?? null);
  const closeDialog = () => {
    setEditingId(null);
    onCreatingChange(false);
  };

  function onUpdated(saved: SavedChange) {
    closeDialog();
    const numbersCould = saved.before.value !== saved.after.value || saved.before.unit !== saved.after.unit;
    if (numbersCould) setChange(saved);
    else toast.show(`“${saved.after.name}” saved.`, 'ok');
  }

  function onDelete(a: Assumption) {
    setRefusal(null);
    setChange(null);
    remove.mutate(a.id, {
      onSuccess: () => toast.show(`“${a.name}” deleted.`, 'ok'),
      onError: (err) => {
        if (isApiError(err) && err.status === 409) {
          setRefusal({ name: a.name, message: err.message, usedBy: err.issues.filter((i) => i.path.startsWith('usedBy.')).map((i) => i.message) });
        } else toast.show(err.message, 'danger');
      },
    });
  }

  return (
    <div className="flex flex-col gap-6">
      {change && <MovedNumbersPanel change={change} onDismiss={() => setChange(null)} />}
      {refusal && <DeleteRefusal refusal={refusal} onDismiss={() => setRefusal(null)} />}
      {list.data.length === 0 ? (
        <EmptyState
          title="The register is empty"
          action={
            canWrite ? (
              <Button variant="secondary" onClick={() => onCreatingChange(true)}>
                Add the first assumption
              </Button>
            ) : undefined
          }
        >
          Record each value a study relies on (peak arrivals, handling time, a service-level target) once, with where it comes
          from. Starting a study from a template adds the template's assumptions here.
        </EmptyState>
      ) : (
        <>
          <RegisterFilters filter={filter} onChange={setFilter} />
          <p role="status" className="-mt-3 text-sm text-ink-faint">
            {rows.length === list.data.length ? `${rows.length} assumption${rows.length === 1 ? '' : 's'}` : `Showing ${rows.length} of ${list.data.length} assumptions`}
          </p>
          {rows.length === 0 ? (
            <EmptyState title="Nothing matches these filters" action={<Button onClick={() => setFilter(NO_FILTER)}>Clear the filters</Button>} />
          ) : (
            <AssumptionTable
              rows={rows}
              order={order}
              onSort={setOrder}
              onEdit={canWrite ? (a) => setEditingId(a.id) : undefined}
              onDelete={canWrite ? onDelete : undefined}
              deletingId={remove.isPending ? remove.variables : null}
            />
          )}
        </>
      )}
      {(creating || editing) && (
        <AssumptionDialog
          key={editingId ?? 'new'}
          engagementId={engagementId}
          editing={creating ? null : editing}
          members={members.data ?? []}
          defaultOwnerId={userId}
          onClose={closeDialog}
          onCreated={(a) => {
            closeDialog();
            toast.show(`“${a.name}” added to the register.`, 'ok');
          }}
          onUpdated={onUpdated}
          onUnchanged={() => {
            closeDialog();
            toast.show('Nothing to save: every field is as it was.', 'info');
          }}
        />
      )}
    </div>
  );
}
