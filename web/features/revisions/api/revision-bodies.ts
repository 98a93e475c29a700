import { z } from 'zod';
import {
  deliverableSchema,
  pdfLinkSchema,
  revisionCommentSchema,
  revisionComparisonSchema,
  revisionDetailSchema,
  revisionSummarySchema,
  verifyResultSchema,
} from '#shared/schemas/revisions';

/**
 * The envelopes the revisions API answers with, in one place: each answer names what it
 * carries (`{ revision }`, `{ revisions }`…), like the rest of the API.
 */
export const revisionListBody = z.object({ revisions: z.array(revisionSummarySchema) });
export const revisionBody = z.object({ revision: revisionDetailSchema });
export const revisionSummaryBody = z.object({ revision: revisionSummarySchema });
/** What an action answers with, whether the API sends the summary or the whole detail: the id, number and state. */
export const revisionRefBody = z.object({ revision: revisionSummarySchema.pick({ id: true, number: true, status: true }) });
export const commentListBody = z.object({ comments: z.array(revisionCommentSchema) });
export const commentBody = z.object({ comment: revisionCommentSchema });
export const comparisonBody = z.object({ comparison: revisionComparisonSchema });
export const deliverableListBody = z.object({ deliverables: z.array(deliverableSchema) });
export const pdfLinkBody = pdfLinkSchema;
export const verifyBody = z.object({ result: verifyResultSchema });
