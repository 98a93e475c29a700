import { createHash } from 'node:crypto';
import { PutObjectCommand } from '@aws-sdk/client-s3';
import { and, eq, sql } from 'drizzle-orm';
import type { SessionUser } from '../../../shared/schemas/auth';
import type { SignOff } from '../../../shared/schemas/revisions';
import type { AppContext } from '../../context';
import { releases, revisions, studies, users } from '../../db/schema/index';
import { HttpError } from '../../http-error';
import { renderStudyPdf } from '../../pdf/render-study-pdf';
import { releaseReason, signPdf } from '../../signing/sign-pdf';
import { recordAudit } from '../audit/audit.service';
import { firmCertificate } from './firm-signer';
import { claimRelease, failRelease } from './release-claim';
import { holdReleaseLease } from './release-lease';
import { assertNotSubmitter, type RevisionContext } from './revision-access';
import { revisionSha256 } from './revision-hash';
import { membersWithRoles, notifyRevision, submitterOf } from './revision-mails';
import { illegalTransition } from './revision-state';

/** Where a revision's PDF lives: one key per engagement, study and revision number. */
export const deliverableKey = (rc: RevisionContext): string => `engagements/${rc.engagement.id}/studies/${rc.study.id}/revisions/${rc.revision.number}.pdf`;

async function signedPdf(ctx: AppContext, rc: RevisionContext, releasedAt: Date): Promise<Buffer> {
  const { revision } = rc;
  const [approver] = await ctx.db.select({ name: users.name, email: users.email }).from(users).where(eq(users.id, revision.decidedBy ?? 0));
  const signOff: SignOff = {
    approverName: approver?.name ?? 'former member',
    approverEmail: approver?.email ?? '',
    approvedAt: (revision.decidedAt ?? releasedAt).toISOString(),
    sha256: revision.sha256,
    releasedAt: releasedAt.toISOString(),
  };
  const cert = await firmCertificate(ctx.config.signing);
  const pdf = await renderStudyPdf(revision.snapshot, signOff);
  return signPdf(pdf, cert, { reason: releaseReason(revision.number, revision.sha256), name: cert.commonName, location: ctx.config.signing.location });
}

/**
 * Releases an approved revision: claim (one request wins), render and sign the PDF and PUT it to
 * object storage, all outside any transaction and under a lease the attempt keeps renewing; then,
 * only after the PUT succeeded, one transaction marks the release, the revision and the study
 * released and queues the release mails. Any failure before that records the release as failed
 * with its reason and leaves the revision approved, so it can be retried; a process that dies
 * mid-way stops renewing and the sweeper (release-sweeper.ts) records it as interrupted.
 * Never half-done: no released status without the stored PDF, no mail without the release.
 */
export async function releaseRevision(ctx: AppContext, rc: RevisionContext, by: SessionUser, ip?: string): Promise<void> {
  const { revision } = rc;
  assertNotSubmitter(by, revision, 'release');
  if (revision.status !== 'approved') throw illegalTransition(revision.number, revision.status, 'release');
  if (revisionSha256(revision.snapshot) !== revision.sha256) {
    throw new HttpError(409, 'integrity_failed', `The stored content of revision ${revision.number} no longer matches its SHA-256; it cannot be released.`);
  }
  const attempt = await claimRelease(ctx, revision.id);
  const lease = holdReleaseLease(ctx, revision.id, attempt);
  const releasedAt = new Date();
  const key = deliverableKey(rc);
  let file: Buffer;
  try {
    file = await signedPdf(ctx, rc, releasedAt);
    lease.signal.throwIfAborted();
    await ctx.storage.client.send(
      new PutObjectCommand({ Bucket: ctx.storage.bucket, Key: key, Body: file, ContentType: 'application/pdf', ContentLength: file.length }),
      { abortSignal: AbortSignal.any([AbortSignal.timeout(30_000), lease.signal]) },
    );
  } catch (err) {
    // A lost claim aborts the upload; the SDK then reports only "Request aborted", so say why.
    const cause = (lease.signal.aborted ? lease.signal.reason : err) as Error;
    const reason = `${cause.name === 'Error' ? '' : `${cause.name}: `}${cause.message || 'unknown error'}`;
    await failRelease(ctx, revision.id, attempt, reason);
    await recordAudit(ctx.db, { action: 'release_failed', actor: by, engagementId: rc.engagement.id, subject: `${rc.study.title}, revision ${revision.number}`, detail: { revisionId: revision.id, attempt, reason }, ip });
    throw new HttpError(503, 'release_failed', `The signed PDF could not be stored (${reason}). The release was recorded as failed; revision ${revision.number} stays approved and can be released again.`);
  } finally {
    lease.release();
  }
  const fileSha256 = createHash('sha256').update(file).digest('hex');
  const fresh = { ...rc, revision: { ...revision, status: 'released' as const, releasedAt } };
  const to = [...(await membersWithRoles(ctx, rc.engagement.id, ['client'])), ...(await submitterOf(ctx, fresh))];
  await ctx.db.transaction(async (tx) => {
    // Revision row first, then the release row: the same lock order as claimRelease.
    const [rev] = await tx
      .update(revisions)
      .set({ status: 'released', releasedAt, version: sql`${revisions.version} + 1` })
      .where(and(eq(revisions.id, revision.id), eq(revisions.status, 'approved')));
    const [rel] = await tx
      .update(releases)
      .set({ status: 'released', s3Key: key, fileSha256, fileSize: file.length, releasedAt, releasedBy: by.id, lastError: null, leaseUntil: null, updatedAt: new Date() })
      .where(and(eq(releases.revisionId, revision.id), eq(releases.status, 'releasing'), eq(releases.attempts, attempt)));
    // The claim was lost (swept as interrupted, or taken over after its lease expired): write nothing.
    if (rel.affectedRows !== 1 || rev.affectedRows !== 1) {
      throw new HttpError(409, 'conflict', 'This release attempt ran past its lease and was recorded as interrupted or taken over; reload to see the revision, then release again if needed.');
    }
    await tx.update(studies).set({ status: 'released' }).where(eq(studies.id, rc.study.id));
    // Mails and audit entry commit with the release: a crash after the commit still sends them, one before sends none.
    await notifyRevision(ctx, 'released', fresh, to, { actorName: by.name }, tx);
    await recordAudit(tx, {
      action: 'revision_released',
      actor: by,
      engagementId: rc.engagement.id,
      subject: `${rc.study.title}, revision ${revision.number}`,
      detail: { revisionId: revision.id, number: revision.number, sha256: revision.sha256, fileSha256, s3Key: key, attempt },
      ip,
    });
  });
  void ctx.outbox.kick();
}
