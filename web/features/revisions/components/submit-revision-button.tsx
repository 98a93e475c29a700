import { useEffect, useRef, useState } from 'react';
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { templateLeftovers, type TemplateLeftovers } from '#shared/editor/template-leftovers';
import type { StudyDetail } from '#shared/schemas/studies';
import { Button } from '../../../components/ui/button';
import { studyRevisionsQuery } from '../api/revision-queries';
import { useSubmitRevision } from '../api/revision-mutations';
import { SubmitDialog } from './submit-dialog';

interface SubmitRevisionButtonProps {
  studyId: number;
  /** The editor's save state and its "save now", so the submission is the text on screen. */
  saveStatus: string;
  saveNow: () => Promise<void>;
  /** The text on screen, checked for template guidance and placeholders left in it. */
  currentDocument: () => unknown;
  /** Called when the outcome dialog closes after a submission, to reload the study with its new status. */
  onSubmitted: () => Promise<void>;
}

const wait = (ms: number) => new Promise((r) => window.setTimeout(r, ms));

/**
 * "Submit for review" in the editor: confirms which revision number the text becomes, flushes
 * any pending save first, then submits with the saved version so nothing unseen goes along.
 */
export function SubmitRevisionButton({ studyId, saveStatus, saveNow, currentDocument, onSubmitted }: SubmitRevisionButtonProps) {
  const qc = useQueryClient();
  const revisions = useQuery(studyRevisionsQuery(studyId));
  const submit = useSubmitRevision(studyId);
  const [open, setOpen] = useState(false);
  const [leftovers, setLeftovers] = useState<TemplateLeftovers>({ guidance: 0, placeholders: [] });
  const [flushError, setFlushError] = useState<string | null>(null);
  const [flushing, setFlushing] = useState(false);
  const status = useRef(saveStatus);
  useEffect(() => {
    status.current = saveStatus;
  }, [saveStatus]);
  const next = (revisions.data ?? []).reduce((n, r) => Math.max(n, r.number), 0) + 1;

  /** Saves what is typed and waits (a few seconds at most) until the server holds it. */
  const flush = async (): Promise<boolean> => {
    for (let i = 0; i < 40; i++) {
      await saveNow();
      if (status.current === 'saved') return true;
      if (['conflict', 'refused', 'offline', 'frozen'].includes(status.current)) return false;
      await wait(150);
    }
    return false;
  };

  const confirm = async () => {
    setFlushError(null);
    setFlushing(true);
    const saved = await flush();
    setFlushing(false);
    if (!saved) return setFlushError('Your latest changes are not saved yet (see the save state above the text). Fix that first, then submit.');
    const version = qc.getQueryData<StudyDetail>(['studies', 'detail', studyId])?.version;
    submit.mutate(version);
  };

  return (
    <>
      <Button variant="primary" size="sm" onClick={() => { submit.reset(); setFlushError(null); setLeftovers(templateLeftovers(currentDocument())); setOpen(true); }}>
        Submit for review
      </Button>
      {open && (
        <SubmitDialog
          number={next}
          leftovers={leftovers}
          working={flushing || submit.isPending}
          error={flushError ?? submit.error?.message ?? null}
          submitted={submit.data ? { id: submit.data.id, number: submit.data.number } : null}
          onConfirm={() => void confirm()}
          onClose={() => {
            setOpen(false);
            // Reloading re-creates the editor, so it waits until the outcome was read.
            if (submit.isSuccess) void onSubmitted();
          }}
        />
      )}
    </>
  );
}
