import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { Link, useParams } from 'react-router-dom';
import { NotFoundScreen } from '../../../app/not-found-screen';
import { paths } from '../../../app/paths';
import { QueryErrorNotice } from '../../../app/query-error-notice';
import { Button } from '../../../components/ui/button';
import { Loading } from '../../../components/ui/loading';
import { PageHeader } from '../../../components/ui/page-header';
import { useCurrentUser } from '../../auth/api/use-current-user';
import { engagementQuery } from '../../engagements/api/engagement-queries';
import { AssumptionRegister } from './assumption-register';

/** Route /engagements/:id/assumptions: the engagement's register of named, unit-carrying values. */
export function AssumptionsScreen() {
  const id = Number(useParams().id);
  if (!Number.isInteger(id) || id <= 0) return <NotFoundScreen />;
  return <AssumptionsPage engagementId={id} />;
}

function AssumptionsPage({ engagementId }: { engagementId: number }) {
  const user = useCurrentUser();
  const engagement = useQuery(engagementQuery(engagementId));
  const [creating, setCreating] = useState(false);
  // Administrators read the register; partners and consultants (members) keep it.
  const canWrite = user.role === 'partner' || user.role === 'consultant';

  if (engagement.isPending) return <Loading label="Loading the engagement…" />;
  if (engagement.isError) return <QueryErrorNotice error={engagement.error} what="engagement" onRetry={() => engagement.refetch()} />;
  const e = engagement.data;

  return (
    <>
      <nav aria-label="Breadcrumb" className="mb-4 text-sm">
        <Link to={paths.engagement(e.id)} className="underline-offset-4 hover:underline">
          ← {e.name}
        </Link>
      </nav>
      <PageHeader
        eyebrow={e.clientName}
        title="Assumption register"
        description="The named values this engagement's studies compute from, each with its unit, source and owner. Changing one recomputes every model block of a draft study that uses it."
        actions={
          canWrite ? (
            <Button variant="primary" onClick={() => setCreating(true)}>
              New assumption
            </Button>
          ) : undefined
        }
      />
      <AssumptionRegister engagementId={e.id} canWrite={canWrite} creating={creating} onCreatingChange={setCreating} />
    </>
  );
}
