import type { Assumption } from '#shared/schemas/assumptions';
import { ConfirmButton } from '../../../components/ui/confirm-button';

/** Two-step delete; the API refuses while blocks use it, and the screen shows which. */
export function DeleteAssumptionButton({ assumption, busy, onConfirm }: { assumption: Assumption; busy: boolean; onConfirm: () => void }) {
  return (
    <ConfirmButton question="Delete for good?" confirmLabel="Delete" busy={busy} onConfirm={onConfirm}>
      <span aria-hidden="true">Delete</span>
      <span className="sr-only">Delete {assumption.name}</span>
    </ConfirmButton>
  );
}
