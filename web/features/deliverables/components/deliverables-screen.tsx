import { useQuery } from '@tanstack/react-query';
import { QueryErrorNotice } from '../../../app/query-error-notice';
import { EmptyState } from '../../../components/ui/empty-state';
import { Loading } from '../../../components/ui/loading';
import { PageHeader } from '../../../components/ui/page-header';
import { deliverablesQuery } from '../api/deliverable-queries';
import { DeliverableTable } from './deliverable-table';

/** Route /deliverables — every released, signed report the signed-in person may download. */
export function DeliverablesScreen() {
  const list = useQuery(deliverablesQuery());
  return (
    <>
      <PageHeader title="Deliverables" description="Released study reports as signed PDFs. Each download link is made fresh and works for a few minutes." />
      {list.isPending && <Loading label="Loading deliverables…" />}
      {list.isError && <QueryErrorNotice error={list.error} what="list of deliverables" onRetry={() => list.refetch()} />}
      {list.isSuccess && list.data.length === 0 && (
        <EmptyState title="No released reports yet">Once a partner signs a study off and releases it, the signed PDF appears here.</EmptyState>
      )}
      {list.isSuccess && list.data.length > 0 && <DeliverableTable deliverables={list.data} caption="Released reports" showEngagement />}
    </>
  );
}
