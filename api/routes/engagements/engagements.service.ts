import { and, count, desc, eq, inArray, sql } from 'drizzle-orm';
import type { SessionUser } from '../../../shared/schemas/auth';
import type { CreateEngagement, Engagement, Member, UpdateEngagement } from '../../../shared/schemas/engagements';
import type { AppContext } from '../../context';
import { engagements, memberships, users } from '../../db/schema/index';
import { HttpError, conflict, notFound } from '../../http-error';
import { recordAudit } from '../audit/audit.service';
import type { EngagementRow } from './engagement-access';

async function memberCounts(ctx: AppContext, ids: number[]): Promise<Map<number, number>> {
  if (ids.length === 0) return new Map();
  const rows = await ctx.db
    .select({ id: memberships.engagementId, n: count() })
    .from(memberships)
    .where(inArray(memberships.engagementId, ids))
    .groupBy(memberships.engagementId);
  return new Map(rows.map((r) => [r.id, Number(r.n)]));
}

const toEngagement = (e: EngagementRow, memberCount: number): Engagement => ({
  id: e.id,
  name: e.name,
  clientName: e.clientName,
  description: e.description,
  status: e.status,
  safetyCritical: e.safetyCritical,
  createdAt: e.createdAt.toISOString(),
  updatedAt: e.updatedAt.toISOString(),
  memberCount,
  version: e.version,
});

export async function listEngagements(ctx: AppContext, user: SessionUser): Promise<Engagement[]> {
  const rows =
    user.role === 'admin'
      ? await ctx.db.select().from(engagements).orderBy(desc(engagements.updatedAt))
      : (
          await ctx.db
            .select({ e: engagements })
            .from(engagements)
            .innerJoin(memberships, and(eq(memberships.engagementId, engagements.id), eq(memberships.userId, user.id)))
            .orderBy(desc(engagements.updatedAt))
        ).map((r) => r.e);
  const counts = await memberCounts(ctx, rows.map((r) => r.id));
  return rows.map((r) => toEngagement(r, counts.get(r.id) ?? 0));
}

export async function describeEngagement(ctx: AppContext, row: EngagementRow): Promise<Engagement> {
  return toEngagement(row, (await memberCounts(ctx, [row.id])).get(row.id) ?? 0);
}

export async function createEngagement(ctx: AppContext, input: CreateEngagement, by: SessionUser, ip?: string): Promise<Engagement> {
  const now = new Date();
  const [res] = await ctx.db.insert(engagements).values({ ...input, createdAt: now, updatedAt: now });
  await recordAudit(ctx.db, { action: 'engagement_created', actor: by, engagementId: res.insertId, subject: input.name, ip });
  const [row] = await ctx.db.select().from(engagements).where(eq(engagements.id, res.insertId));
  return toEngagement(row!, 0);
}

/** Optimistic update: with `version` given, a stale edit is refused with 409 and nothing changes. */
export async function updateEngagement(
  ctx: AppContext,
  row: EngagementRow,
  patch: UpdateEngagement,
  by: SessionUser,
  ip?: string,
): Promise<Engagement> {
  const { version, ...fields } = patch;
  const expected = version ?? row.version;
  const [res] = await ctx.db
    .update(engagements)
    .set({ ...fields, updatedAt: new Date(), version: sql`${engagements.version} + 1` })
    .where(and(eq(engagements.id, row.id), eq(engagements.version, expected)));
  if (res.affectedRows !== 1) throw conflict('Someone else changed this engagement meanwhile. Reload to see their change.');
  await recordAudit(ctx.db, { action: 'engagement_updated', actor: by, engagementId: row.id, subject: fields.name ?? row.name, detail: fields, ip });
  const [fresh] = await ctx.db.select().from(engagements).where(eq(engagements.id, row.id));
  return describeEngagement(ctx, fresh!);
}

export async function listMembers(ctx: AppContext, engagementId: number): Promise<Member[]> {
  const rows = await ctx.db
    .select({ userId: users.id, email: users.email, name: users.name, role: users.role, addedAt: memberships.addedAt })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.engagementId, engagementId))
    .orderBy(users.name);
  return rows.map((m) => ({ ...m, addedAt: m.addedAt.toISOString() }));
}

export async function addMember(ctx: AppContext, row: EngagementRow, userId: number, by: SessionUser, ip?: string): Promise<Member> {
  const [user] = await ctx.db.select().from(users).where(eq(users.id, userId));
  if (!user) throw new HttpError(400, 'validation_failed', 'That person does not exist.', [{ path: 'userId', message: 'Unknown person' }]);
  if (user.role === 'admin') {
    throw new HttpError(400, 'validation_failed', 'Administrators see every engagement already.', [{ path: 'userId', message: 'Administrators need no membership' }]);
  }
  const addedAt = new Date();
  const [res] = await ctx.db.insert(memberships).values({ engagementId: row.id, userId, addedAt }).onDuplicateKeyUpdate({ set: { userId } });
  // affectedRows is 1 for a new row, 0 when the person was already a member.
  if (res.affectedRows === 1) {
    await recordAudit(ctx.db, { action: 'member_added', actor: by, engagementId: row.id, subject: user.email, detail: { role: user.role }, ip });
  }
  return (await listMembers(ctx, row.id)).find((m) => m.userId === userId)!;
}

export async function removeMember(ctx: AppContext, row: EngagementRow, userId: number, by: SessionUser, ip?: string): Promise<void> {
  const [user] = await ctx.db.select().from(users).where(eq(users.id, userId));
  const [res] = await ctx.db.delete(memberships).where(and(eq(memberships.engagementId, row.id), eq(memberships.userId, userId)));
  if (res.affectedRows !== 1 || !user) throw notFound('That member');
  await recordAudit(ctx.db, { action: 'member_removed', actor: by, engagementId: row.id, subject: user.email, ip });
}
