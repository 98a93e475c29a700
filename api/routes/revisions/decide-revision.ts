import { and, eq, sql } from 'drizzle-orm';
import type { SessionUser } from '../../../shared/schemas/auth';
import type { Decision } from '../../../shared/schemas/revisions';
import type { AppContext } from '../../context';
import { revisions, studies } from '../../db/schema/index';
import { recordAudit } from '../audit/audit.service';
import { assertNotSubmitter, type RevisionContext } from './revision-access';
import { membersWithRoles, notifyRevision, submitterOf } from './revision-mails';
import { illegalTransition } from './revision-state';

/**
 * A partner's decision on a revision in review. The UPDATE is conditional on the status, so of
 * two partners deciding at once one wins and the other gets the 409 of the state it finds.
 * Approving freezes the revision; sending it back reopens the study for editing.
 */
export async function decideRevision(ctx: AppContext, rc: RevisionContext, input: Decision, by: SessionUser, ip?: string): Promise<void> {
  const { revision } = rc;
  assertNotSubmitter(by, revision, input.decision === 'approve' ? 'approve' : 'send back');
  if (revision.status !== 'in_review') throw illegalTransition(revision.number, revision.status, input.decision);
  const approve = input.decision === 'approve';
  const status = approve ? 'approved' : 'changes_requested';
  const at = new Date();
  await ctx.db.transaction(async (tx) => {
    const [res] = await tx
      .update(revisions)
      .set({ status, decidedBy: by.id, decidedAt: at, decisionReason: input.reason || null, version: sql`${revisions.version} + 1` })
      .where(and(eq(revisions.id, revision.id), eq(revisions.status, 'in_review')));
    if (res.affectedRows !== 1) {
      const [now] = await tx.select({ status: revisions.status }).from(revisions).where(eq(revisions.id, revision.id));
      throw illegalTransition(revision.number, now?.status ?? revision.status, input.decision);
    }
    await tx.update(studies).set({ status }).where(eq(studies.id, rc.study.id));
  });
  await recordAudit(ctx.db, {
    action: approve ? 'revision_approved' : 'changes_requested',
    actor: by,
    engagementId: rc.engagement.id,
    subject: `${rc.study.title}, revision ${revision.number}`,
    detail: { revisionId: revision.id, studyId: rc.study.id, number: revision.number, sha256: revision.sha256, ...(approve ? {} : { reason: input.reason }) },
    ip,
  });
  const fresh = { ...rc, revision: { ...revision, status } as const };
  // The writers of the engagement hear about a send-back (anyone may pick it up); the submitter about an approval.
  const to = approve ? await submitterOf(ctx, fresh) : [...(await submitterOf(ctx, fresh)), ...(await membersWithRoles(ctx, rc.engagement.id, ['consultant']))];
  await notifyRevision(ctx, approve ? 'approved' : 'changes-requested', fresh, to, { actorName: by.name, reason: input.reason });
}
