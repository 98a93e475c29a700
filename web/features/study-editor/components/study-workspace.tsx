import { useMemo, useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import type { JSONContent } from '@tiptap/react';
import { DRAFT_STUDY_STATUSES, STUDY_TITLE_MAX, type StudyDetail } from '#shared/schemas/studies';
import { paths } from '../../../app/paths';
import { Banner } from '../../../components/ui/banner';
import { BlockEnvironmentContext, type BlockEnvironment } from '../../../editor/block-environment';
import { StudyCautions } from '../../../editor/study-cautions';
import { StudyEditor } from '../../../editor/study-editor';
import { engagementAssumptionsQuery } from '../api/study-queries';
import { useSaveAsCopy } from '../api/study-mutations';
import { useAutosave } from '../api/use-autosave';
import { SubmitRevisionButton } from '../../revisions/components/submit-revision-button';
import { ConflictBanner } from './conflict-banner';
import { SaveIndicator } from './save-indicator';
import { StudyStatusBadge } from '../../studies/components/study-status-badge';

/** A new revision may be submitted unless one is still in review or approved and not yet released. */
const SUBMITTABLE = new Set(['draft', 'changes_requested', 'released']);

/** The study being written: title, save state, the editor with its blocks' results and the register. */
export function StudyWorkspace({ study, onReload }: { study: StudyDetail; onReload: () => Promise<void> }) {
  const navigate = useNavigate();
  const autosave = useAutosave(study);
  const assumptions = useQuery(engagementAssumptionsQuery(study.engagementId));
  const copy = useSaveAsCopy();
  const [title, setTitle] = useState(study.title);
  const [reloading, setReloading] = useState(false);
  const draft = (DRAFT_STUDY_STATUSES as readonly string[]).includes(study.status);
  const editable = draft && autosave.status !== 'frozen';

  const env = useMemo<BlockEnvironment>(
    () => ({
      results: autosave.results,
      confirmedConfigs: autosave.confirmedConfigs,
      assumptions: assumptions.data ?? [],
      assumptionsStatus: assumptions.status,
      saveIssues: autosave.saveIssues,
      editable,
    }),
    [autosave.results, autosave.confirmedConfigs, autosave.saveIssues, assumptions.data, assumptions.status, editable],
  );

  const keepCopy = () =>
    copy.mutate(
      { engagementId: study.engagementId, title: `${autosave.currentTitle().trim() || study.title} (my copy)`.slice(0, STUDY_TITLE_MAX), document: autosave.currentDocument() },
      { onSuccess: (created) => navigate(paths.study(created.id)) },
    );

  return (
    <div className="-mx-2">
      <title>{`${title || 'Untitled study'} · Sojourn`}</title>
      <nav aria-label="Breadcrumb" className="mb-3 flex flex-wrap items-center justify-between gap-3 text-sm">
        <Link to={paths.engagement(study.engagementId)} className="underline-offset-4 hover:underline">
          ← {study.engagementName}
        </Link>
        <div className="flex items-center gap-4">
          <SaveIndicator status={autosave.status} savedAt={autosave.savedAt} />
          <Link to={paths.studyRevisions(study.id)} className="underline-offset-4 hover:underline">
            Revisions
          </Link>
          {SUBMITTABLE.has(study.status) && <SubmitRevisionButton studyId={study.id} saveStatus={autosave.status} saveNow={autosave.saveNow} currentDocument={autosave.currentDocument} onSubmitted={onReload} />}
          <Link to={paths.studyReader(study.id)} className="rounded-md border border-rule-strong px-3 py-1.5 text-ink no-underline hover:border-ink-soft">
            Reading view
          </Link>
        </div>
      </nav>
      <header className="mb-6 flex flex-wrap items-center gap-3">
        <label htmlFor="study-title" className="sr-only">
          Study title
        </label>
        <input
          id="study-title"
          value={title}
          maxLength={STUDY_TITLE_MAX}
          readOnly={!editable}
          onChange={(e) => {
            setTitle(e.target.value);
            autosave.changeTitle(e.target.value);
          }}
          onBlur={() => void autosave.saveNow()}
          className="min-w-0 flex-1 rounded-md border border-transparent bg-transparent px-2 py-1 font-serif text-2xl font-bold text-ink hover:border-rule focus:border-accent sm:text-3xl"
        />
        <StudyStatusBadge status={study.status} />
      </header>

      <div className="mb-6 space-y-3">
        {autosave.status === 'conflict' && (
          <ConflictBanner
            onKeepCopy={keepCopy}
            copying={copy.isPending}
            copyError={copy.error?.message ?? null}
            loading={reloading}
            onLoadLatest={() => {
              setReloading(true);
              void onReload().finally(() => setReloading(false));
            }}
          />
        )}
        {autosave.status === 'refused' && autosave.message && (
          <Banner tone="danger" title="This version was not saved">
            {autosave.message}
          </Banner>
        )}
        {!editable && (
          <Banner tone="info" title="This study is read-only">
            {autosave.status === 'frozen' && autosave.message ? autosave.message : 'Your role can read this study but not change it.'}
          </Banner>
        )}
        {study.safetyCritical && <StudyCautions />}
      </div>

      <BlockEnvironmentContext value={env}>
        <StudyEditor
          initialContent={study.document as JSONContent}
          editable={editable}
          onChange={(doc) => autosave.changeDocument(doc as StudyDetail['document'])}
          onBlur={() => void autosave.saveNow()}
        />
      </BlockEnvironmentContext>
    </div>
  );
}
