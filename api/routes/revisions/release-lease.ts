import { and, eq } from 'drizzle-orm';
import type { AppContext } from '../../context';
import { releases } from '../../db/schema/index';

/** Attempts this process is working on (revision id → attempt): alive by definition. */
const heldHere = new Map<number, number>();

/** True when this process itself is still working on that attempt (its sweeper must not touch it). */
export const isHeldHere = (revisionId: number, attempt: number): boolean => heldHere.get(revisionId) === attempt;

export interface ReleaseLease {
  /** Aborted when the claim was lost (swept as interrupted or taken over): stop the work. */
  signal: AbortSignal;
  release(): void;
}

/**
 * Keeps an attempt's claim alive while it renders, signs and stores the PDF: renews the lease
 * three times per lease length, fenced by the attempt number. A process that dies stops renewing,
 * so its claim expires within one lease and the sweeper records the release as interrupted. If a
 * renewal finds the claim gone, the signal aborts the upload; the final write is fenced anyway.
 * A renewal that fails because the database is down is simply tried again at the next beat.
 * Rendering blocks the event loop, so after a long render this process's own sweeper may run
 * before the overdue renewal: the attempt is registered here so that sweeper leaves it alone.
 */
export function holdReleaseLease(ctx: AppContext, revisionId: number, attempt: number): ReleaseLease {
  const lost = new AbortController();
  const leaseMs = ctx.config.releaseLeaseMs;
  const beat = async (): Promise<void> => {
    const [res] = await ctx.db
      .update(releases)
      .set({ leaseUntil: new Date(Date.now() + leaseMs) })
      .where(and(eq(releases.revisionId, revisionId), eq(releases.status, 'releasing'), eq(releases.attempts, attempt)));
    if (res.affectedRows !== 1) lost.abort(new Error('This release attempt lost its claim (it ran past its lease); release again.'));
  };
  heldHere.set(revisionId, attempt);
  const timer = setInterval(() => void beat().catch(() => undefined), Math.max(Math.floor(leaseMs / 3), 100));
  // A beat must never keep a stopping process alive.
  timer.unref();
  return {
    signal: lost.signal,
    release: () => {
      clearInterval(timer);
      if (heldHere.get(revisionId) === attempt) heldHere.delete(revisionId);
    },
  };
}
