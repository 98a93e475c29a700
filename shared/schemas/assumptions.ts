import { z } from 'zod';
import { shownName } from './shown-name';
import { UNIT_CODES } from '../units/units';

export const ASSUMPTION_NAME_MAX = 120;
export const ASSUMPTION_TEXT_MAX = 500;
export const ASSUMPTION_SOURCES = ['dataset', 'client', 'judgement', 'published', 'other'] as const;

export const assumptionSchema = z.object({
  id: z.number().int(),
  engagementId: z.number().int(),
  name: z.string(),
  value: z.number(),
  unit: z.enum(UNIT_CODES),
  sourceKind: z.enum(ASSUMPTION_SOURCES),
  /** Free text: which dataset, document or conversation; who said so. */
  sourceDetail: z.string(),
  ownerId: z.number().int().nullable(),
  ownerName: z.string().nullable(),
  notes: z.string(),
  /** For a value made from a dataset's fit: that fit's warnings bearing on it (empty otherwise). */
  cautions: z.array(z.object({ code: z.string(), message: z.string() })),
  /** How many model blocks in draft studies link to it. */
  usageCount: z.number().int(),
  updatedAt: z.string(),
  version: z.number().int(),
});

const fields = {
  name: shownName('Enter a name', ASSUMPTION_NAME_MAX),
  value: z.number({ message: 'Enter a number' }).finite('Enter a finite number'),
  unit: z.enum(UNIT_CODES, { message: 'Choose a unit' }),
  sourceKind: z.enum(ASSUMPTION_SOURCES, { message: 'Choose where it comes from' }),
  sourceDetail: z.string().trim().max(ASSUMPTION_TEXT_MAX),
  ownerId: z.number().int().positive().nullable(),
  notes: z.string().trim().max(ASSUMPTION_TEXT_MAX),
};

export const createAssumptionSchema = z.object({
  ...fields,
  sourceDetail: fields.sourceDetail.default(''),
  ownerId: fields.ownerId.default(null),
  notes: fields.notes.default(''),
});

export const updateAssumptionSchema = z
  .object(fields)
  .partial()
  .extend({ version: z.number().int({ message: 'version is required' }) });

/** One number that moved in one block when an assumption changed. */
export const movedNumberSchema = z.object({
  studyId: z.number().int(),
  studyTitle: z.string(),
  blockId: z.string(),
  blockTitle: z.string(),
  measure: z.string(),
  before: z.number().nullable(),
  after: z.number().nullable(),
});

export type Assumption = z.infer<typeof assumptionSchema>;
export type CreateAssumption = z.infer<typeof createAssumptionSchema>;
export type UpdateAssumption = z.infer<typeof updateAssumptionSchema>;
export type MovedNumber = z.infer<typeof movedNumberSchema>;
