import { randomBytes } from 'node:crypto';
import { and, eq, inArray, isNull, lte, or, sql } from 'drizzle-orm';
import type { Db } from '../db/client';
import { periodicPass } from '../lib/periodic-pass';
import { mailOutbox } from '../db/schema/index';
import type { Mailer, OutgoingMail } from './mailer';

const MAX_ATTEMPTS = 12;
const LEASE_MS = 60_000;
/** 5 s, 10 s, 20 s … capped at 15 min: an outage of hours still delivers within minutes of recovery. */
const backoffMs = (attempt: number): number => Math.min(5_000 * 2 ** (attempt - 1), 15 * 60_000);

/**
 * The persisted outbox. `enqueue` only writes a row (inside the caller's work), then nudges
 * delivery; `deliverDue` claims due rows with a lease so several API processes never send the
 * same row twice, sends them, and reschedules failures with backoff.
 */
export function createOutbox(db: Db, mailer: Mailer) {
  const owner = randomBytes(8).toString('hex');

  async function deliverDue(): Promise<number> {
    const now = new Date();
    await db
      .update(mailOutbox)
      .set({ leaseOwner: owner, leaseUntil: new Date(now.getTime() + LEASE_MS) })
      .where(
        and(
          eq(mailOutbox.status, 'pending'),
          lte(mailOutbox.nextAttemptAt, now),
          or(isNull(mailOutbox.leaseUntil), lte(mailOutbox.leaseUntil, now)),
        ),
      )
      .limit(20);
    const rows = await db
      .select()
      .from(mailOutbox)
      .where(and(eq(mailOutbox.leaseOwner, owner), eq(mailOutbox.status, 'pending'), sql`${mailOutbox.leaseUntil} > ${now}`));
    let sent = 0;
    for (const row of rows) {
      try {
        await mailer.send({ to: row.toAddress, subject: row.subject, text: row.body });
        await db.update(mailOutbox).set({ status: 'sent', sentAt: new Date(), attempts: row.attempts + 1, leaseUntil: null }).where(eq(mailOutbox.id, row.id));
        sent++;
      } catch (err) {
        const attempts = row.attempts + 1;
        await db
          .update(mailOutbox)
          .set({
            attempts,
            status: attempts >= MAX_ATTEMPTS ? 'failed' : 'pending',
            nextAttemptAt: new Date(Date.now() + backoffMs(attempts)),
            lastError: String((err as Error).message).slice(0, 500),
            leaseUntil: null,
          })
          .where(eq(mailOutbox.id, row.id));
      }
    }
    return sent;
  }

  /** One delivery pass unless one is under way; never throws (errors wait for the next pass). */
  const delivery = periodicPass(deliverDue);
  const kick = delivery.run;

  return {
    /**
     * Queues one message; with a dedupe key a second identical event adds nothing. Given a
     * transaction, the row commits with the caller's work (a crash cannot keep one without the
     * other) and the caller kicks delivery after the commit.
     */
    async enqueue(mail: OutgoingMail, dedupeKey?: string, executor?: Pick<Db, 'insert'>): Promise<void> {
      await (executor ?? db)
        .insert(mailOutbox)
        .values({ toAddress: mail.to, subject: mail.subject, body: mail.text, nextAttemptAt: new Date(), createdAt: new Date(), dedupeKey: dedupeKey ?? null })
        .onDuplicateKeyUpdate({ set: { dedupeKey: sql`dedupe_key` } });
      if (!executor) void kick();
    },
    kick,
    /** Periodic retries; started by the server process, not by tests that drive createApp. */
    start: (intervalMs = 2_000): void => delivery.start(intervalMs),
    stop: delivery.stop,
    /** Counts for /api/health and tests. */
    async pendingCount(ids?: number[]): Promise<number> {
      const [row] = await db
        .select({ n: sql<number>`count(*)` })
        .from(mailOutbox)
        .where(ids ? and(eq(mailOutbox.status, 'pending'), inArray(mailOutbox.id, ids)) : eq(mailOutbox.status, 'pending'));
      return Number(row?.n ?? 0);
    },
  };
}

export type Outbox = ReturnType<typeof createOutbox>;
