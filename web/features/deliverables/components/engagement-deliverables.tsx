import { useQuery } from '@tanstack/react-query';
import { QueryErrorNotice } from '../../../app/query-error-notice';
import { EmptyState } from '../../../components/ui/empty-state';
import { Loading } from '../../../components/ui/loading';
import { deliverablesQuery } from '../api/deliverable-queries';
import { DeliverableTable } from './deliverable-table';

/** The released reports of one engagement, where a client lands first. */
export function EngagementDeliverables({ engagementId }: { engagementId: number }) {
  const list = useQuery(deliverablesQuery());
  const mine = list.data?.filter((d) => d.engagementId === engagementId) ?? [];
  return (
    <section aria-labelledby="deliverables-title" className="flex flex-col gap-4">
      <h2 id="deliverables-title" className="text-xl font-bold">
        Deliverables
      </h2>
      {list.isPending && <Loading label="Loading deliverables…" />}
      {list.isError && <QueryErrorNotice error={list.error} what="list of deliverables" onRetry={() => list.refetch()} />}
      {list.isSuccess && mine.length === 0 && (
        <EmptyState title="No released reports yet">
          Once a partner signs a study off and releases it, the signed PDF appears here for you to download and verify.
        </EmptyState>
      )}
      {mine.length > 0 && <DeliverableTable deliverables={mine} caption="Released reports of this engagement" />}
    </section>
  );
}
