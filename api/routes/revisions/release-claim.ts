import { and, eq } from 'drizzle-orm';
import type { AppContext } from '../../context';
import { releases, revisions } from '../../db/schema/index';
import { conflict } from '../../http-error';
import { illegalTransition } from './revision-state';

/**
 * Claims the release of a revision for this request, or throws 409. A short transaction locks the
 * revision row first (so claims of one revision queue up instead of deadlocking on the unique
 * index), re-checks that it is still approved, then creates the release row (first attempt) or
 * moves it from failed, or from an expired lease, back to releasing. Returns the attempt number,
 * which fences the final write. Lock order everywhere: revision row, then release row.
 * The lease (config.releaseLeaseMs) is renewed by holdReleaseLease while the attempt works.
 */
export async function claimRelease(ctx: AppContext, revisionId: number): Promise<number> {
  return ctx.db.transaction(async (tx) => {
    const now = new Date();
    const leaseUntil = new Date(now.getTime() + ctx.config.releaseLeaseMs);
    const [rev] = await tx.select({ status: revisions.status, number: revisions.number }).from(revisions).where(eq(revisions.id, revisionId)).for('update');
    if (!rev) throw conflict('This revision no longer exists.');
    if (rev.status !== 'approved') throw illegalTransition(rev.number, rev.status, 'release');
    const [row] = await tx.select().from(releases).where(eq(releases.revisionId, revisionId)).for('update');
    if (!row) {
      await tx.insert(releases).values({ revisionId, status: 'releasing', attempts: 1, leaseUntil, updatedAt: now });
      return 1;
    }
    const stale = row.status === 'releasing' && (row.leaseUntil === null || row.leaseUntil < now);
    if (row.status !== 'failed' && !stale) throw conflict('A release of this revision is under way; wait a moment and reload.');
    await tx.update(releases).set({ status: 'releasing', attempts: row.attempts + 1, leaseUntil, updatedAt: now }).where(eq(releases.id, row.id));
    return row.attempts + 1;
  });
}

/** Records a failed attempt with its reason; the revision stays approved and may be released again. */
export async function failRelease(ctx: AppContext, revisionId: number, attempt: number, reason: string): Promise<void> {
  await ctx.db
    .update(releases)
    .set({ status: 'failed', lastError: reason.slice(0, 500), leaseUntil: null, updatedAt: new Date() })
    .where(and(eq(releases.revisionId, revisionId), eq(releases.status, 'releasing'), eq(releases.attempts, attempt)));
}
