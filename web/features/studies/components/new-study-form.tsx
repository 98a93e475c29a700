import { useState, type FormEvent } from 'react';
import { useQuery } from '@tanstack/react-query';
import { useNavigate } from 'react-router-dom';
import { createStudySchema, STUDY_TITLE_MAX } from '#shared/schemas/studies';
import { paths } from '../../../app/paths';
import { Banner } from '../../../components/ui/banner';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/text-field';
import { useFormErrors } from '../../../lib/use-form-errors';
import { templatesQuery } from '../api/study-list-queries';
import { useCreateStudy } from '../api/use-create-study';
import { BLANK_CHOICE, TemplateChoice } from './template-choice';

const FIELDS = ['title', 'templateKey'] as const;

/** Title and starting point of a new study; on success the editor opens on it. */
export function NewStudyForm({ engagementId, onCancel }: { engagementId: number; onCancel: () => void }) {
  const templates = useQuery(templatesQuery());
  const create = useCreateStudy(engagementId);
  const form = useFormErrors(FIELDS);
  const navigate = useNavigate();
  const [title, setTitle] = useState('');
  const [templateKey, setTemplateKey] = useState(BLANK_CHOICE);

  function submit(e: FormEvent) {
    e.preventDefault();
    const body = form.validate(createStudySchema, { title, templateKey: templateKey || null });
    if (!body) return;
    create.mutate(body, { onSuccess: (study) => navigate(paths.study(study.id)), onError: form.fromError });
  }

  return (
    <form onSubmit={submit} noValidate aria-labelledby="new-study-title" className="flex flex-col gap-5 rounded-lg border border-rule bg-sheet px-5 py-5">
      <h3 id="new-study-title" className="text-lg font-semibold">
        New study
      </h3>
      {form.formError && <Banner tone="danger">{form.formError}</Banner>}
      <TextField
        label="Title"
        hint="As it should read on the report's cover."
        value={title}
        onValueChange={setTitle}
        maxLength={STUDY_TITLE_MAX}
        error={form.fieldErrors.title}
        autoFocus
        required
      />
      {templates.isError && <Banner tone="warn">The templates could not be loaded ({templates.error.message}); you can still start a blank study.</Banner>}
      {templates.isPending ? (
        <p className="text-sm text-ink-faint">Loading templates…</p>
      ) : (
        <TemplateChoice templates={templates.data ?? []} value={templateKey} onChange={setTemplateKey} />
      )}
      {form.fieldErrors.templateKey && <p className="text-sm font-medium text-danger">{form.fieldErrors.templateKey}</p>}
      {templateKey !== BLANK_CHOICE && (
        <p className="text-sm text-ink-soft">
          The template's assumptions join this engagement's register; ones with the same name already there are reused, not
          copied.
        </p>
      )}
      <div className="flex justify-end gap-2">
        <Button variant="quiet" onClick={onCancel}>
          Cancel
        </Button>
        <Button type="submit" variant="primary" busy={create.isPending}>
          Create and open
        </Button>
      </div>
    </form>
  );
}
