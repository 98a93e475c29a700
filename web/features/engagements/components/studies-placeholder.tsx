import { EmptyState } from '../../../components/ui/empty-state';

/** A client's deliverables area until released, signed reports arrive (clients never see studies). */
export function StudiesPlaceholder() {
  return (
    <section aria-labelledby="deliverables-title">
      <h2 id="deliverables-title" className="mb-4 text-xl font-bold">
        Deliverables
      </h2>
      <EmptyState title="No released reports yet">
        Once a partner signs a study off and releases it, the signed PDF appears here for you to download and verify.
      </EmptyState>
    </section>
  );
}
