import { and, eq } from 'drizzle-orm';
import type { SessionUser } from '../../../shared/schemas/auth';
import type { Db } from '../../db/client';
import { engagements, memberships } from '../../db/schema/index';
import { notFound } from '../../http-error';

export type EngagementRow = typeof engagements.$inferSelect;

/**
 * The engagement if the user may see it: admins see all, everyone else only where they are
 * members. Non-members get the same 404 as a missing id, so ids reveal nothing.
 */
export async function loadEngagementFor(db: Db, user: SessionUser, engagementId: number): Promise<EngagementRow> {
  const [row] = await db.select().from(engagements).where(eq(engagements.id, engagementId));
  if (!row) throw notFound('That engagement');
  if (user.role === 'admin') return row;
  const [m] = await db
    .select({ userId: memberships.userId })
    .from(memberships)
    .where(and(eq(memberships.engagementId, engagementId), eq(memberships.userId, user.id)));
  if (!m) throw notFound('That engagement');
  return row;
}
