import type { Engagement } from '#shared/schemas/engagements';
import { Button } from '../../../components/ui/button';
import { ConfirmButton } from '../../../components/ui/confirm-button';
import { useToast } from '../../../components/ui/use-toast';
import { isApiError } from '../../../lib/api-error';
import { useUpdateEngagement } from '../api/engagement-mutations';

/** Archive hides an engagement from daily work without deleting anything; restore undoes it. */
export function ArchiveButton({ engagement }: { engagement: Engagement }) {
  const update = useUpdateEngagement(engagement.id);
  const toast = useToast();
  const archived = engagement.status === 'archived';

  function setStatus(status: Engagement['status']) {
    update.mutate(
      { status, version: engagement.version },
      {
        onSuccess: () => toast.show(`${engagement.name} ${status === 'archived' ? 'archived' : 'restored'}.`, 'ok'),
        onError: (err) =>
          toast.show(isApiError(err) && err.status === 409 ? 'Someone changed this engagement a moment ago; the list is refreshed, try again.' : err.message, 'danger'),
      },
    );
  }

  if (archived) {
    return (
      <Button size="sm" onClick={() => setStatus('active')} busy={update.isPending}>
        Restore
      </Button>
    );
  }
  return (
    <ConfirmButton question={`Archive ${engagement.name}?`} confirmLabel="Archive" variant="secondary" busy={update.isPending} onConfirm={() => setStatus('archived')}>
      Archive
    </ConfirmButton>
  );
}
