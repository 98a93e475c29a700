import type { VerifyResult } from '#shared/schemas/revisions';
import { formatDate } from '../../../lib/format-date';

type Kind = 'valid' | 'signed-not-released' | 'not-ours';

/** Which of three plain answers the server's findings amount to. */
export function verdictKind(result: VerifyResult): Kind {
  if (result.authentic) return 'valid';
  const s = result.signature;
  if (s.signed && s.valid && s.integrityOk) return 'signed-not-released';
  return 'not-ours';
}

const LOOK: Record<Kind, { box: string; mark: string; title: string }> = {
  valid: { box: 'border-ok/50 bg-ok-tint', mark: '✓', title: 'Valid: an unmodified deliverable' },
  'signed-not-released': { box: 'border-warn/50 bg-warn-tint', mark: '!', title: 'Signed by the firm, but not a released deliverable' },
  'not-ours': { box: 'border-danger/50 bg-danger-tint', mark: '✕', title: 'Modified, or not signed by this firm' },
};

/** The verdict in plain words first, the technical findings after for whoever needs them. */
export function VerifyVerdict({ result, fileName }: { result: VerifyResult; fileName: string }) {
  const kind = verdictKind(result);
  const look = LOOK[kind];
  const d = result.deliverable;
  return (
    <section role="status" aria-labelledby="verdict-title" data-verdict={kind} className={`rounded-lg border-2 px-6 py-5 ${look.box}`}>
      <h2 id="verdict-title" className="flex items-center gap-3 text-xl font-bold text-ink">
        <span aria-hidden className="inline-flex size-8 items-center justify-center rounded-full bg-sheet text-lg">
          {look.mark}
        </span>
        {look.title}
      </h2>
      <div className="mt-3 flex flex-col gap-2 text-ink">
        {kind === 'valid' && d && (
          <p className="font-serif text-lg">
            “{fileName}” is revision {d.number} of <strong>{d.studyTitle}</strong> ({d.engagementName}), signed off by {d.approverName ?? 'a partner'}
            {d.approvedAt && ` on ${formatDate(d.approvedAt)}`} and released {formatDate(d.releasedAt)}. Not one byte differs from what the firm released.
          </p>
        )}
        {kind === 'valid' && !d && (
          <p>“{fileName}” is byte for byte a report this firm released. Its details belong to an engagement you are not a member of.</p>
        )}
        {kind === 'signed-not-released' && (
          <p>The firm's signature on “{fileName}” is intact, but the file is not one of the released deliverables. It may be a draft or test copy; ask your contact for the released one.</p>
        )}
        {kind === 'not-ours' && (
          <p>
            “{fileName}” {result.signature.signed ? 'has been changed since it was signed, or carries a signature that is not the firm’s' : 'carries no digital signature'}. Do not
            rely on its figures; download the deliverable again or ask your contact.
          </p>
        )}
        {/* For a valid copy the sentence above already says all of the server's finding. */}
        {kind !== 'valid' && <p className="text-sm text-ink-soft">{result.message}</p>}
      </div>
      <details className="mt-4 text-sm">
        <summary className="cursor-pointer font-medium">Technical details</summary>
        <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-ink-soft">
          <dt>Finding</dt>
          <dd>{result.message}</dd>
          <dt>File SHA-256</dt>
          <dd className="font-mono text-xs break-all">{result.fileSha256}</dd>
          <dt>Signed</dt>
          <dd>{result.signature.signed ? 'yes' : 'no'}</dd>
          <dt>Signature valid</dt>
          <dd>{result.signature.valid && result.signature.integrityOk ? 'yes' : 'no'}</dd>
          {result.signature.signerCommonName && (
            <>
              <dt>Signer</dt>
              <dd>{result.signature.signerCommonName}</dd>
            </>
          )}
          {result.signature.signingTime && (
            <>
              <dt>Signed at</dt>
              <dd>{formatDate(result.signature.signingTime)}</dd>
            </>
          )}
          {result.revisionSha256 && (
            <>
              <dt>Revision SHA-256</dt>
              <dd className="font-mono text-xs break-all">{result.revisionSha256}</dd>
            </>
          )}
        </dl>
      </details>
    </section>
  );
}
