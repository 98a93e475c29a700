import { EmptyState } from '../../../components/ui/empty-state';

/** Holds the place of the studies (or, for a client, the deliverables) until the editor arrives. */
export function StudiesPlaceholder({ forClient }: { forClient: boolean }) {
  return (
    <section aria-labelledby="studies-title">
      <h2 id="studies-title" className="mb-4 text-xl font-bold">
        {forClient ? 'Deliverables' : 'Studies'}
      </h2>
      {forClient ? (
        <EmptyState title="No released reports yet">
          Once a partner signs a study off and releases it, the signed PDF appears here for you to download and verify.
        </EmptyState>
      ) : (
        <EmptyState title="No studies yet">
          Studies arrive with the study editor: reports whose figures are live queueing calculations, reviewed and
          signed off by a partner.
        </EmptyState>
      )}
    </section>
  );
}
