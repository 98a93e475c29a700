import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { paths } from '../../../app/paths';
import { QueryErrorNotice } from '../../../app/query-error-notice';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { Loading } from '../../../components/ui/loading';
import { engagementStudiesQuery } from '../api/study-list-queries';
import { NewStudyForm } from './new-study-form';
import { StudyList } from './study-list';

interface StudiesSectionProps {
  engagementId: number;
  /** Partners and consultants (members, or they would not see the engagement) write; administrators read. */
  canWrite: boolean;
}

/** The studies of an engagement on its overview, with the way to start one and to the register. */
export function StudiesSection({ engagementId, canWrite }: StudiesSectionProps) {
  const studies = useQuery(engagementStudiesQuery(engagementId));
  const [creating, setCreating] = useState(false);

  return (
    <section aria-labelledby="studies-title" className="flex flex-col gap-4">
      <div className="flex flex-wrap items-baseline justify-between gap-3">
        <h2 id="studies-title" className="text-xl font-bold">
          Studies
        </h2>
        <div className="flex flex-wrap items-center gap-4">
          <Link to={paths.assumptions(engagementId)} className="text-sm font-medium underline-offset-4 hover:underline">
            Assumption register
          </Link>
          {canWrite && !creating && (
            <Button variant="primary" onClick={() => setCreating(true)}>
              New study
            </Button>
          )}
        </div>
      </div>
      {creating && <NewStudyForm engagementId={engagementId} onCancel={() => setCreating(false)} />}
      {studies.isPending && <Loading label="Loading studies…" />}
      {studies.isError && <QueryErrorNotice error={studies.error} what="list of studies" onRetry={() => studies.refetch()} />}
      {studies.isSuccess && studies.data.length === 0 && !creating && (
        <EmptyState
          title="No studies yet"
          action={
            canWrite ? (
              <Button variant="secondary" onClick={() => setCreating(true)}>
                Start the first study
              </Button>
            ) : undefined
          }
        >
          A study is one report: sections of text whose figures are live queueing calculations, reviewed and signed off by a
          partner.
        </EmptyState>
      )}
      {studies.isSuccess && studies.data.length > 0 && <StudyList studies={studies.data} canWrite={canWrite} />}
    </section>
  );
}
