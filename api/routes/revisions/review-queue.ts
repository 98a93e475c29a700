import { and, eq, inArray, ne, or, isNull } from 'drizzle-orm';
import type { SessionUser } from '../../../shared/schemas/auth';
import type { RevisionSummary } from '../../../shared/schemas/revisions';
import type { AppContext } from '../../context';
import { memberships, revisions, studies } from '../../db/schema/index';
import { forbidden } from '../../http-error';
import { listRevisions } from './revision-view';

/**
 * What waits for a reviewer: revisions in review in the partner's engagements that someone else
 * submitted (four-eyes: their own are not theirs to decide). Administrators see every revision in
 * review, read-only.
 */
export async function reviewQueue(ctx: AppContext, user: SessionUser): Promise<RevisionSummary[]> {
  if (user.role !== 'partner' && user.role !== 'admin') throw forbidden('The review queue is for partners.');
  const inReview = eq(revisions.status, 'in_review');
  if (user.role === 'admin') return listRevisions(ctx, user, inReview);
  const mine = ctx.db.select({ id: memberships.engagementId }).from(memberships).where(eq(memberships.userId, user.id));
  const studyIds = ctx.db.select({ id: studies.id }).from(studies).where(inArray(studies.engagementId, mine));
  return listRevisions(ctx, user, and(inReview, inArray(revisions.studyId, studyIds), or(isNull(revisions.submittedBy), ne(revisions.submittedBy, user.id))));
}
