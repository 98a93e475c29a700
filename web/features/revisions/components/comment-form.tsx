import { useState, type FormEvent } from 'react';
import { COMMENT_MAX } from '#shared/schemas/revisions';
import { Button } from '../../../components/ui/button';
import { TextAreaField } from '../../../components/ui/text-area-field';

interface CommentFormProps {
  label: string;
  submitLabel: string;
  /** Resolves when the comment is stored; rejects with the reason to show. */
  onSubmit: (body: string) => Promise<unknown>;
  onCancel?: () => void;
  autoFocus?: boolean;
}

/** A plain-text comment box: the text is stored and shown as typed, never as markup. */
export function CommentForm({ label, submitLabel, onSubmit, onCancel, autoFocus }: CommentFormProps) {
  const [body, setBody] = useState('');
  const [error, setError] = useState<string | undefined>();
  const [busy, setBusy] = useState(false);

  const submit = async (e: FormEvent) => {
    e.preventDefault();
    if (!body.trim()) return setError('Write a comment first');
    setBusy(true);
    try {
      await onSubmit(body.trim());
      setBody('');
      setError(undefined);
    } catch (err) {
      setError(err instanceof Error ? err.message : 'The comment was not saved.');
    } finally {
      setBusy(false);
    }
  };

  return (
    <form onSubmit={(e) => void submit(e)} className="flex flex-col gap-2">
      <TextAreaField label={label} value={body} onValueChange={setBody} rows={3} maxLength={COMMENT_MAX} error={error} autoFocus={autoFocus} />
      <div className="flex gap-2">
        <Button type="submit" size="sm" variant="primary" busy={busy}>
          {submitLabel}
        </Button>
        {onCancel && (
          <Button size="sm" variant="quiet" onClick={onCancel}>
            Cancel
          </Button>
        )}
      </div>
    </form>
  );
}
