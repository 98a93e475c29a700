import { and, desc, eq, inArray, type SQL } from 'drizzle-orm';
import type { SessionUser } from '../../../shared/schemas/auth';
import type { Deliverable } from '../../../shared/schemas/revisions';
import type { AppContext } from '../../context';
import { engagements, memberships, releases, revisions, studies, users } from '../../db/schema/index';

export const deliverableQuery = (ctx: AppContext) =>
  ctx.db
    .select({
      revisionId: revisions.id,
      studyId: studies.id,
      studyTitle: studies.title,
      engagementId: engagements.id,
      engagementName: engagements.name,
      number: revisions.number,
      releasedAt: releases.releasedAt,
      approvedAt: revisions.decidedAt,
      approverName: users.name,
      revisionSha256: revisions.sha256,
      fileSha256: releases.fileSha256,
      fileSize: releases.fileSize,
      s3Key: releases.s3Key,
    })
    .from(releases)
    .innerJoin(revisions, eq(revisions.id, releases.revisionId))
    .innerJoin(studies, eq(studies.id, revisions.studyId))
    .innerJoin(engagements, eq(engagements.id, studies.engagementId))
    .leftJoin(users, eq(users.id, revisions.decidedBy));
export type DeliverableRow = Awaited<ReturnType<ReturnType<typeof deliverableQuery>['where']>>[number];

export const toDeliverable = (r: DeliverableRow): Deliverable => ({
  revisionId: r.revisionId,
  studyId: r.studyId,
  studyTitle: r.studyTitle,
  engagementId: r.engagementId,
  engagementName: r.engagementName,
  number: r.number,
  releasedAt: r.releasedAt!.toISOString(),
  approvedAt: r.approvedAt ? r.approvedAt.toISOString() : null,
  approverName: r.approverName,
  revisionSha256: r.revisionSha256,
  fileSha256: r.fileSha256!,
  fileSize: r.fileSize!,
});

/** Only completed releases of released revisions count as deliverables. */
export const isDelivered = (): SQL => and(eq(releases.status, 'released'), eq(revisions.status, 'released'))!;

/** The engagements a user may see deliverables of: all for administrators, else where they are a member. */
export function visibleTo(ctx: AppContext, user: SessionUser): SQL | undefined {
  if (user.role === 'admin') return undefined;
  return inArray(engagements.id, ctx.db.select({ id: memberships.engagementId }).from(memberships).where(eq(memberships.userId, user.id)));
}

/** Released deliverables the user may see, newest first, optionally of one engagement. */
export async function listDeliverables(ctx: AppContext, user: SessionUser, engagementId?: number): Promise<Deliverable[]> {
  const rows = await deliverableQuery(ctx)
    .where(and(isDelivered(), visibleTo(ctx, user), engagementId ? eq(engagements.id, engagementId) : undefined))
    .orderBy(desc(releases.releasedAt), desc(revisions.id));
  return rows.map(toDeliverable);
}
