import { useState } from 'react';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { paths } from '../../../app/paths';
import { QueryErrorNotice } from '../../../app/query-error-notice';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { Loading } from '../../../components/ui/loading';
import { PageHeader } from '../../../components/ui/page-header';
import { Table, Td, Th } from '../../../components/ui/table';
import { useToast } from '../../../components/ui/use-toast';
import { formatDate } from '../../../lib/format-date';
import { engagementListQuery } from '../api/engagement-queries';
import { useCreateEngagement } from '../api/engagement-mutations';
import { ArchiveButton } from './archive-button';
import { EngagementBadges } from './engagement-badges';
import { EngagementForm } from './engagement-form';

export function AdminEngagementsScreen() {
  const [search] = useSearchParams();
  const [creating, setCreating] = useState(search.get('new') === '1');
  const list = useQuery(engagementListQuery());
  const create = useCreateEngagement();
  const navigate = useNavigate();
  const toast = useToast();

  return (
    <>
      <PageHeader
        eyebrow="Administration"
        title="Engagement admin"
        description="Create engagements, keep their details right, archive finished work. Open one to manage its members."
        actions={
          !creating && (
            <Button variant="primary" onClick={() => setCreating(true)}>
              New engagement
            </Button>
          )
        }
      />
      {creating && (
        <section aria-labelledby="new-engagement" className="mb-10 rounded-lg border border-rule bg-sheet px-6 py-6">
          <h2 id="new-engagement" className="mb-5 text-lg font-bold">
            New engagement
          </h2>
          <EngagementForm
            submitLabel="Create engagement"
            busy={create.isPending}
            onCancel={() => setCreating(false)}
            onSave={async (values) => {
              const engagement = await create.mutateAsync(values);
              toast.show(`${engagement.name} created. Add its members next.`, 'ok');
              navigate(paths.engagement(engagement.id));
            }}
          />
        </section>
      )}
      {list.isPending && <Loading label="Loading engagements…" />}
      {list.isError && <QueryErrorNotice error={list.error} what="list of engagements" onRetry={() => list.refetch()} />}
      {list.isSuccess && list.data.length === 0 && <EmptyState title="No engagements yet">Create the first one above.</EmptyState>}
      {list.isSuccess && list.data.length > 0 && (
        <Table caption="All engagements">
          <thead>
            <tr>
              <Th>Engagement</Th>
              <Th>Client</Th>
              <Th num>Members</Th>
              <Th>Status</Th>
              <Th>Updated</Th>
              <Th>
                <span className="sr-only">Actions</span>
              </Th>
            </tr>
          </thead>
          <tbody>
            {list.data.map((e) => (
              <tr key={e.id}>
                <Td className="font-medium">
                  <Link to={paths.engagement(e.id)} className="underline-offset-4 hover:underline">
                    {e.name}
                  </Link>
                </Td>
                <Td>{e.clientName}</Td>
                <Td num>{e.memberCount}</Td>
                <Td>
                  <EngagementBadges engagement={e} />
                </Td>
                <Td className="whitespace-nowrap text-ink-soft">{formatDate(e.updatedAt, false)}</Td>
                <Td className="text-right whitespace-nowrap">
                  <span className="inline-flex gap-2">
                    <Link to={paths.engagement(e.id)} className="rounded-md px-2.5 py-1 text-sm font-medium no-underline hover:bg-accent-tint">
                      Edit &amp; members
                    </Link>
                    <ArchiveButton engagement={e} />
                  </span>
                </Td>
              </tr>
            ))}
          </tbody>
        </Table>
      )}
    </>
  );
}
