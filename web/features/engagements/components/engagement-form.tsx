import { useState, type FormEvent } from 'react';
import { CLIENT_NAME_MAX, DESCRIPTION_MAX, ENGAGEMENT_NAME_MAX, createEngagementSchema, type CreateEngagement } from '#shared/schemas/engagements';
import { Banner } from '../../../components/ui/banner';
import { Button } from '../../../components/ui/button';
import { CheckboxField } from '../../../components/ui/checkbox-field';
import { TextAreaField } from '../../../components/ui/text-area-field';
import { TextField } from '../../../components/ui/text-field';
import { useFormErrors } from '../../../lib/use-form-errors';

const FIELDS = ['name', 'clientName', 'description', 'safetyCritical'] as const;

export type EngagementDetails = Required<CreateEngagement>;

interface EngagementFormProps {
  initial?: EngagementDetails;
  submitLabel: string;
  busy: boolean;
  /** Rejects with the API's error, which the form places on its fields or shows above them. */
  onSave: (values: EngagementDetails) => Promise<unknown>;
  onCancel?: () => void;
}

const blank: EngagementDetails = { name: '', clientName: '', description: '', safetyCritical: false };

/** Name, client, description and the safety flag; used to create and to edit an engagement. */
export function EngagementForm({ initial = blank, submitLabel, busy, onSave, onCancel }: EngagementFormProps) {
  const form = useFormErrors(FIELDS);
  const [values, setValues] = useState<EngagementDetails>(initial);
  const set = <K extends keyof EngagementDetails>(key: K) => (value: EngagementDetails[K]) => setValues((v) => ({ ...v, [key]: value }));

  function submit(e: FormEvent) {
    e.preventDefault();
    const parsed = form.validate(createEngagementSchema, values);
    if (parsed) onSave({ ...parsed, description: parsed.description ?? '', safetyCritical: parsed.safetyCritical ?? false }).catch(form.fromError);
  }

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-5">
      {form.formError && <Banner tone="danger">{form.formError}</Banner>}
      <div className="grid gap-5 sm:grid-cols-2">
        <TextField label="Engagement name" value={values.name} onValueChange={set('name')} maxLength={ENGAGEMENT_NAME_MAX} error={form.fieldErrors.name} required />
        <TextField label="Client" value={values.clientName} onValueChange={set('clientName')} maxLength={CLIENT_NAME_MAX} error={form.fieldErrors.clientName} required />
      </div>
      <TextAreaField
        label="Description"
        hint="The question the client asked and the scope agreed. Members see this on the engagement page."
        value={values.description}
        onValueChange={set('description')}
        maxLength={DESCRIPTION_MAX}
        error={form.fieldErrors.description}
      />
      <CheckboxField
        label="The service affects health, emergency response or safety"
        hint="Studies in this engagement then lead with the cautions and defer to local rules and licensed practice."
        checked={values.safetyCritical}
        onCheckedChange={set('safetyCritical')}
      />
      <div className="flex justify-end gap-2">
        {onCancel && (
          <Button variant="quiet" onClick={onCancel}>
            Cancel
          </Button>
        )}
        <Button type="submit" variant="primary" busy={busy}>
          {submitLabel}
        </Button>
      </div>
    </form>
  );
}
