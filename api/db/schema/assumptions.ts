import { datetime, double, int, json, mysqlEnum, mysqlTable, uniqueIndex, varchar } from 'drizzle-orm/mysql-core';
import type { FitWarning } from '../../../shared/queue/fit/index';
import { ASSUMPTION_SOURCES } from '../../../shared/schemas/assumptions';
import { UNIT_CODES } from '../../../shared/units/units';
import { engagements } from './engagements';
import { users } from './users';

/**
 * The assumption register of an engagement: named, unit-carrying values that model blocks link
 * to. Names are unique per engagement (case-insensitive by the column collation), so templates
 * can reuse an existing assumption by name. `version` guards edits (409 when stale).
 */
export const assumptions = mysqlTable(
  'assumptions',
  {
    id: int('id').autoincrement().primaryKey(),
    engagementId: int('engagement_id')
      .notNull()
      .references(() => engagements.id, { onDelete: 'cascade' }),
    name: varchar('name', { length: 120 }).notNull(),
    value: double('value').notNull(),
    unit: mysqlEnum('unit', UNIT_CODES).notNull(),
    sourceKind: mysqlEnum('source_kind', ASSUMPTION_SOURCES).notNull(),
    sourceDetail: varchar('source_detail', { length: 500 }).notNull().default(''),
    ownerId: int('owner_id').references(() => users.id, { onDelete: 'set null' }),
    notes: varchar('notes', { length: 500 }).notNull().default(''),
    /**
     * For a value made from a dataset's fit: the fit's warnings that bear on it (exponential
     * service rejected, demand more variable than a steady stream, few observations). Model blocks
     * linking the value repeat those that matter to their model. Null for any other source, and
     * cleared when the value's source changes from the dataset to another.
     */
    cautions: json('cautions').$type<FitWarning[]>(),
    createdAt: datetime('created_at', { mode: 'date', fsp: 3 }).notNull(),
    updatedAt: datetime('updated_at', { mode: 'date', fsp: 3 }).notNull(),
    version: int('version').notNull().default(1),
  },
  (t) => [uniqueIndex('assumptions_engagement_name_uq').on(t.engagementId, t.name)],
);
