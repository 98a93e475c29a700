import { eq } from 'drizzle-orm';
import type { SessionUser } from '../../../shared/schemas/auth';
import type { Db } from '../../db/client';
import { datasets } from '../../db/schema/index';
import { HttpError, notFound } from '../../http-error';
import { loadEngagementFor, type EngagementRow } from '../engagements/engagement-access';
import { assertStudyRole, type Access } from '../studies/study-access';

export type DatasetRow = typeof datasets.$inferSelect;

/**
 * A dataset and its engagement under the study rules: clients 403, admins read, members of the
 * engagement read and write; a dataset of someone else's engagement is a 404 like a missing one.
 */
export async function loadDatasetFor(db: Db, user: SessionUser, datasetId: number, access: Access): Promise<{ dataset: DatasetRow; engagement: EngagementRow }> {
  // The role gate first, so the answer for a client does not depend on the id existing.
  assertStudyRole(user, access);
  const [dataset] = await db.select().from(datasets).where(eq(datasets.id, datasetId));
  if (!dataset) throw notFound('That dataset');
  try {
    return { dataset, engagement: await loadEngagementFor(db, user, dataset.engagementId) };
  } catch (err) {
    if (err instanceof HttpError && err.status === 404) throw notFound('That dataset');
    throw err;
  }
}
