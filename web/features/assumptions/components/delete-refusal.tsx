import { Banner } from '../../../components/ui/banner';

export interface Refusal {
  name: string;
  message: string;
  /** "Study — block" for each model block that links the assumption. */
  usedBy: string[];
}

/** Why a delete was refused, listing the blocks to unlink first. */
export function DeleteRefusal({ refusal, onDismiss }: { refusal: Refusal; onDismiss: () => void }) {
  return (
    <Banner tone="warn" title={`“${refusal.name}” was not deleted`}>
      {refusal.usedBy.length > 0 ? (
        <>
          <p>It is still linked from {refusal.usedBy.length === 1 ? 'this model block' : `these ${refusal.usedBy.length} model blocks`}. Unlink it in each study first, or change its value instead.</p>
          <ul className="mt-2 list-disc pl-5 text-ink">
            {refusal.usedBy.map((u) => (
              <li key={u}>{u}</li>
            ))}
          </ul>
        </>
      ) : (
        <p>{refusal.message}</p>
      )}
      <button type="button" onClick={onDismiss} className="mt-2 text-sm font-semibold underline">
        Dismiss
      </button>
    </Banner>
  );
}
