import { boolean, datetime, int, mysqlEnum, mysqlTable, primaryKey, text, varchar, index } from 'drizzle-orm/mysql-core';
import { users } from './users';

export const engagements = mysqlTable('engagements', {
  id: int('id').autoincrement().primaryKey(),
  name: varchar('name', { length: 160 }).notNull(),
  clientName: varchar('client_name', { length: 160 }).notNull(),
  description: text('description').notNull(),
  status: mysqlEnum('status', ['active', 'archived']).notNull().default('active'),
  safetyCritical: boolean('safety_critical').notNull().default(false),
  createdAt: datetime('created_at', { mode: 'date', fsp: 3 }).notNull(),
  updatedAt: datetime('updated_at', { mode: 'date', fsp: 3 }).notNull(),
  version: int('version').notNull().default(1),
});

export const memberships = mysqlTable(
  'memberships',
  {
    engagementId: int('engagement_id')
      .notNull()
      .references(() => engagements.id, { onDelete: 'cascade' }),
    userId: int('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    addedAt: datetime('added_at', { mode: 'date', fsp: 3 }).notNull(),
  },
  (t) => [primaryKey({ columns: [t.engagementId, t.userId] }), index('memberships_user_idx').on(t.userId)],
);
