import { and, eq, isNull, lt, or } from 'drizzle-orm';
import type { AppContext } from '../../context';
import { periodicPass } from '../../lib/periodic-pass';
import { releases, revisions, studies } from '../../db/schema/index';
import { recordAudit } from '../audit/audit.service';
import { isHeldHere } from './release-lease';

/** What the partner reads on the revision after a process died in the middle of its release. */
export const INTERRUPTED_REASON = 'Interrupted: the server stopped before the signed PDF was stored. Nothing was sent to the client; release again.';

/**
 * Records every release whose claim expired while still `releasing` (its process died or hung:
 * a working attempt renews its lease) as failed with INTERRUPTED_REASON, with an audit entry.
 * Nothing else changes: the revision stays approved, no deliverable exists and no mail was
 * queued (the release mails are queued in the same transaction that marks it released), so the
 * partner simply releases again. Each update is fenced by the attempt number and the expired
 * lease, so a claim renewed or retaken in the meantime is left alone, and several processes may
 * sweep at once. Attempts this process is still working on are skipped (they are alive, only
 * late in renewing); `asAnotherProcess` drops that knowledge, for tests. Returns how many it marked.
 */
export async function sweepInterruptedReleases(ctx: AppContext, opts: { asAnotherProcess?: boolean } = {}): Promise<number> {
  const now = new Date();
  const expired = and(eq(releases.status, 'releasing'), or(isNull(releases.leaseUntil), lt(releases.leaseUntil, now)));
  const rows = await ctx.db
    .select({ id: releases.id, revisionId: releases.revisionId, attempts: releases.attempts, number: revisions.number, studyTitle: studies.title, engagementId: studies.engagementId })
    .from(releases)
    .innerJoin(revisions, eq(revisions.id, releases.revisionId))
    .innerJoin(studies, eq(studies.id, revisions.studyId))
    .where(expired);
  let marked = 0;
  for (const row of rows) {
    if (!opts.asAnotherProcess && isHeldHere(row.revisionId, row.attempts)) continue;
    const [res] = await ctx.db
      .update(releases)
      .set({ status: 'failed', lastError: INTERRUPTED_REASON, leaseUntil: null, updatedAt: now })
      .where(and(eq(releases.id, row.id), eq(releases.attempts, row.attempts), expired));
    if (res.affectedRows !== 1) continue;
    marked++;
    await recordAudit(ctx.db, {
      action: 'release_failed',
      actor: null,
      engagementId: row.engagementId,
      subject: `${row.studyTitle}, revision ${row.number}`,
      detail: { revisionId: row.revisionId, attempt: row.attempts, reason: INTERRUPTED_REASON, interrupted: true },
    });
  }
  return marked;
}

/**
 * Runs the sweep at server start and then periodically (a quarter of the lease, 0.5–15 s), so an
 * interrupted release shows as failed within about one lease of its last renewal. Started by
 * api/server.ts; every API process may run one.
 */
export function createReleaseSweeper(ctx: AppContext) {
  const sweeps = periodicPass(async () => {
    const n = await sweepInterruptedReleases(ctx);
    if (n > 0) console.log(`[api] marked ${n} interrupted release(s) as failed`);
    return n;
  });
  return {
    sweep: sweeps.run,
    start(intervalMs = Math.min(Math.max(ctx.config.releaseLeaseMs / 4, 500), 15_000)): void {
      void sweeps.run();
      sweeps.start(intervalMs);
    },
    stop: sweeps.stop,
  };
}
