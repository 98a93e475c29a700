import { bigint, char, datetime, index, int, json, mysqlEnum, mysqlTable, text, uniqueIndex, varchar } from 'drizzle-orm/mysql-core';
import { COMMENT_ANCHOR_TYPES, RELEASE_STATUSES, REVISION_STATUSES, type RevisionSnapshot } from '../../../shared/schemas/revisions';
import { studies } from './studies';
import { users } from './users';

/**
 * A numbered, frozen snapshot of a study. `sha256` is taken over the canonical JSON of
 * `snapshot` and re-checked on every read of an approved or released revision. `version` guards
 * decisions (two partners deciding at once: one wins, the other gets 409).
 */
export const revisions = mysqlTable(
  'revisions',
  {
    id: int('id').autoincrement().primaryKey(),
    studyId: int('study_id')
      .notNull()
      .references(() => studies.id, { onDelete: 'cascade' }),
    number: int('number').notNull(),
    status: mysqlEnum('status', REVISION_STATUSES).notNull(),
    snapshot: json('snapshot').$type<RevisionSnapshot>().notNull(),
    sha256: char('sha256', { length: 64 }).notNull(),
    engineVersion: varchar('engine_version', { length: 20 }).notNull(),
    submittedBy: int('submitted_by').references(() => users.id, { onDelete: 'set null' }),
    submittedAt: datetime('submitted_at', { mode: 'date', fsp: 3 }).notNull(),
    decidedBy: int('decided_by').references(() => users.id, { onDelete: 'set null' }),
    decidedAt: datetime('decided_at', { mode: 'date', fsp: 3 }),
    decisionReason: text('decision_reason'),
    releasedAt: datetime('released_at', { mode: 'date', fsp: 3 }),
    version: int('version').notNull().default(1),
  },
  (t) => [uniqueIndex('revisions_study_number_uq').on(t.studyId, t.number), index('revisions_status_idx').on(t.status), index('revisions_sha_idx').on(t.sha256)],
);

/** Review threads: a root comment anchored on a section, a model block or the whole revision; replies point at the root. */
export const revisionComments = mysqlTable(
  'revision_comments',
  {
    id: int('id').autoincrement().primaryKey(),
    revisionId: int('revision_id')
      .notNull()
      .references(() => revisions.id, { onDelete: 'cascade' }),
    anchorType: mysqlEnum('anchor_type', COMMENT_ANCHOR_TYPES).notNull(),
    anchorId: varchar('anchor_id', { length: 40 }),
    parentId: int('parent_id'),
    authorId: int('author_id').references(() => users.id, { onDelete: 'set null' }),
    body: text('body').notNull(),
    resolvedAt: datetime('resolved_at', { mode: 'date', fsp: 3 }),
    resolvedBy: int('resolved_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: datetime('created_at', { mode: 'date', fsp: 3 }).notNull(),
  },
  (t) => [index('revision_comments_revision_idx').on(t.revisionId, t.createdAt), index('revision_comments_parent_idx').on(t.parentId)],
);

/**
 * The release of one approved revision (at most one row per revision). A request claims it by
 * inserting the row or by moving it from failed (or from an expired `releasing` lease) back to
 * releasing; only the claimant renders, signs and stores the PDF, so concurrent releases make
 * one PDF and one e-mail per recipient. `attempts` fences a late finisher whose lease was taken.
 */
export const releases = mysqlTable(
  'releases',
  {
    id: int('id').autoincrement().primaryKey(),
    revisionId: int('revision_id')
      .notNull()
      .references(() => revisions.id, { onDelete: 'cascade' }),
    status: mysqlEnum('status', RELEASE_STATUSES).notNull(),
    attempts: int('attempts').notNull().default(0),
    lastError: varchar('last_error', { length: 500 }),
    leaseUntil: datetime('lease_until', { mode: 'date', fsp: 3 }),
    s3Key: varchar('s3_key', { length: 300 }),
    fileSha256: char('file_sha256', { length: 64 }),
    fileSize: bigint('file_size', { mode: 'number' }),
    releasedAt: datetime('released_at', { mode: 'date', fsp: 3 }),
    releasedBy: int('released_by').references(() => users.id, { onDelete: 'set null' }),
    updatedAt: datetime('updated_at', { mode: 'date', fsp: 3 }).notNull(),
  },
  (t) => [uniqueIndex('releases_revision_uq').on(t.revisionId), index('releases_file_sha_idx').on(t.fileSha256)],
);
