import { z } from 'zod';
import { documentSchema } from './studies';
import { studyBlockResultSchema } from './model-block';
import { UNIT_CODES } from '../units/units';

export const REVISION_STATUSES = ['in_review', 'changes_requested', 'approved', 'released'] as const;
export type RevisionStatus = (typeof REVISION_STATUSES)[number];

/** An assumption as frozen into a revision (appendix of the PDF). */
export const frozenAssumptionSchema = z.object({
  id: z.number().int(),
  name: z.string(),
  value: z.number(),
  unit: z.enum(UNIT_CODES),
  sourceKind: z.string(),
  sourceDetail: z.string(),
  ownerName: z.string().nullable(),
  notes: z.string(),
});

/**
 * Everything a revision freezes: the document, every block's inputs and outputs, the
 * assumptions used and the engine version. Its SHA-256 is taken over a canonical JSON
 * serialisation (keys sorted) of this object.
 */
export const revisionSnapshotSchema = z.object({
  engagement: z.object({ id: z.number().int(), name: z.string(), clientName: z.string(), safetyCritical: z.boolean() }),
  study: z.object({ id: z.number().int(), title: z.string() }),
  number: z.number().int().min(1),
  submittedAt: z.string(),
  submittedBy: z.string(),
  document: documentSchema,
  blocks: z.record(z.string(), studyBlockResultSchema),
  assumptions: z.array(frozenAssumptionSchema),
  engineVersion: z.string(),
});
export type RevisionSnapshot = z.infer<typeof revisionSnapshotSchema>;
export type FrozenAssumption = z.infer<typeof frozenAssumptionSchema>;

/** The partner's approval as printed on the sign-off page and bound into the signature. */
export const signOffSchema = z.object({
  approverName: z.string(),
  approverEmail: z.string(),
  approvedAt: z.string(),
  /** SHA-256 (hex) of the canonical snapshot. */
  sha256: z.string().regex(/^[0-9a-f]{64}$/),
  releasedAt: z.string(),
});
export type SignOff = z.infer<typeof signOffSchema>;
