import { and, eq, inArray, sql } from 'drizzle-orm';
import type { SessionUser } from '../../../shared/schemas/auth';
import type { SubmitRevision } from '../../../shared/schemas/revisions';
import type { AppContext } from '../../context';
import { revisions, studies } from '../../db/schema/index';
import { conflict, HttpError } from '../../http-error';
import { recordAudit } from '../audit/audit.service';
import type { EngagementRow } from '../engagements/engagement-access';
import type { StudyRow } from '../studies/study-access';
import { buildSnapshot } from './build-snapshot';
import { membersWithRoles, notifyRevision } from './revision-mails';
import { revisionSha256 } from './revision-hash';

const PENDING = ['in_review', 'approved'] as const;

/**
 * Submits the study as it is saved now as revision N+1 (status in review). The study row is
 * locked first, so two submits at once are serialised: the second finds the first pending and
 * gets 409. The study is marked in review; the partners of the engagement are e-mailed.
 */
export async function submitRevision(ctx: AppContext, study: StudyRow, engagement: EngagementRow, input: SubmitRevision, by: SessionUser, ip?: string): Promise<number> {
  const at = new Date();
  const created = await ctx.db.transaction(async (tx) => {
    const [locked] = await tx.select().from(studies).where(eq(studies.id, study.id)).for('update');
    if (!locked) throw new HttpError(404, 'not_found', 'That study was not found.');
    if (input.studyVersion !== undefined && locked.version !== input.studyVersion) {
      throw new HttpError(409, 'conflict', 'The study was saved again since you looked at it. Reload it and submit what you see.', [
        { path: 'studyVersion', message: `The study is now at version ${locked.version}` },
      ]);
    }
    const [pending] = await tx
      .select({ number: revisions.number, status: revisions.status })
      .from(revisions)
      .where(and(eq(revisions.studyId, study.id), inArray(revisions.status, [...PENDING])));
    if (pending) {
      const state = pending.status === 'in_review' ? 'is still in review' : 'is approved and waiting to be released';
      throw conflict(`Revision ${pending.number} of this study ${state}; a new revision can be submitted after a decision on it.`);
    }
    const [{ last }] = (await tx.select({ last: sql<number | null>`max(${revisions.number})` }).from(revisions).where(eq(revisions.studyId, study.id))) as [{ last: number | null }];
    const number = Number(last ?? 0) + 1;
    const snapshot = await buildSnapshot(tx, locked, engagement, number, by, at);
    const sha256 = revisionSha256(snapshot);
    const [res] = await tx.insert(revisions).values({
      studyId: study.id,
      number,
      status: 'in_review',
      snapshot,
      sha256,
      engineVersion: snapshot.engineVersion.slice(0, 20),
      submittedBy: by.id,
      submittedAt: at,
    });
    // Status only: the document's version stays, so an editor's next save is not made stale.
    await tx.update(studies).set({ status: 'in_review' }).where(eq(studies.id, study.id));
    return { id: res.insertId, number, sha256 };
  });
  await recordAudit(ctx.db, {
    action: 'revision_submitted',
    actor: by,
    engagementId: engagement.id,
    subject: `${study.title}, revision ${created.number}`,
    detail: { revisionId: created.id, studyId: study.id, number: created.number, sha256: created.sha256 },
    ip,
  });
  const [revision] = await ctx.db.select().from(revisions).where(eq(revisions.id, created.id));
  const partners = (await membersWithRoles(ctx, engagement.id, ['partner'])).filter((p) => p.id !== by.id);
  await notifyRevision(ctx, 'submitted', { revision: revision!, study, engagement }, partners, { actorName: by.name });
  return created.id;
}
