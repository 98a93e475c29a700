import { useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import { useInfiniteQuery } from '@tanstack/react-query';
import { AUDIT_ACTIONS, type AuditAction } from '#shared/schemas/audit';
import { QueryErrorNotice } from '../../../app/query-error-notice';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { Loading } from '../../../components/ui/loading';
import { PageHeader } from '../../../components/ui/page-header';
import type { AuditFilters } from '../api/audit-filters';
import { auditQuery } from '../api/audit-query';
import { AuditFilterForm } from './audit-filter-form';
import { AuditTable } from './audit-table';

const DAY = /^\d{4}-\d{2}-\d{2}$/;
const positive = (v: string | null) => (v && /^\d+$/.test(v) && Number(v) > 0 ? Number(v) : undefined);

/** Filters live in the address so a view of the trail can be bookmarked or shared. */
function readFilters(p: URLSearchParams): AuditFilters {
  const action = p.get('action');
  const from = p.get('from');
  const to = p.get('to');
  return {
    action: action && (AUDIT_ACTIONS as readonly string[]).includes(action) ? (action as AuditAction) : undefined,
    actorId: positive(p.get('actorId')),
    engagementId: positive(p.get('engagementId')),
    from: from && DAY.test(from) ? from : undefined,
    to: to && DAY.test(to) ? to : undefined,
    q: p.get('q') || undefined,
  };
}

export function AuditScreen() {
  const [params, setParams] = useSearchParams();
  const filters = useMemo(() => readFilters(params), [params]);
  const trail = useInfiniteQuery(auditQuery(filters));
  const entries = trail.data?.pages.flatMap((p) => p.entries) ?? [];

  function apply(next: AuditFilters) {
    const p = new URLSearchParams();
    for (const [k, v] of Object.entries(next)) if (v !== undefined && v !== '') p.set(k, String(v));
    setParams(p);
  }

  return (
    <>
      <PageHeader eyebrow="Administration" title="Audit trail" description="Who did what, and when: sign-ins, invitations, role changes, engagements and their members." />
      <AuditFilterForm key={params.toString()} value={filters} onApply={apply} />
      {trail.isPending && <Loading label="Loading entries…" />}
      {trail.isError && <QueryErrorNotice error={trail.error} what="audit trail" onRetry={() => trail.refetch()} />}
      {trail.isSuccess && entries.length === 0 && <EmptyState title="No entries match">Widen the date range or clear a filter.</EmptyState>}
      {entries.length > 0 && (
        <>
          <AuditTable entries={entries} />
          <div className="mt-6 flex items-center justify-between gap-4 text-sm text-ink-soft">
            <p role="status">
              {trail.hasNextPage ? `The newest ${entries.length} entries.` : entries.length === 1 ? 'One entry.' : `All ${entries.length} entries.`}
            </p>
            {trail.hasNextPage && (
              <Button onClick={() => trail.fetchNextPage()} busy={trail.isFetchingNextPage}>
                Show older entries
              </Button>
            )}
          </div>
        </>
      )}
    </>
  );
}
