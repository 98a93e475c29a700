import { useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { paths } from '../../../app/paths';
import { QueryErrorNotice } from '../../../app/query-error-notice';
import { NotFoundScreen } from '../../../app/not-found-screen';
import { Button } from '../../../components/ui/button';
import { Loading } from '../../../components/ui/loading';
import { PageHeader } from '../../../components/ui/page-header';
import { formatDate } from '../../../lib/format-date';
import { useCurrentUser } from '../../auth/api/use-current-user';
import { engagementQuery } from '../api/engagement-queries';
import { CautionsNote } from './cautions-note';
import { EngagementBadges } from './engagement-badges';
import { EngagementEditPanel } from './engagement-edit-panel';
import { MembersPanel } from './members-panel';
import { StudiesSection } from '../../studies/components/studies-section';
import { EngagementDeliverables } from '../../deliverables/components/engagement-deliverables';
import { DatasetsLink } from '../../datasets/components/datasets-link';

export function EngagementOverviewScreen() {
  const id = Number(useParams().id);
  if (!Number.isInteger(id) || id <= 0) return <NotFoundScreen />;
  return <EngagementOverview id={id} />;
}

function EngagementOverview({ id }: { id: number }) {
  const user = useCurrentUser();
  const engagement = useQuery(engagementQuery(id));
  const [editing, setEditing] = useState(false);
  const isAdmin = user.role === 'admin';

  if (engagement.isPending) return <Loading label="Loading the engagement…" />;
  if (engagement.isError) return <QueryErrorNotice error={engagement.error} what="engagement" onRetry={() => engagement.refetch()} />;
  const e = engagement.data;

  return (
    <>
      <nav aria-label="Breadcrumb" className="mb-4 text-sm">
        <Link to={paths.engagements} className="underline-offset-4 hover:underline">
          ← All engagements
        </Link>
      </nav>
      <PageHeader
        eyebrow={e.clientName}
        title={e.name}
        description={<EngagementBadges engagement={e} />}
        actions={
          isAdmin && !editing ? (
            <Button variant="secondary" onClick={() => setEditing(true)}>
              Edit details
            </Button>
          ) : undefined
        }
      />
      <div className="flex flex-col gap-10">
        {editing ? (
          <EngagementEditPanel engagement={e} onDone={() => setEditing(false)} />
        ) : (
          <section aria-label="About this engagement" className="grid gap-8 lg:grid-cols-[minmax(0,1fr)_16rem]">
            <div className="max-w-prose font-serif leading-relaxed whitespace-pre-line text-ink">
              {e.description || <span className="text-ink-faint italic">No description yet.</span>}
            </div>
            <dl className="grid h-fit grid-cols-[auto_1fr] gap-x-4 gap-y-2 rounded-lg border border-rule bg-sheet px-5 py-4 text-sm">
              <dt className="text-ink-faint">Client</dt>
              <dd>{e.clientName}</dd>
              <dt className="text-ink-faint">Members</dt>
              <dd className="tabular-nums">{e.memberCount}</dd>
              <dt className="text-ink-faint">Opened</dt>
              <dd>{formatDate(e.createdAt, false)}</dd>
              <dt className="text-ink-faint">Updated</dt>
              <dd>{formatDate(e.updatedAt, false)}</dd>
            </dl>
          </section>
        )}
        {e.safetyCritical && <CautionsNote />}
        {user.role === 'client' ? <EngagementDeliverables engagementId={e.id} /> : <StudiesSection engagementId={e.id} canWrite={!isAdmin} />}
        {user.role !== 'client' && <DatasetsLink engagementId={e.id} />}
        <MembersPanel engagementId={e.id} canManage={isAdmin} />
      </div>
    </>
  );
}
