import { and, eq, sql } from 'drizzle-orm';
import type { SessionUser } from '../../../shared/schemas/auth';
import type { Db } from '../../db/client';
import { preparedPer } from '../../db/prepared';
import { engagements, memberships } from '../../db/schema/index';
import { notFound } from '../../http-error';

export type EngagementRow = typeof engagements.$inferSelect;

/**
 * The engagement if the user may see it: admins see all, everyone else only where they are
 * members. Non-members get the same 404 as a missing id, so ids reveal nothing. One query (the
 * membership joined in): it runs on nearly every request.
 */
const engagementWithMembership = preparedPer((db: Db) =>
  db
    .select({ engagement: engagements, memberId: memberships.userId })
    .from(engagements)
    .leftJoin(memberships, and(eq(memberships.engagementId, engagements.id), eq(memberships.userId, sql.placeholder('userId'))))
    .where(eq(engagements.id, sql.placeholder('engagementId')))
    .prepare(),
);

/** Admins see every engagement; anyone else only those with a membership row (joined in as `memberId`). */
export const seesEngagement = (user: SessionUser, memberId: number | null): boolean => user.role === 'admin' || memberId !== null;

export async function loadEngagementFor(db: Db, user: SessionUser, engagementId: number): Promise<EngagementRow> {
  const [row] = await engagementWithMembership(db).execute({ userId: user.id, engagementId });
  if (!row || !seesEngagement(user, row.memberId)) throw notFound('That engagement');
  return row.engagement;
}
