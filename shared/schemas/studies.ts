import { z } from 'zod';
import { shownName } from './shown-name';
import { UNIT_CODES } from '../units/units';
import { ASSUMPTION_NAME_MAX, ASSUMPTION_SOURCES } from './assumptions';
import { studyBlockResultSchema } from './model-block';

export const STUDY_TITLE_MAX = 200;
/** Upper bound of a stored document (JSON characters); larger saves get 413. */
export const DOCUMENT_MAX_CHARS = 2_000_000;
export const MAX_BLOCKS_PER_STUDY = 500;

export const STUDY_STATUSES = ['draft', 'in_review', 'changes_requested', 'approved', 'released'] as const;
export type StudyStatus = (typeof STUDY_STATUSES)[number];
/**
 * Statuses in which the study's working draft can be saved and assumption changes recompute its
 * blocks: all of them. A study's status tells where its latest revision stands; what review,
 * approval and release freeze is that revision's snapshot, never the draft — so the author keeps
 * writing while a revision is in review, and revision 2 can follow a released revision 1.
 */
export const DRAFT_STUDY_STATUSES = STUDY_STATUSES;

/** Client-generated ids of model blocks and sections; the server replaces missing or duplicate ones. */
export const BLOCK_ID_PATTERN = /^[A-Za-z0-9_-]{6,40}$/;
/** Most specs one POST /api/compute may carry. */
export const COMPUTE_MAX_SPECS = 200;

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
  title: shownName('Enter a title', STUDY_TITLE_MAX),
  /** A key from GET /api/templates, or null for a blank study. */
  templateKey: z.string().max(80).nullable().default(null),
});

export const saveDocumentSchema = z.object({
  document: documentSchema,
  baseVersion: z.number().int().min(1),
  title: shownName('Enter a title', STUDY_TITLE_MAX).optional(),
});

export const templateSummarySchema = z.object({
  key: z.string(),
  title: z.string(),
  description: z.string(),
  sectionCount: z.number().int(),
  blockCount: z.number().int(),
  assumptionCount: z.number().int(),
});

/**
 * A study template as `templates/index.ts` exports it (STUDY_TEMPLATES). Model-block configs link
 * template assumptions by key (`{ "assumption": "<key>" }`); creating a study rewrites them to ids.
 */
export const studyTemplateSchema = z.object({
  key: z.string().min(1).max(80),
  title: z.string().min(1),
  description: z.string(),
  assumptions: z.array(
    z.object({
      key: z.string().min(1),
      name: z.string().min(1).max(ASSUMPTION_NAME_MAX),
      value: z.number().finite(),
      unit: z.enum(UNIT_CODES),
      sourceKind: z.enum(ASSUMPTION_SOURCES),
      sourceDetail: z.string().default(''),
      notes: z.string().default(''),
    }),
  ),
  document: documentSchema,
});

export type StudyTemplate = z.input<typeof studyTemplateSchema>;
export type StudySummary = z.infer<typeof studySummarySchema>;
export type StudyDetail = z.infer<typeof studyDetailSchema>;
export type CreateStudy = z.infer<typeof createStudySchema>;
export type SaveDocument = z.infer<typeof saveDocumentSchema>;
export type TemplateSummary = z.infer<typeof templateSummarySchema>;
