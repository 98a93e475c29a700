import { Link, useParams } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { paths } from '../../../app/paths';
import { NotFoundScreen } from '../../../app/not-found-screen';
import { QueryErrorNotice } from '../../../app/query-error-notice';
import { Loading } from '../../../components/ui/loading';
import { StudyCautions } from '../../../editor/study-cautions';
import { formatDate } from '../../../lib/format-date';
import { useCurrentUser } from '../../auth/api/use-current-user';
import { groupThreads } from '../api/group-threads';
import { revisionCommentsQuery, revisionQuery } from '../api/revision-queries';
import { DecisionPanel } from './decision-panel';
import { FrozenDocument } from './frozen-document';
import { GeneralComments } from './general-comments';
import { ReleasePanel } from './release-panel';
import { RevisionNotices } from './revision-notices';
import { RevisionStatusBadge } from './revision-status-badge';
import { useCommentActions } from './use-comment-actions';

/** Route /revisions/:id — one frozen revision to read, comment on, decide on and release. */
export function RevisionScreen() {
  const id = Number(useParams().id);
  if (!Number.isInteger(id) || id <= 0) return <NotFoundScreen />;
  return <RevisionView id={id} />;
}

function RevisionView({ id }: { id: number }) {
  const user = useCurrentUser();
  const writer = user.role === 'partner' || user.role === 'consultant';
  const revision = useQuery(revisionQuery(id));
  // Clients never see comments; the API refuses them anyway.
  const comments = useQuery({ ...revisionCommentsQuery(id), enabled: user.role !== 'client' });
  const actions = useCommentActions(id, writer);

  if (revision.isPending) return <Loading label="Opening the revision…" />;
  if (revision.isError) return <QueryErrorNotice error={revision.error} what="revision" onRetry={() => revision.refetch()} />;
  const r = revision.data;
  const s = r.snapshot;
  const threads = groupThreads(comments.data ?? []);

  return (
    <>
      <title>{`Revision ${r.number} · ${r.studyTitle} · Sojourn`}</title>
      <nav aria-label="Breadcrumb" className="mb-4 flex flex-wrap justify-between gap-3 text-sm">
        <Link to={paths.engagement(r.engagementId)} className="underline-offset-4 hover:underline">
          ← {r.engagementName}
        </Link>
        {user.role !== 'client' && (
          <Link to={paths.studyRevisions(r.studyId)} className="underline-offset-4 hover:underline">
            All revisions of this study
          </Link>
        )}
      </nav>
      <div className="grid gap-8 xl:grid-cols-[minmax(0,1fr)_20rem]">
        <div className="flex min-w-0 flex-col gap-4">
          <div id="revision-notices" tabIndex={-1} className="flex flex-col gap-4 focus:outline-none">
            <RevisionNotices revision={r} />
          </div>
          <article aria-label={`Revision ${r.number} of ${r.studyTitle}`} className="rounded-sm border border-rule bg-sheet px-8 py-12 shadow-sm sm:px-14">
            <header className="mb-10 border-b border-rule pb-8">
              <p className="font-sans text-xs font-semibold tracking-widest text-ink-faint uppercase">{s.engagement.name}</p>
              <h1 className="mt-2 font-serif text-3xl leading-tight font-bold">{s.study.title}</h1>
              <p className="mt-3 flex flex-wrap items-center gap-3 font-sans text-sm text-ink-soft">
                <span className="font-semibold text-ink">Revision {r.number}</span>
                <RevisionStatusBadge status={r.status} />
                <span>
                  submitted {formatDate(r.submittedAt)} by {r.submittedByName ?? s.submittedBy}
                </span>
              </p>
            </header>
            {s.engagement.safetyCritical && <StudyCautions />}
            {comments.isError && <p className="mb-4 font-sans text-sm text-danger">Comments could not be loaded: {comments.error.message}</p>}
            <FrozenDocument snapshot={s} threads={threads} actions={user.role === 'client' || comments.isError ? null : actions} />
          </article>
        </div>
        <aside aria-label="Review" className="flex flex-col gap-6 xl:sticky xl:top-4 xl:h-fit">
          {r.canDecide && r.status === 'in_review' && <DecisionPanel revision={r} />}
          {(r.status === 'approved' || r.status === 'released') && (
            <div id="revision-release" tabIndex={-1} className="focus:outline-none">
              <ReleasePanel revision={r} />
            </div>
          )}
          {user.role !== 'client' && <GeneralComments threads={threads.get('general') ?? []} actions={actions} />}
          <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 rounded-lg border border-rule bg-sheet px-4 py-3 text-xs text-ink-soft">
            <dt>Engine</dt>
            <dd>{r.engineVersion}</dd>
            <dt>SHA-256</dt>
            <dd className="font-mono break-all">{r.sha256}</dd>
          </dl>
        </aside>
      </div>
    </>
  );
}
