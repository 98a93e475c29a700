import { Link, useParams } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { paths } from '../../../app/paths';
import { NotFoundScreen } from '../../../app/not-found-screen';
import { QueryErrorNotice } from '../../../app/query-error-notice';
import { Loading } from '../../../components/ui/loading';
import { StudyCautions } from '../../../editor/study-cautions';
import { outlineItems } from '../../../editor/outline-items';
import { formatDate } from '../../../lib/format-date';
import { useCurrentUser } from '../../auth/api/use-current-user';
import { readerStudyQuery } from '../api/reader-query';
import { ReaderDocument, type DocNode } from './reader-document';
import { STUDY_STATUS_WORDS } from '../../studies/components/study-status-badge';


/** Route /studies/:id/read — the study as the client will read it, with no editing chrome. */
export function StudyReaderScreen() {
  const id = Number(useParams().id);
  if (!Number.isInteger(id) || id <= 0) return <NotFoundScreen />;
  return <StudyReader id={id} />;
}

function StudyReader({ id }: { id: number }) {
  const user = useCurrentUser();
  const study = useQuery(readerStudyQuery(id));
  if (study.isPending) return <Loading label="Opening the study…" />;
  if (study.isError) return <QueryErrorNotice error={study.error} what="study" onRetry={() => study.refetch()} />;
  const s = study.data;
  const sections = outlineItems(s.document).filter((h) => h.level <= 2 && h.text);

  return (
    <>
      <title>{`${s.title} · Sojourn`}</title>
      {user.role !== 'client' && (
        <nav aria-label="Breadcrumb" className="mx-auto mb-4 flex max-w-[52rem] justify-between text-sm print:hidden">
          <Link to={paths.engagement(s.engagementId)} className="underline-offset-4 hover:underline">
            ← {s.engagementName}
          </Link>
          <Link to={paths.study(s.id)} className="underline-offset-4 hover:underline">
            Back to writing
          </Link>
        </nav>
      )}
      <article className="mx-auto max-w-[52rem] rounded-sm border border-rule bg-sheet px-8 py-12 shadow-sm sm:px-16">
        <header className="mb-10 border-b border-rule pb-8">
          <p className="font-sans text-xs font-semibold tracking-widest text-ink-faint uppercase">{s.engagementName}</p>
          <h1 className="mt-2 font-serif text-3xl leading-tight font-bold">{s.title}</h1>
          <p className="mt-3 font-sans text-sm text-ink-soft">
            {STUDY_STATUS_WORDS[s.status]} · version {s.version} · {formatDate(s.updatedAt, false)}
          </p>
        </header>
        {s.safetyCritical && <StudyCautions />}
        {sections.length > 1 && (
          <nav aria-label="Contents" className="mb-10">
            <h2 className="mb-2 font-serif text-lg font-bold">Contents</h2>
            <ol className="space-y-1 font-serif text-sm">
              {sections.map((h, i) => (
                <li key={`${h.pos}-${i}`} className={h.level === 2 ? 'pl-5' : ''}>
                  {h.sectionId ? <a href={`#${h.sectionId}`}>{h.text}</a> : h.text}
                </li>
              ))}
            </ol>
          </nav>
        )}
        <ReaderDocument doc={s.document as DocNode} blocks={s.blocks} />
      </article>
    </>
  );
}
