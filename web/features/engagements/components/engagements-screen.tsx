import { Link } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { paths } from '../../../app/paths';
import { QueryErrorNotice } from '../../../app/query-error-notice';
import { EmptyState } from '../../../components/ui/empty-state';
import { Loading } from '../../../components/ui/loading';
import { PageHeader } from '../../../components/ui/page-header';
import { useCurrentUser } from '../../auth/api/use-current-user';
import { engagementListQuery } from '../api/engagement-queries';
import { EngagementCard } from './engagement-card';

const leads = {
  admin: 'Every engagement in the practice. Open one to see its members and studies.',
  partner: 'The engagements you belong to. Studies awaiting your review will show here.',
  consultant: 'The engagements you belong to. Open one to work on its studies.',
  client: 'The engagements your firm commissioned. Signed reports appear here once they are released.',
} as const;

export function EngagementsScreen() {
  const user = useCurrentUser();
  const list = useQuery(engagementListQuery());

  const adminAction =
    user.role === 'admin' ? (
      <Link to={`${paths.adminEngagements}?new=1`} className="rounded-md bg-accent px-4 py-2 text-sm font-medium text-white no-underline hover:bg-accent-strong">
        New engagement
      </Link>
    ) : undefined;

  return (
    <>
      <PageHeader title="Engagements" description={leads[user.role]} actions={adminAction} />
      {list.isPending && <Loading label="Loading engagements…" />}
      {list.isError && <QueryErrorNotice error={list.error} what="list of engagements" onRetry={() => list.refetch()} />}
      {list.isSuccess && list.data.length === 0 && (
        <EmptyState title="No engagements yet">
          {user.role === 'admin'
            ? 'Create the first engagement and invite its members.'
            : 'When an administrator adds you to an engagement, it will appear here.'}
        </EmptyState>
      )}
      {list.isSuccess && list.data.length > 0 && (
        <ul aria-label="Engagements" className="grid gap-4 md:grid-cols-2">
          {sortForReading(list.data).map((e) => (
            <EngagementCard key={e.id} engagement={e} />
          ))}
        </ul>
      )}
    </>
  );
}

/** Active work first, then archived; most recently touched first within each. */
function sortForReading<T extends { status: string; updatedAt: string }>(items: T[]): T[] {
  return [...items].sort((a, b) => (a.status === b.status ? b.updatedAt.localeCompare(a.updatedAt) : a.status === 'active' ? -1 : 1));
}
