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

// ---- Review, release and delivery contracts (requests and answers of the revisions API) ----

export const RELEASE_STATUSES = ['releasing', 'released', 'failed'] as const;
export type ReleaseStatus = (typeof RELEASE_STATUSES)[number];
export const COMMENT_ANCHOR_TYPES = ['section', 'block', 'general'] as const;
export type CommentAnchorType = (typeof COMMENT_ANCHOR_TYPES)[number];
export const COMMENT_MAX = 4000;
export const DECISION_REASON_MAX = 2000;
/** Largest PDF POST /api/verify accepts. */
export const VERIFY_MAX_BYTES = 20 * 1024 * 1024;

/** `studyVersion`, when given, must be the study's current version (409 otherwise): submit what you saw. */
export const submitRevisionSchema = z.object({ studyVersion: z.number().int().min(1).optional() });

export const decisionSchema = z
  .object({
    decision: z.enum(['approve', 'request-changes']),
    reason: z.string().trim().max(DECISION_REASON_MAX).default(''),
  })
  .refine((d) => d.decision === 'approve' || d.reason.length > 0, { path: ['reason'], message: 'Say what needs to change' });

export const createCommentSchema = z
  .object({
    anchorType: z.enum(COMMENT_ANCHOR_TYPES).default('general'),
    /** sectionId of a heading or blockId of a model block in the revision; null for general. */
    anchorId: z.string().max(40).nullable().default(null),
    /** A reply names the thread's first comment. */
    parentId: z.number().int().positive().nullable().default(null),
    body: z.string().trim().min(1, 'Write a comment').max(COMMENT_MAX),
  })
  .refine((c) => c.parentId !== null || (c.anchorType === 'general') === (c.anchorId === null), {
    path: ['anchorId'],
    message: 'A section or block comment names its anchor; a general comment has none',
  });

export const updateCommentSchema = z.object({ resolved: z.boolean() });

export const releaseInfoSchema = z.object({
  status: z.enum(RELEASE_STATUSES),
  attempts: z.number().int(),
  lastError: z.string().nullable(),
  releasedAt: z.string().nullable(),
  fileSha256: z.string().nullable(),
  fileSize: z.number().int().nullable(),
});

export const revisionSummarySchema = z.object({
  id: z.number().int(),
  studyId: z.number().int(),
  studyTitle: z.string(),
  engagementId: z.number().int(),
  engagementName: z.string(),
  number: z.number().int(),
  status: z.enum(REVISION_STATUSES),
  sha256: z.string(),
  engineVersion: z.string(),
  submittedById: z.number().int().nullable(),
  submittedByName: z.string().nullable(),
  submittedAt: z.string(),
  decidedById: z.number().int().nullable(),
  decidedByName: z.string().nullable(),
  decidedAt: z.string().nullable(),
  /** Withheld (null) from clients. */
  decisionReason: z.string().nullable(),
  releasedAt: z.string().nullable(),
  version: z.number().int(),
  /** Null until a release was first attempted; clients see only released ones. */
  release: releaseInfoSchema.nullable(),
  /** Unresolved threads (0 for clients, who never see comments). */
  openThreads: z.number().int(),
});

/** SHA-256 re-computed from the stored snapshot; a mismatch means the stored content changed. */
export const integritySchema = z.object({ ok: z.boolean(), storedSha256: z.string(), computedSha256: z.string() });

export const revisionDetailSchema = revisionSummarySchema.extend({
  snapshot: revisionSnapshotSchema,
  integrity: integritySchema,
  /** What the signed-in user may do now (the server checks again). */
  canDecide: z.boolean(),
  canRelease: z.boolean(),
});

export const revisionCommentSchema = z.object({
  id: z.number().int(),
  revisionId: z.number().int(),
  anchorType: z.enum(COMMENT_ANCHOR_TYPES),
  anchorId: z.string().nullable(),
  parentId: z.number().int().nullable(),
  authorId: z.number().int().nullable(),
  authorName: z.string().nullable(),
  /** Plain text: render as text, never as HTML. */
  body: z.string(),
  createdAt: z.string(),
  resolvedAt: z.string().nullable(),
  resolvedByName: z.string().nullable(),
});

