import type { RevisionDetail } from '#shared/schemas/revisions';
import { Banner } from '../../../components/ui/banner';
import { formatDate } from '../../../lib/format-date';

/** What a reader must know before trusting the text: a changed fingerprint, a request for changes. */
export function RevisionNotices({ revision }: { revision: RevisionDetail }) {
  return (
    <>
      {!revision.integrity.ok && (
        <Banner tone="danger" title="This revision's stored content no longer matches its fingerprint">
          <p>
            The SHA-256 recomputed from what is stored differs from the one taken when it was submitted. Do not sign off or release it; tell an
            administrator.
          </p>
          <p className="mt-2 font-mono text-xs break-all">
            Recorded {revision.integrity.storedSha256}
            <br />
            Now {revision.integrity.computedSha256}
          </p>
        </Banner>
      )}
      {revision.status === 'changes_requested' && (
        <Banner tone="warn" title={`Changes requested by ${revision.decidedByName ?? 'a partner'} on ${formatDate(revision.decidedAt)}`}>
          {revision.decisionReason && <p className="whitespace-pre-line">{revision.decisionReason}</p>}
          <p className="mt-1">Edit the study and submit it again; this revision stays as it was for comparing.</p>
        </Banner>
      )}
    </>
  );
}
