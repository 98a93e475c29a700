import { datetime, foreignKey, index, int, json, mysqlEnum, mysqlTable, primaryKey, varchar } from 'drizzle-orm/mysql-core';
import { STUDY_STATUSES } from '../../../shared/schemas/studies';
import { assumptions } from './assumptions';
import { engagements } from './engagements';
import { users } from './users';

/** One report document. `version` is the optimistic lock of the document (409 on a stale save). */
export const studies = mysqlTable(
  'studies',
  {
    id: int('id').autoincrement().primaryKey(),
    engagementId: int('engagement_id')
      .notNull()
      .references(() => engagements.id, { onDelete: 'cascade' }),
    title: varchar('title', { length: 200 }).notNull(),
    status: mysqlEnum('status', STUDY_STATUSES).notNull().default('draft'),
    templateKey: varchar('template_key', { length: 80 }),
    /** Sanitised TipTap JSON (MariaDB stores json as longtext with a json_valid check). */
    document: json('document').$type<Record<string, unknown>>().notNull(),
    version: int('version').notNull().default(1),
    /**
     * Bumped whenever the server's stored results of the study change without its document (an
     * assumption edit recomputes linked blocks). With `version` it names one state of document and
     * results, the key of the read cache (study-read.ts).
     */
    resultsVersion: int('results_version').notNull().default(0),
    createdBy: int('created_by').references(() => users.id, { onDelete: 'set null' }),
    updatedBy: int('updated_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: datetime('created_at', { mode: 'date', fsp: 3 }).notNull(),
    updatedAt: datetime('updated_at', { mode: 'date', fsp: 3 }).notNull(),
  },
  (t) => [index('studies_engagement_idx').on(t.engagementId, t.updatedAt)],
);

/**
 * What the server computed for each model block of a study: its config as saved, the spec the
 * engine ran (links resolved, units converted), the result or the error, scenarios and chart
 * rows, with the engine version. Replaced as a whole on every save.
 */
export const studyBlocks = mysqlTable(
  'study_blocks',
  {
    studyId: int('study_id')
      .notNull()
      .references(() => studies.id, { onDelete: 'cascade' }),
    blockId: varchar('block_id', { length: 40 }).notNull(),
    /** Order in the document, so usage lists read top to bottom. */
    position: int('position').notNull(),
    title: varchar('title', { length: 200 }).notNull().default(''),
    config: json('config').$type<Record<string, unknown>>().notNull(),
    resolvedSpec: json('resolved_spec').$type<Record<string, unknown>>(),
    result: json('result').$type<Record<string, unknown>>(),
    error: json('error').$type<Record<string, unknown>>(),
    scenarios: json('scenarios').$type<unknown[]>().notNull(),
    chart: json('chart').$type<unknown[]>(),
    engineVersion: varchar('engine_version', { length: 20 }).notNull(),
    /** SHA-256 of everything stored above: a save rewrites only blocks whose hash changed. */
    contentHash: varchar('content_hash', { length: 64 }).notNull().default(''),
    computedAt: datetime('computed_at', { mode: 'date', fsp: 3 }).notNull(),
  },
  (t) => [primaryKey({ columns: [t.studyId, t.blockId] })],
);

/** Which block links which assumption: usage counts, delete refusal and recompute on change. */
export const studyBlockAssumptions = mysqlTable(
  'study_block_assumptions',
  {
    studyId: int('study_id').notNull(),
    blockId: varchar('block_id', { length: 40 }).notNull(),
    assumptionId: int('assumption_id')
      .notNull()
      .references(() => assumptions.id),
  },
  (t) => [
    primaryKey({ columns: [t.studyId, t.blockId, t.assumptionId] }),
    foreignKey({ name: 'sba_block_fk', columns: [t.studyId, t.blockId], foreignColumns: [studyBlocks.studyId, studyBlocks.blockId] }).onDelete('cascade'),
    index('sba_assumption_idx').on(t.assumptionId),
  ],
);