export const textPartSchema = z.object({ kind: z.enum(['same', 'added', 'removed']), text: z.string() });
export const sectionChangeSchema = z.object({
  sectionId: z.string().nullable(),
  title: z.string(),
  change: z.enum(['added', 'removed', 'changed', 'unchanged']),
  /** Word-level diff of the section's plain text (one `same` part when unchanged). */
  parts: z.array(textPartSchema),
});
export const movedNumberSchema = z.object({
  blockId: z.string(),
  blockTitle: z.string(),
  measure: z.string(),
  before: z.number().nullable(),
  after: z.number().nullable(),
  change: z.number().nullable(),
  /** (after − before) / |before|; null when either is missing or before is 0. */
  relativeChange: z.number().nullable(),
});
const revisionRefSchema = z.object({ id: z.number().int(), number: z.number().int(), status: z.enum(REVISION_STATUSES) });
export const revisionComparisonSchema = z.object({
  from: revisionRefSchema,
  to: revisionRefSchema,
  sections: z.array(sectionChangeSchema),
  movedNumbers: z.array(movedNumberSchema),
  addedBlocks: z.array(z.object({ blockId: z.string(), title: z.string() })),
  removedBlocks: z.array(z.object({ blockId: z.string(), title: z.string() })),
});

export const deliverableSchema = z.object({
  revisionId: z.number().int(),
  studyId: z.number().int(),
  studyTitle: z.string(),
  engagementId: z.number().int(),
  engagementName: z.string(),
  number: z.number().int(),
  releasedAt: z.string(),
  approvedAt: z.string().nullable(),
  approverName: z.string().nullable(),
  revisionSha256: z.string(),
  fileSha256: z.string(),
  fileSize: z.number().int(),
});

export const pdfLinkSchema = z.object({ url: z.string(), expiresAt: z.string(), fileName: z.string() });

export const VERIFY_VERDICTS = ['authentic', 'unsigned', 'signature_invalid', 'unknown_file'] as const;
export const verifyResultSchema = z.object({
  /** Signature valid AND the file is byte-for-byte a released deliverable AND its revision hash matches. */
  authentic: z.boolean(),
  verdict: z.enum(VERIFY_VERDICTS),
  message: z.string(),
  fileSha256: z.string(),
  signature: z.object({
    signed: z.boolean(),
    valid: z.boolean(),
    integrityOk: z.boolean(),
    signerCommonName: z.string().nullable(),
    signingTime: z.string().nullable(),
    reason: z.string().nullable(),
  }),
  /** The revision SHA-256 the PDF carries, if any. */
  revisionSha256: z.string().nullable(),
  /** Details only when the user may see that engagement; otherwise null with detailsWithheld. */
  deliverable: deliverableSchema.nullable(),
  detailsWithheld: z.boolean(),
});

export type SubmitRevision = z.infer<typeof submitRevisionSchema>;
export type Decision = z.infer<typeof decisionSchema>;
export type CreateComment = z.infer<typeof createCommentSchema>;
export type ReleaseInfo = z.infer<typeof releaseInfoSchema>;
export type RevisionSummary = z.infer<typeof revisionSummarySchema>;
export type RevisionDetail = z.infer<typeof revisionDetailSchema>;
export type RevisionComment = z.infer<typeof revisionCommentSchema>;
export type RevisionComparison = z.infer<typeof revisionComparisonSchema>;
export type SectionChange = z.infer<typeof sectionChangeSchema>;
export type MovedNumber = z.infer<typeof movedNumberSchema>;
export type Deliverable = z.infer<typeof deliverableSchema>;
export type PdfLink = z.infer<typeof pdfLinkSchema>;
export type VerifyResult = z.infer<typeof verifyResultSchema>;
