import { useState } from 'react';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { paths } from '../../../app/paths';
import { NotFoundScreen } from '../../../app/not-found-screen';
import { QueryErrorNotice } from '../../../app/query-error-notice';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { Loading } from '../../../components/ui/loading';
import { PageHeader } from '../../../components/ui/page-header';
import { readerStudyQuery } from '../../study-reader/api/reader-query';
import { studyRevisionsQuery } from '../api/revision-queries';
import { RevisionTable } from './revision-table';

/** Route /studies/:id/revisions — every revision of a study, and two of them picked to compare. */
export function StudyRevisionsScreen() {
  const id = Number(useParams().id);
  if (!Number.isInteger(id) || id <= 0) return <NotFoundScreen />;
  return <StudyRevisions studyId={id} />;
}

function StudyRevisions({ studyId }: { studyId: number }) {
  const navigate = useNavigate();
  const study = useQuery(readerStudyQuery(studyId));
  const revisions = useQuery(studyRevisionsQuery(studyId));
  const [picked, setPicked] = useState<number[]>([]);

  if (study.isPending || revisions.isPending) return <Loading label="Loading the revisions…" />;
  if (study.isError) return <QueryErrorNotice error={study.error} what="study" onRetry={() => study.refetch()} />;
  if (revisions.isError) return <QueryErrorNotice error={revisions.error} what="list of revisions" onRetry={() => revisions.refetch()} />;
  const s = study.data;
  const list = [...revisions.data].sort((a, b) => b.number - a.number);

  // Keeps the two most recent picks: a third tick replaces the older one.
  const pick = (rid: number, on: boolean) => setPicked((prev) => (on ? [...prev.filter((p) => p !== rid), rid].slice(-2) : prev.filter((p) => p !== rid)));
  const chosen = list.filter((r) => picked.includes(r.id)).sort((a, b) => a.number - b.number);

  return (
    <>
      <nav aria-label="Breadcrumb" className="mb-4 flex flex-wrap justify-between gap-3 text-sm">
        <Link to={paths.engagement(s.engagementId)} className="underline-offset-4 hover:underline">
          ← {s.engagementName}
        </Link>
        <Link to={paths.study(s.id)} className="underline-offset-4 hover:underline">
          Back to writing
        </Link>
      </nav>
      <PageHeader eyebrow="Revisions" title={s.title} description="Each submission freezes the text, every block's inputs and results, and the assumptions used." />
      {list.length === 0 ? (
        <EmptyState title="No revisions yet">Use “Submit for review” in the editor when the study is ready for a partner to read.</EmptyState>
      ) : (
        <div className="flex flex-col gap-4">
          {list.length > 1 && (
            <div className="flex flex-wrap items-center gap-3 rounded-lg border border-rule bg-sheet px-4 py-3 text-sm">
              <p className="flex-1 text-ink-soft" aria-live="polite">
                {chosen.length === 2 ? `Revisions ${chosen[0].number} and ${chosen[1].number} picked.` : 'Tick two revisions to see what changed between them.'}
              </p>
              <Button variant="primary" size="sm" disabled={chosen.length !== 2} onClick={() => navigate(paths.compareRevisions(chosen[0].id, chosen[1].id))}>
                Compare picked revisions
              </Button>
            </div>
          )}
          <RevisionTable revisions={list} caption={`Revisions of ${s.title}`} picked={picked} onPick={list.length > 1 ? pick : undefined} />
        </div>
      )}
    </>
  );
}
