import { useQuery } from '@tanstack/react-query';
import { QueryErrorNotice } from '../../../app/query-error-notice';
import { EmptyState } from '../../../components/ui/empty-state';
import { Loading } from '../../../components/ui/loading';
import { PageHeader } from '../../../components/ui/page-header';
import { reviewQueueQuery } from '../api/revision-queries';
import { RevisionTable } from './revision-table';

/** Route /reviews — a partner's waiting work: revisions to decide on, sign-offs to release. */
export function ReviewQueueScreen() {
  const queue = useQuery(reviewQueueQuery());
  // Oldest first: whoever has waited longest is read first.
  const waiting = [...(queue.data ?? [])].sort((a, b) => a.submittedAt.localeCompare(b.submittedAt));
  const toDecide = waiting.filter((r) => r.status === 'in_review');
  const toRelease = waiting.filter((r) => r.status === 'approved');

  return (
    <>
      <PageHeader
        title="Waiting for your review"
        description="Revisions submitted in your engagements, oldest first. Open one to read it as frozen, comment, and sign it off or ask for changes."
      />
      {queue.isPending && <Loading label="Loading what waits for you…" />}
      {queue.isError && <QueryErrorNotice error={queue.error} what="review list" onRetry={() => queue.refetch()} />}
      {queue.isSuccess && queue.data.length === 0 && <EmptyState title="Nothing waits for you">When a consultant submits a revision in one of your engagements, it appears here and you get an e-mail.</EmptyState>}
      {queue.isSuccess && queue.data.length > 0 && (
        <div className="flex flex-col gap-10">
          <section aria-labelledby="to-decide" className="flex flex-col gap-3">
            <h2 id="to-decide" className="text-xl font-bold">
              To read and decide <span className="font-normal text-ink-faint">({toDecide.length})</span>
            </h2>
            {toDecide.length > 0 ? <RevisionTable revisions={toDecide} caption="Revisions waiting for a decision" showStudy /> : <p className="text-sm text-ink-soft">No revision waits for a decision.</p>}
          </section>
          {toRelease.length > 0 && (
            <section aria-labelledby="to-release" className="flex flex-col gap-3">
              <h2 id="to-release" className="text-xl font-bold">
                Signed off, not yet released <span className="font-normal text-ink-faint">({toRelease.length})</span>
              </h2>
              <RevisionTable revisions={toRelease} caption="Signed-off revisions waiting to be released" showStudy />
            </section>
          )}
        </div>
      )}
    </>
  );
}
