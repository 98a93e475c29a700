import { useQueryClient } from '@tanstack/react-query';
import type { Engagement } from '#shared/schemas/engagements';
import { useToast } from '../../../components/ui/use-toast';
import { ApiError, isApiError } from '../../../lib/api-error';
import { engagementKeys } from '../api/engagement-keys';
import { useUpdateEngagement } from '../api/engagement-mutations';
import { EngagementForm, type EngagementDetails } from './engagement-form';

interface EngagementEditPanelProps {
  engagement: Engagement;
  onDone: () => void;
}

export function EngagementEditPanel({ engagement, onDone }: EngagementEditPanelProps) {
  const update = useUpdateEngagement(engagement.id);
  const qc = useQueryClient();
  const toast = useToast();

  async function save(values: EngagementDetails) {
    try {
      await update.mutateAsync({ ...values, version: engagement.version });
      toast.show('Engagement saved.', 'ok');
      onDone();
    } catch (err) {
      if (isApiError(err) && err.status === 409) {
        // Load the other person's version so the next save is against it; the typed values stay.
        await qc.invalidateQueries({ queryKey: engagementKeys.detail(engagement.id) });
        throw new ApiError(409, 'conflict', 'Someone else saved this engagement while you were editing. Their version is now loaded; check it, then save again.');
      }
      throw err;
    }
  }

  return (
    <section aria-labelledby="edit-engagement" className="rounded-lg border border-rule bg-sheet px-6 py-6">
      <h2 id="edit-engagement" className="mb-5 text-lg font-bold">
        Edit details
      </h2>
      <EngagementForm
        initial={{ name: engagement.name, clientName: engagement.clientName, description: engagement.description, safetyCritical: engagement.safetyCritical }}
        submitLabel="Save changes"
        busy={update.isPending}
        onSave={save}
        onCancel={onDone}
      />
    </section>
  );
}
