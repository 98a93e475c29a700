import { useEffect, useId, useRef } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '../../../app/paths';
import { Banner } from '../../../components/ui/banner';
import { Button } from '../../../components/ui/button';
import type { TemplateLeftovers } from '#shared/editor/template-leftovers';
import { plural } from '../../../lib/plural';

interface SubmitDialogProps {
  number: number;
  /** Template scaffolding still in the text: said before submitting, not a refusal. */
  leftovers: TemplateLeftovers;
  working: boolean;
  error: string | null;
  submitted: { id: number; number: number } | null;
  onConfirm: () => void;
  onClose: () => void;
}

/**
 * The confirmation before submitting, then its outcome, in a native modal <dialog> (focus kept
 * inside, Escape closes, focus returns to the button that opened it).
 */
export function SubmitDialog({ number, leftovers, working, error, submitted, onConfirm, onClose }: SubmitDialogProps) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  useEffect(() => {
    const dialog = ref.current;
    if (dialog && !dialog.open) dialog.showModal();
    return () => dialog?.close();
  }, []);

  return (
    <dialog ref={ref} aria-labelledby={titleId} onClose={() => {
        // React's development double-run closes and reopens the dialog; only a close that sticks counts.
        if (!ref.current?.open) onClose();
      }} className="m-auto w-[min(34rem,calc(100vw-2rem))] rounded-lg border border-rule bg-sheet p-0 text-ink shadow-xl backdrop:bg-ink/40">
      <div className="flex flex-col gap-4 px-6 py-5 text-sm">
        <h2 id={titleId} className="text-xl font-bold">
          {submitted ? `Revision ${submitted.number} submitted` : `Submit as revision ${number}?`}
        </h2>
        {submitted ? (
          <>
            <Banner tone="ok">
              The partners of this engagement were told. Revision {submitted.number} stays exactly as submitted; you can keep working on the draft,
              and your changes go into the next revision.
            </Banner>
            <div className="flex flex-wrap gap-2">
              <Link to={paths.revision(submitted.id)} className="rounded-md bg-accent px-4 py-2 font-medium text-white no-underline hover:bg-accent-strong">
                Open revision {submitted.number}
              </Link>
              <Button onClick={onClose} autoFocus>
                Close
              </Button>
            </div>
          </>
        ) : (
          <>
            <p>
              The current text, every model block's inputs and results and the assumptions they use become <strong>revision {number}</strong>, frozen
              as they are now. A partner then reads it and signs it off or asks for changes.
            </p>
            <p className="text-ink-soft">Anything not yet saved is saved first.</p>
            <LeftoversNotice leftovers={leftovers} />
            {error && (
              <Banner tone="danger" title="Not submitted">
                {error}
              </Banner>
            )}
            <div className="flex flex-wrap gap-2">
              <Button variant="primary" busy={working} onClick={onConfirm} autoFocus>
                {working ? 'Submitting…' : `Submit revision ${number}`}
              </Button>
              <Button variant="quiet" onClick={onClose} disabled={working}>
                Cancel
              </Button>
            </div>
          </>
        )}
      </div>
    </dialog>
  );
}

/** What of the template is still in the text; it would reach the partner and, once released, the client's PDF. */
function LeftoversNotice({ leftovers }: { leftovers: TemplateLeftovers }) {
  const { guidance, placeholders } = leftovers;
  if (guidance === 0 && placeholders.length === 0) return null;
  const parts = [
    guidance > 0 && `${plural(guidance, 'paragraph')} of template guidance (starting “Guidance:”)`,
    placeholders.length > 0 && `${plural(placeholders.length, 'placeholder')} still to fill in (${placeholders.slice(0, 4).join(', ')}${placeholders.length > 4 ? ', …' : ''})`,
  ].filter(Boolean);
  return (
    <Banner tone="warn" title="Template text left in the study">
      The text still holds {parts.join(' and ')}. They go into the revision as they are, and into the client’s PDF if it is released. You can
      submit anyway, or cancel and replace them first.
    </Banner>
  );
}
