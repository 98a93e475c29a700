import { bigint, datetime, int, mysqlEnum, mysqlTable, text, uniqueIndex, varchar, index } from 'drizzle-orm/mysql-core';

/**
 * Every e-mail goes through this table first, so an SMTP outage delays mail instead of losing
 * it. Any API process may deliver: a row is claimed with an expiring lease before sending.
 * `dedupeKey` makes "one e-mail per recipient per event" hold under concurrent requests.
 */
export const mailOutbox = mysqlTable(
  'mail_outbox',
  {
    id: bigint('id', { mode: 'number' }).autoincrement().primaryKey(),
    toAddress: varchar('to_address', { length: 254 }).notNull(),
    subject: varchar('subject', { length: 300 }).notNull(),
    body: text('body').notNull(),
    status: mysqlEnum('status', ['pending', 'sent', 'failed']).notNull().default('pending'),
    attempts: int('attempts').notNull().default(0),
    nextAttemptAt: datetime('next_attempt_at', { mode: 'date', fsp: 3 }).notNull(),
    leaseUntil: datetime('lease_until', { mode: 'date', fsp: 3 }),
    leaseOwner: varchar('lease_owner', { length: 64 }),
    lastError: varchar('last_error', { length: 500 }),
    dedupeKey: varchar('dedupe_key', { length: 200 }),
    createdAt: datetime('created_at', { mode: 'date', fsp: 3 }).notNull(),
    sentAt: datetime('sent_at', { mode: 'date', fsp: 3 }),
  },
  (t) => [uniqueIndex('mail_outbox_dedupe_uq').on(t.dedupeKey), index('mail_outbox_due_idx').on(t.status, t.nextAttemptAt)],
);
