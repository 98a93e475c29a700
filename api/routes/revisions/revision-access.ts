import { eq } from 'drizzle-orm';
import type { SessionUser } from '../../../shared/schemas/auth';
import type { Db } from '../../db/client';
import { revisions, studies } from '../../db/schema/index';
import { forbidden, HttpError, notFound } from '../../http-error';
import { loadEngagementFor, type EngagementRow } from '../engagements/engagement-access';
import type { StudyRow } from '../studies/study-access';

export type RevisionRow = typeof revisions.$inferSelect;

/**
 * What a user wants to do with a revision. Reads are open to members (clients only for released
 * revisions); `review` (comments, comparisons) to staff; `submit` and `comment` to the people who
 * write studies; `decide` (approve, request changes, release) to partners only.
 */
export type RevisionAccess = 'read' | 'review' | 'comment' | 'submit' | 'decide';

/** Role gate, checked before any lookup so the answer never depends on whether an id exists. */
export function assertRevisionRole(user: SessionUser, access: RevisionAccess): void {
  const r = user.role;
  if (access === 'read') return;
  if (r === 'client') throw forbidden('Clients see released deliverables only.');
  if (access === 'review') return;
  if (r === 'admin') throw forbidden('Administrators can read revisions but not take part in their review.');
  if (access === 'decide' && r !== 'partner') throw forbidden('Only a partner can approve, send back or release a revision.');
}

export interface RevisionContext {
  revision: RevisionRow;
  study: StudyRow;
  engagement: EngagementRow;
}

/**
 * A revision with its study and engagement, if the user may see it. Non-members, and clients
 * asking for a revision that is not released, get the same 404 as a missing id.
 */
export async function loadRevisionFor(db: Db, user: SessionUser, revisionId: number, access: RevisionAccess): Promise<RevisionContext> {
  assertRevisionRole(user, access);
  const [row] = await db.select({ revision: revisions, study: studies }).from(revisions).innerJoin(studies, eq(studies.id, revisions.studyId)).where(eq(revisions.id, revisionId));
  if (!row) throw notFound('That revision');
  if (user.role === 'client' && row.revision.status !== 'released') throw notFound('That revision');
  try {
    return { ...row, engagement: await loadEngagementFor(db, user, row.study.engagementId) };
  } catch (err) {
    if (err instanceof HttpError && err.status === 404) throw notFound('That revision');
    throw err;
  }
}

/** Four-eyes rule: the partner who decides or releases is not the person who submitted. */
export function assertNotSubmitter(user: SessionUser, revision: RevisionRow, what: string): void {
  if (revision.submittedBy === user.id) {
    throw forbidden(`You submitted revision ${revision.number} yourself; another partner of the engagement must ${what} it (four-eyes rule).`);
  }
}

/** The study of a revisions list: members of any role (clients filter to released later). */
export async function loadStudyForRevisions(db: Db, user: SessionUser, studyId: number): Promise<{ study: StudyRow; engagement: EngagementRow }> {
  const [study] = await db.select().from(studies).where(eq(studies.id, studyId));
  if (!study) throw notFound('That study');
  try {
    return { study, engagement: await loadEngagementFor(db, user, study.engagementId) };
  } catch (err) {
    if (err instanceof HttpError && err.status === 404) throw notFound('That study');
    throw err;
  }
}
