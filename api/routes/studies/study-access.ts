import { eq } from 'drizzle-orm';
import type { SessionUser } from '../../../shared/schemas/auth';
import type { Db } from '../../db/client';
import { studies } from '../../db/schema/index';
import { forbidden, HttpError, notFound } from '../../http-error';
import { loadEngagementFor, type EngagementRow } from '../engagements/engagement-access';

export type StudyRow = typeof studies.$inferSelect;
export type Access = 'read' | 'write';

/**
 * Role gate for studies, assumptions and templates: clients never (they see released
 * deliverables only), admins read but do not write, partners and consultants do both. Checked
 * before any lookup so the answer does not depend on whether the id exists.
 */
export function assertStudyRole(user: SessionUser, access: Access): void {
  if (user.role === 'client') throw forbidden('Clients see released deliverables only.');
  if (access === 'write' && user.role === 'admin') throw forbidden('Administrators can read studies but not edit them.');
}

/** The engagement for study work, with the role gate and the member check (404 for non-members). */
export async function loadEngagementForStudies(db: Db, user: SessionUser, engagementId: number, access: Access): Promise<EngagementRow> {
  assertStudyRole(user, access);
  return loadEngagementFor(db, user, engagementId);
}

/** A study and its engagement; a study of an engagement the user is not in is a 404 like a missing one. */
export async function loadStudyFor(db: Db, user: SessionUser, studyId: number, access: Access): Promise<{ study: StudyRow; engagement: EngagementRow }> {
  assertStudyRole(user, access);
  const [study] = await db.select().from(studies).where(eq(studies.id, studyId));
  if (!study) throw notFound('That study');
  try {
    return { study, engagement: await loadEngagementFor(db, user, study.engagementId) };
  } catch (err) {
    if (err instanceof HttpError && err.status === 404) throw notFound('That study');
    throw err;
  }
}
