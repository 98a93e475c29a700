import { z } from 'zod';

/**
 * The one error body every API failure uses. Forms map `issues` onto their fields by `path`
 * (dotted, e.g. "members.0.email"); anything else is shown as a message.
 */
export const apiIssueSchema = z.object({ path: z.string(), message: z.string() });
export const apiErrorBodySchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    issues: z.array(apiIssueSchema).optional(),
  }),
});

export type ApiIssue = z.infer<typeof apiIssueSchema>;
export type ApiErrorBody = z.infer<typeof apiErrorBodySchema>;

/** Codes the API emits; the web client branches on a few of them (conflict, unauthenticated). */
export const API_ERROR_CODES = [
  'validation_failed',
  'invalid_input',
  'unstable',
  'unauthenticated',
  'forbidden',
  'not_found',
  'conflict',
  'rate_limited',
  'csrf_failed',
  'payload_too_large',
  'unavailable',
  'internal',
] as const;
export type ApiErrorCode = (typeof API_ERROR_CODES)[number];

/** Header every state-changing request must carry (CSRF defence, see README). */
export const CSRF_HEADER = 'x-sojourn-csrf';
export const CSRF_HEADER_VALUE = '1';
