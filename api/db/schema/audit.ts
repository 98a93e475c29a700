import { bigint, datetime, int, json, mysqlTable, varchar, index } from 'drizzle-orm/mysql-core';

/**
 * Append-only audit trail. Actor e-mail and engagement id are copied in (no foreign keys) so the
 * trail outlives renamed or removed users and engagements.
 */
export const auditEntries = mysqlTable(
  'audit_entries',
  {
    id: bigint('id', { mode: 'number' }).autoincrement().primaryKey(),
    at: datetime('at', { mode: 'date', fsp: 3 }).notNull(),
    action: varchar('action', { length: 64 }).notNull(),
    actorId: int('actor_id'),
    actorEmail: varchar('actor_email', { length: 254 }),
    engagementId: int('engagement_id'),
    subject: varchar('subject', { length: 300 }),
    detail: json('detail').$type<Record<string, unknown>>(),
    ip: varchar('ip', { length: 64 }),
  },
  (t) => [
    index('audit_at_idx').on(t.at),
    index('audit_action_idx').on(t.action),
    index('audit_actor_idx').on(t.actorId),
    index('audit_engagement_idx').on(t.engagementId),
  ],
);
