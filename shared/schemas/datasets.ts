import { z } from 'zod';
import { shownName } from './shown-name';
import { UNIT_CODES } from '../units/units';
import { ASSUMPTION_NAME_MAX, ASSUMPTION_TEXT_MAX } from './assumptions';
import { STAFFING_CRITERIA } from '../queue/spec';

/** Largest upload accepted (bytes); the form checks it before sending, the server while streaming. */
export const DATASET_MAX_BYTES = 200 * 1024 * 1024;
/** Longest line accepted (characters); a longer one is almost always a binary or a wrong file. */
export const DATASET_MAX_LINE = 64 * 1024;
export const DATASET_PREVIEW_ROWS = 20;
export const DATASET_NAME_MAX = 200;
export const DATASET_INTERVALS = [15, 30, 60] as const;
export const DATASET_KINDS = ['event_log', 'interval_counts'] as const;
export const DATASET_STATUSES = ['uploaded', 'mapped', 'fitting', 'fitted', 'failed'] as const;
/** Delimiters by name (drizzle-kit cannot quote a comma inside a MySQL enum). */
export const DATASET_DELIMITERS = ['comma', 'tab', 'semicolon', 'pipe'] as const;
export type DatasetDelimiter = (typeof DATASET_DELIMITERS)[number];
export const DELIMITER_CHARS: Record<DatasetDelimiter, string> = { comma: ',', tab: '\t', semicolon: ';', pipe: '|' };
export const TIMESTAMP_FORMATS = ['iso8601', 'epoch_seconds', 'epoch_milliseconds'] as const;
export const DURATION_UNITS = ['seconds', 'minutes'] as const;

export type DatasetKind = (typeof DATASET_KINDS)[number];
export type DatasetStatus = (typeof DATASET_STATUSES)[number];

const column = z.string().trim().min(1, 'Choose a column').max(200);
const optionalColumn = column.nullable().default(null);

/** How the file's columns feed the fit. Columns are named by their header text. */
export const datasetMappingSchema = z
  .object({
    kind: z.enum(DATASET_KINDS, { message: 'Choose what the file holds' }),
    delimiter: z.enum(DATASET_DELIMITERS, { message: 'Choose a delimiter' }),
    timestampFormat: z.enum(TIMESTAMP_FORMATS, { message: 'Choose a timestamp format' }),
    /** IANA zone: timestamps without an offset are read in it; the profile uses its clock. */
    timeZone: z.string().trim().min(1, 'Choose a time zone').max(64),
    intervalMinutes: z.union(DATASET_INTERVALS.map((m) => z.literal(m)) as [z.ZodLiteral<15>, z.ZodLiteral<30>, z.ZodLiteral<60>], { message: 'Choose 15, 30 or 60 minutes' }),
    /** Event log: arrival time; interval counts: interval start. */
    timeColumn: column,
    serviceStartColumn: optionalColumn,
    serviceEndColumn: optionalColumn,
    channelColumn: optionalColumn,
    countColumn: optionalColumn,
    handlingTimeColumn: optionalColumn,
    handlingTimeUnit: z.enum(DURATION_UNITS).default('seconds'),
  })
  .superRefine((m, ctx) => {
    const issue = (path: string, message: string) => ctx.addIssue({ code: 'custom', path: [path], message });
    if (m.kind === 'interval_counts' && !m.countColumn) issue('countColumn', 'Interval counts need the count column');
    if (m.kind === 'event_log' && m.serviceEndColumn && !m.serviceStartColumn) {
      issue('serviceStartColumn', 'A service end needs a service start to measure the service time');
    }
    const used = new Map<string, string>();
    for (const key of ['timeColumn', 'serviceStartColumn', 'serviceEndColumn', 'channelColumn', 'countColumn', 'handlingTimeColumn'] as const) {
      const c = m[key];
      if (!c) continue;
      if (used.has(c)) issue(key, `"${c}" is already used as ${used.get(c)}`);
      else used.set(c, key.replace('Column', ''));
    }
  });
