import { bigint, char, datetime, double, index, int, json, mysqlEnum, mysqlTable, varchar } from 'drizzle-orm/mysql-core';
import { DATASET_DELIMITERS, DATASET_STATUSES, type DatasetFit, type DatasetMapping, type DatasetProblem } from '../../../shared/schemas/datasets';
import { engagements } from './engagements';
import { users } from './users';

/**
 * An uploaded observation file (the bytes live in object storage under `objectKey`) and its fit.
 * A row exists only once the object is completely stored. The fit job state lives here so any
 * API process can report progress: uploaded → mapped → fitting → fitted | failed. A job is
 * claimed with a conditional UPDATE that sets `jobToken`; every later write of that job checks
 * the token, so a remapped or reclaimed dataset silently stops an older run.
 */
export const datasets = mysqlTable(
  'datasets',
  {
    id: int('id').autoincrement().primaryKey(),
    engagementId: int('engagement_id')
      .notNull()
      .references(() => engagements.id, { onDelete: 'cascade' }),
    name: varchar('name', { length: 200 }).notNull(),
    objectKey: varchar('object_key', { length: 200 }).notNull(),
    byteSize: bigint('byte_size', { mode: 'number' }).notNull(),
    sha256: char('sha256', { length: 64 }).notNull(),
    detectedDelimiter: mysqlEnum('detected_delimiter', DATASET_DELIMITERS).notNull(),
    header: json('header').$type<string[]>().notNull(),
    preview: json('preview').$type<string[][]>().notNull(),
    status: mysqlEnum('status', DATASET_STATUSES).notNull().default('uploaded'),
    mapping: json('mapping').$type<DatasetMapping>(),
    progress: double('progress').notNull().default(0),
    rowsRead: int('rows_read').notNull().default(0),
    problem: json('problem').$type<DatasetProblem>(),
    fit: json('fit').$type<DatasetFit>(),
    jobToken: char('job_token', { length: 32 }),
    heartbeatAt: datetime('heartbeat_at', { mode: 'date', fsp: 3 }),
    fittedAt: datetime('fitted_at', { mode: 'date', fsp: 3 }),
    uploadedBy: int('uploaded_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: datetime('created_at', { mode: 'date', fsp: 3 }).notNull(),
    updatedAt: datetime('updated_at', { mode: 'date', fsp: 3 }).notNull(),
  },
  (t) => [index('datasets_engagement_idx').on(t.engagementId, t.createdAt), index('datasets_status_idx').on(t.status)],
);
