import type { RevisionDetail } from '#shared/schemas/revisions';
import { Banner } from '../../../components/ui/banner';
import { Button } from '../../../components/ui/button';
import { formatDate } from '../../../lib/format-date';
import { useReleaseRevision } from '../api/revision-mutations';

/**
 * After sign-off: renders, signs and stores the PDF and tells the client. Shows the work while
 * it runs, the server's reason when it fails (with another try) and the outcome when done.
 */
export function ReleasePanel({ revision }: { revision: RevisionDetail }) {
  const release = useReleaseRevision(revision.id);
  const info = revision.release;
  const failedBefore = info?.status === 'failed' && !release.isPending;
  const running = release.isPending || info?.status === 'releasing';

  if (revision.status === 'released') {
    return (
      <Banner tone="ok" title={`Revision ${revision.number} is released`}>
        The signed PDF was stored {formatDate(revision.releasedAt ?? info?.releasedAt)} and the client was told. It is listed under Deliverables.
      </Banner>
    );
  }
  // Started elsewhere (another tab, another partner) or by a server that has since stopped: the
  // revision query polls until the server records the outcome, interrupted ones included.
  if (info?.status === 'releasing' && !release.isPending) {
    return (
      <Banner tone="info" title="Being released">
        <span role="status">
          The PDF is being rendered, signed and stored. If the server stopped on the way, the release is recorded as interrupted within about a minute and
          can be tried again.
        </span>
      </Banner>
    );
  }
  if (!revision.canRelease) {
    return (
      <Banner tone="info" title="Signed off, waiting to be released">
        A partner of this engagement releases it to the client.
      </Banner>
    );
  }
  return (
    <section aria-labelledby="release-title" className="rounded-lg border border-ok/40 bg-ok-tint/40 p-5">
      <h2 id="release-title" className="text-lg font-bold">
        Release to the client
      </h2>
      <p className="mt-1 text-sm text-ink-soft">
        Signed off by {revision.decidedByName ?? 'a partner'} on {formatDate(revision.decidedAt)}. Releasing renders the report as a PDF, signs it with the firm's
        certificate, stores it and e-mails the client a link.
      </p>
      <div aria-live="polite" className="mt-3 text-sm">
        {running && <p role="status">Rendering and signing the PDF… this can take a few seconds.</p>}
      </div>
      {(release.isError || failedBefore) && (
        <div className="mt-3">
          <Banner tone="danger" title="The release did not complete">
            <p>{release.error?.message ?? info?.lastError ?? 'The server gave no reason.'}</p>
            {/* The request may have died with its server; the reason recorded afterwards ("Interrupted: …") tells what happened. */}
            {release.error && failedBefore && info?.lastError && !release.error.message.includes(info.lastError) && <p className="mt-1">The server recorded: {info.lastError}</p>}
            {info && info.attempts > 0 && <p className="mt-1 text-xs">Attempts so far: {info.attempts}</p>}
          </Banner>
        </div>
      )}
      <div className="mt-4">
        <Button variant="primary" busy={running} onClick={() => release.mutate()}>
          {release.isError || failedBefore ? 'Try again' : 'Release to the client'}
        </Button>
      </div>
    </section>
  );
}