export type DatasetMapping = z.infer<typeof datasetMappingSchema>;

/** Where a row could not be read: 1-based row of the file (the header is row 1) and the column. */
export const datasetProblemSchema = z.object({ message: z.string(), row: z.number().int().nullable(), column: z.string().nullable() });
export type DatasetProblem = z.infer<typeof datasetProblemSchema>;

export const datasetSchema = z.object({
  id: z.number().int(),
  engagementId: z.number().int(),
  name: z.string(),
  byteSize: z.number().int(),
  sha256: z.string(),
  status: z.enum(DATASET_STATUSES),
  /** 0–1 while fitting (share of the file read). */
  progress: z.number(),
  rowsRead: z.number().int(),
  header: z.array(z.string()),
  preview: z.array(z.array(z.string())),
  detectedDelimiter: z.enum(DATASET_DELIMITERS),
  mapping: z.record(z.string(), z.unknown()).nullable(),
  problem: datasetProblemSchema.nullable(),
  uploadedByName: z.string().nullable(),
  createdAt: z.string(),
  fittedAt: z.string().nullable(),
});
export type Dataset = z.infer<typeof datasetSchema>;

/** One value the fit proposes for the register; the user edits it before saving. */
export const assumptionSuggestionSchema = z.object({
  key: z.string(),
  name: z.string(),
  value: z.number(),
  unit: z.enum(UNIT_CODES),
  notes: z.string(),
});
export type AssumptionSuggestion = z.infer<typeof assumptionSuggestionSchema>;

export const createDatasetAssumptionsSchema = z.object({
  assumptions: z
    .array(
      z.object({
        /** The suggestion it was made from (fitSuggestions' key): which of the fit's warnings it carries. */
        key: z.string().max(60).optional(),
        name: shownName('Enter a name', ASSUMPTION_NAME_MAX),
        value: z.number({ message: 'Enter a number' }).finite('Enter a finite number'),
        unit: z.enum(UNIT_CODES, { message: 'Choose a unit' }),
        notes: z.string().trim().max(ASSUMPTION_TEXT_MAX).default(''),
      }),
    )
    .min(1, 'Choose at least one value')
    .max(20),
});
export type CreateDatasetAssumptions = z.infer<typeof createDatasetAssumptionsSchema>;

/** Appends an interval-staffing block built from the demand profile to a draft study. */
export const staffingBlockRequestSchema = z.object({
  studyId: z.number().int().positive(),
  /** null: the average week; 0 (Sunday) … 6: that weekday's profile. */
  weekday: z.number().int().min(0).max(6).nullable().default(null),
  /** Link to a register assumption (a service rate or a mean service time) or a plain rate per hour. */
  serviceRate: z.union([z.object({ assumption: z.number().int().positive() }), z.number().positive()]),
  criterion: z.enum(STAFFING_CRITERIA).default('serviceLevel'),
  target: z.number().positive().default(0.8),
  /** Waiting-time threshold (hours, the block's unit) of the service-level criterion. */
  t: z.number().positive().optional(),
});
export type StaffingBlockRequest = z.input<typeof staffingBlockRequestSchema>;

/** What a fit stores and GET /api/datasets/:id/fit returns (the engine's own fit shapes inside). */
export interface DatasetFit {
  kind: DatasetKind;
  /** Data rows read (the header excluded). */
  rows: number;
  demand: import('../queue/fit/index').DemandFit;
  /** Event logs with service start and end: the full service-time fit. */
  service: import('../queue/fit/index').ServiceFit | null;
  /** Interval counts with a mean handling time: the arrival-weighted mean. */
  handling: { meanSeconds: number; intervals: number } | null;
  /** Arrivals per channel (largest 20), when a channel column was mapped. */
  channels: { name: string; count: number }[];
  /** True when the per-interval rows were left out to keep the stored fit small. */
  intervalsOmitted: boolean;
  suggestions: AssumptionSuggestion[];
}
