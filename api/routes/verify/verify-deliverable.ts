import { createHash } from 'node:crypto';
import { and, eq } from 'drizzle-orm';
import type { SessionUser } from '../../../shared/schemas/auth';
import type { VerifyResult } from '../../../shared/schemas/revisions';
import type { AppContext } from '../../context';
import { memberships, releases } from '../../db/schema/index';
import { verifyPdf } from '../../signing/verify-pdf';
import { deliverableQuery, isDelivered, toDeliverable } from '../deliverables/deliverables.service';
import { firmCertificate } from '../revisions/firm-signer';

async function mayView(ctx: AppContext, user: SessionUser, engagementId: number): Promise<boolean> {
  if (user.role === 'admin') return true;
  const [m] = await ctx.db.select({ id: memberships.userId }).from(memberships).where(and(eq(memberships.engagementId, engagementId), eq(memberships.userId, user.id)));
  return !!m;
}

/**
 * Is this file an unmodified deliverable of this system? Three checks, all needed: the signature
 * verifies with the firm's certificate over the whole file; the file's SHA-256 equals that of a
 * stored, released deliverable; and the revision SHA-256 the file carries is that deliverable's
 * revision. Details (which study, who approved) go only to people who may see that engagement;
 * anyone else learns only that it is a genuine deliverable of the firm.
 */
export async function verifyDeliverable(ctx: AppContext, user: SessionUser, file: Buffer): Promise<VerifyResult> {
  const trusted = await firmCertificate(ctx.config.signing).then(
    (c) => c.certificatePem,
    () => undefined,
  );
  const sig = verifyPdf(file, trusted);
  const fileSha256 = createHash('sha256').update(file).digest('hex');
  const [row] = await deliverableQuery(ctx).where(and(eq(releases.fileSha256, fileSha256), isDelivered())).limit(1);
  const known = !!row && sig.revisionSha256 === row.revisionSha256;
  const authentic = sig.signatureValid && known;
  const visible = authentic && (await mayView(ctx, user, row.engagementId));
  const base = {
    authentic,
    fileSha256,
    signature: { signed: sig.signed, valid: sig.signatureValid, integrityOk: sig.integrityOk, signerCommonName: sig.signerCommonName, signingTime: sig.signingTime, reason: sig.reason || null },
    revisionSha256: sig.revisionSha256,
    deliverable: visible ? toDeliverable(row) : null,
    detailsWithheld: authentic && !visible,
  };
  if (!sig.signed) return { ...base, verdict: 'unsigned', message: 'The file carries no digital signature, so it is not a deliverable of this firm.' };
  if (!sig.signatureValid) return { ...base, verdict: 'signature_invalid', message: `The signature does not hold: ${sig.reason}` };
  if (!authentic) return { ...base, verdict: 'unknown_file', message: 'The signature is valid, but this file is not one of the firm’s released deliverables.' };
  if (!visible) return { ...base, verdict: 'authentic', message: 'This is an unmodified deliverable of this firm.' };
  const d = base.deliverable!;
  const approved = d.approverName ? `, approved by ${d.approverName}${d.approvedAt ? ` on ${d.approvedAt.slice(0, 10)}` : ''}` : '';
  return { ...base, verdict: 'authentic', message: `Unmodified deliverable: “${d.studyTitle}”, revision ${d.number} (${d.engagementName})${approved}, released ${d.releasedAt.slice(0, 10)}.` };
}
