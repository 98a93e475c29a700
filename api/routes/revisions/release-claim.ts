import { and, eq, lt, or, sql } from 'drizzle-orm';
import type { AppContext } from '../../context';
import { releases } from '../../db/schema/index';
import { conflict } from '../../http-error';

/** How long one attempt may hold the release before another request may take it over (a crashed process). */
const LEASE_MS = 5 * 60_000;

/**
 * Claims the release of a revision for this request, or throws 409. First attempt: the INSERT of
 * the one row per revision (unique) succeeds for exactly one request. Retry: a conditional UPDATE
 * from `failed` (or from an expired lease) back to `releasing` succeeds for exactly one request.
 * Returns the attempt number, which fences the final write.
 */
export async function claimRelease(ctx: AppContext, revisionId: number): Promise<number> {
  const now = new Date();
  const leaseUntil = new Date(now.getTime() + LEASE_MS);
  const [ins] = await ctx.db.insert(releases).ignore().values({ revisionId, status: 'releasing', attempts: 1, leaseUntil, updatedAt: now });
  if (ins.affectedRows === 1) return 1;
  const [upd] = await ctx.db
    .update(releases)
    .set({ status: 'releasing', attempts: sql`${releases.attempts} + 1`, leaseUntil, updatedAt: now })
    .where(and(eq(releases.revisionId, revisionId), or(eq(releases.status, 'failed'), and(eq(releases.status, 'releasing'), lt(releases.leaseUntil, now)))));
  if (upd.affectedRows === 1) {
    const [row] = await ctx.db.select({ attempts: releases.attempts }).from(releases).where(eq(releases.revisionId, revisionId));
    return row!.attempts;
  }
  const [row] = await ctx.db.select({ status: releases.status }).from(releases).where(eq(releases.revisionId, revisionId));
  throw conflict(row?.status === 'released' ? 'This revision is already released.' : 'A release of this revision is under way; wait a moment and reload.');
}

/** Records a failed attempt with its reason; the revision stays approved and may be released again. */
export async function failRelease(ctx: AppContext, revisionId: number, attempt: number, reason: string): Promise<void> {
  await ctx.db
    .update(releases)
    .set({ status: 'failed', lastError: reason.slice(0, 500), leaseUntil: null, updatedAt: new Date() })
    .where(and(eq(releases.revisionId, revisionId), eq(releases.status, 'releasing'), eq(releases.attempts, attempt)));
}
