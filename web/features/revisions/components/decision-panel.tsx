import { useState } from 'react';
import { DECISION_REASON_MAX, decisionSchema, type RevisionDetail } from '#shared/schemas/revisions';
import { Banner } from '../../../components/ui/banner';
import { Button } from '../../../components/ui/button';
import { TextAreaField } from '../../../components/ui/text-area-field';
import { useFormErrors } from '../../../lib/use-form-errors';
import { useDecideRevision } from '../api/revision-mutations';

const FIELDS = ['reason'] as const;

/**
 * The partner's decision: sign the revision off, or send it back with a reason (required, the
 * consultant reads it in the revision list). Open threads are pointed out before signing off.
 */
export function DecisionPanel({ revision }: { revision: RevisionDetail }) {
  const decide = useDecideRevision(revision.id);
  const form = useFormErrors(FIELDS);
  const [reason, setReason] = useState('');
  const [mode, setMode] = useState<'choose' | 'changes' | 'approve'>('choose');

  const send = (decision: 'approve' | 'request-changes') => {
    const values = form.validate(decisionSchema, { decision, reason });
    if (!values) return;
    // The panel goes away with the decision; focus follows to what replaced it (release panel or notice).
    const target = decision === 'approve' ? 'revision-release' : 'revision-notices';
    decide.mutate(values, { onError: form.fromError, onSuccess: () => window.setTimeout(() => document.getElementById(target)?.focus(), 0) });
  };

  return (
    <section aria-labelledby="decision-title" className="rounded-lg border border-rule-strong bg-sheet p-5">
      <h2 id="decision-title" className="text-lg font-bold">
        Your decision
      </h2>
      <p className="mt-1 text-sm text-ink-soft">Read the frozen text and its numbers below. Signing off binds your name and this revision's fingerprint into the signed PDF.</p>
      {form.formError && (
        <div className="mt-3">
          <Banner tone="danger" title="The decision was not recorded">
            {form.formError}
          </Banner>
        </div>
      )}
      {mode === 'choose' && (
        <div className="mt-4 flex flex-wrap gap-2">
          <Button variant="primary" onClick={() => setMode('approve')}>
            Approve
          </Button>
          <Button variant="secondary" onClick={() => setMode('changes')}>
            Request changes
          </Button>
        </div>
      )}
      {mode === 'approve' && (
        <div role="group" aria-label="Confirm sign-off" className="mt-4 flex flex-col gap-3">
          <p className="text-sm">
            Sign off revision {revision.number} of “{revision.studyTitle}”?
            {revision.openThreads > 0 && ` ${revision.openThreads} comment ${revision.openThreads === 1 ? 'thread is' : 'threads are'} still open.`}
          </p>
          <div className="flex gap-2">
            <Button variant="primary" autoFocus busy={decide.isPending} onClick={() => send('approve')}>
              Sign off revision {revision.number}
            </Button>
            <Button variant="quiet" onClick={() => setMode('choose')}>
              Cancel
            </Button>
          </div>
        </div>
      )}
      {mode === 'changes' && (
        <form
          className="mt-4 flex flex-col gap-3"
          onSubmit={(e) => {
            e.preventDefault();
            send('request-changes');
          }}
        >
          <TextAreaField
            label="What needs to change"
            hint="The consultant sees this with the revision; comments on sections and blocks stay where they are."
            value={reason}
            onValueChange={setReason}
            maxLength={DECISION_REASON_MAX}
            error={form.fieldErrors.reason}
            autoFocus
          />
          <div className="flex gap-2">
            <Button type="submit" variant="primary" busy={decide.isPending}>
              Send back for changes
            </Button>
            <Button variant="quiet" onClick={() => setMode('choose')}>
              Cancel
            </Button>
          </div>
        </form>
      )}
    </section>
  );
}
