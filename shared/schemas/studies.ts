import { z } from 'zod';
import { studyBlockResultSchema } from './model-block';

export const STUDY_TITLE_MAX = 200;
/** Upper bound of a stored document (JSON characters); larger saves get 413. */
export const DOCUMENT_MAX_CHARS = 2_000_000;
export const MAX_BLOCKS_PER_STUDY = 500;

export const STUDY_STATUSES = ['draft', 'in_review', 'changes_requested', 'approved', 'released'] as const;

export const studySummarySchema = z.object({
  id: z.number().int(),
  engagementId: z.number().int(),
  title: z.string(),
  status: z.enum(STUDY_STATUSES),
  templateKey: z.string().nullable(),
  authorName: z.string().nullable(),
  updatedAt: z.string(),
  updatedByName: z.string().nullable(),
  version: z.number().int(),
});

/** TipTap JSON; validated and cleaned against shared/editor/study-extensions.ts on save. */
export const documentSchema = z.looseObject({ type: z.literal('doc'), content: z.array(z.unknown()).optional() });

export const studyDetailSchema = studySummarySchema.extend({
  document: documentSchema,
  /** Server-computed results keyed by blockId. */
  blocks: z.record(z.string(), studyBlockResultSchema),
  safetyCritical: z.boolean(),
  engagementName: z.string(),
});

export const createStudySchema = z.object({
  title: z.string().trim().min(1, 'Enter a title').max(STUDY_TITLE_MAX),
  /** A key from GET /api/templates, or null for a blank study. */
  templateKey: z.string().max(80).nullable().default(null),
});

export const saveDocumentSchema = z.object({
  document: documentSchema,
  baseVersion: z.number().int().min(1),
  title: z.string().trim().min(1, 'Enter a title').max(STUDY_TITLE_MAX).optional(),
});

export const templateSummarySchema = z.object({
  key: z.string(),
  title: z.string(),
  description: z.string(),
  sectionCount: z.number().int(),
  blockCount: z.number().int(),
  assumptionCount: z.number().int(),
});

export type StudySummary = z.infer<typeof studySummarySchema>;
export type StudyDetail = z.infer<typeof studyDetailSchema>;
export type CreateStudy = z.infer<typeof createStudySchema>;
export type SaveDocument = z.infer<typeof saveDocumentSchema>;
export type TemplateSummary = z.infer<typeof templateSummarySchema>;
