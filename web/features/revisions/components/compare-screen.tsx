import { Link, useParams } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { paths } from '../../../app/paths';
import { NotFoundScreen } from '../../../app/not-found-screen';
import { QueryErrorNotice } from '../../../app/query-error-notice';
import { Loading } from '../../../components/ui/loading';
import { PageHeader } from '../../../components/ui/page-header';
import { comparisonQuery, revisionQuery } from '../api/revision-queries';
import { MovedNumbersTable } from './moved-numbers-table';
import { SectionChanges } from './section-changes';

/** Route /revisions/:a/compare/:b — what changed in the text and which numbers moved. */
export function CompareScreen() {
  const params = useParams();
  const from = Number(params.id);
  const to = Number(params.other);
  if (![from, to].every((n) => Number.isInteger(n) && n > 0)) return <NotFoundScreen />;
  return <Comparison from={from} to={to} />;
}

function Comparison({ from, to }: { from: number; to: number }) {
  const comparison = useQuery(comparisonQuery(from, to));
  // For the study's name and the way back; the revision is usually cached from the list already.
  const later = useQuery(revisionQuery(to));

  if (comparison.isPending) return <Loading label="Comparing the revisions…" />;
  if (comparison.isError) return <QueryErrorNotice error={comparison.error} what="comparison" onRetry={() => comparison.refetch()} />;
  const c = comparison.data;
  const changed = c.sections.filter((s) => s.change !== 'unchanged');
  const unchanged = c.sections.length - changed.length;
  const study = later.data;

  return (
    <>
      <nav aria-label="Breadcrumb" className="mb-4 flex flex-wrap gap-x-6 gap-y-2 text-sm">
        {study && (
          <Link to={paths.studyRevisions(study.studyId)} className="underline-offset-4 hover:underline">
            ← All revisions of {study.studyTitle}
          </Link>
        )}
        <Link to={paths.revision(c.from.id)} className="underline-offset-4 hover:underline">
          Open revision {c.from.number}
        </Link>
        <Link to={paths.revision(c.to.id)} className="underline-offset-4 hover:underline">
          Open revision {c.to.number}
        </Link>
      </nav>
      <PageHeader
        eyebrow={study?.studyTitle ?? 'Comparison'}
        title={`Revision ${c.from.number} → revision ${c.to.number}`}
        description={
          <>
            Added words are <ins className="bg-ok-tint text-ok">underlined</ins>, removed words <del className="bg-danger-tint text-danger">struck through</del>.
          </>
        }
      />
      <div className="flex flex-col gap-10">
        <section aria-labelledby="moved-title" className="flex flex-col gap-3">
          <h2 id="moved-title" className="text-xl font-bold">
            Numbers that moved <span className="font-normal text-ink-faint">({c.movedNumbers.length})</span>
          </h2>
          {c.movedNumbers.length > 0 ? (
            <MovedNumbersTable rows={c.movedNumbers} caption={`Model outputs that moved from revision ${c.from.number} to ${c.to.number}`} />
          ) : (
            <p className="text-sm text-ink-soft">Every model output is the same in both revisions.</p>
          )}
          {(c.addedBlocks.length > 0 || c.removedBlocks.length > 0) && (
            <ul className="text-sm text-ink-soft">
              {c.addedBlocks.map((b) => (
                <li key={`a-${b.blockId}`}>New model block: {b.title}</li>
              ))}
              {c.removedBlocks.map((b) => (
                <li key={`r-${b.blockId}`}>Model block removed: {b.title}</li>
              ))}
            </ul>
          )}
        </section>
        <section aria-labelledby="text-title" className="flex flex-col gap-4">
          <h2 id="text-title" className="text-xl font-bold">
            Text changes <span className="font-normal text-ink-faint">({changed.length} of {c.sections.length} sections)</span>
          </h2>
          <div className="flex flex-col gap-6 rounded-lg border border-rule bg-sheet px-6 py-6">
            {changed.length === 0 ? <p className="text-sm text-ink-soft">The text is the same in both revisions.</p> : changed.map((s, i) => <SectionChanges key={`${s.sectionId ?? 'none'}-${i}`} section={s} />)}
            {unchanged > 0 && changed.length > 0 && <p className="text-sm text-ink-faint">{unchanged === 1 ? '1 section is' : `${unchanged} sections are`} unchanged.</p>}
          </div>
        </section>
      </div>
    </>
  );
}
