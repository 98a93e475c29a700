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

/** Every code the API emits (HttpError accepts no other); the web client branches on a few of them. */
export const API_ERROR_CODES = [
  'validation_failed',
  'invalid_input',
  'unstable',
  'unauthenticated',
  /** Sign-in with an e-mail and password that match no active account. */
  'invalid_credentials',
  'forbidden',
  'not_found',
  'conflict',
  /** A revision's stored content no longer matches its SHA-256; it cannot be released. */
  'integrity_failed',
  'rate_limited',
  'csrf_failed',
  'payload_too_large',
  'unavailable',
  /** The file store is down: a download link cannot be issued (nothing is lost). */
  'storage_unavailable',
  /** A released revision's signed PDF is not in the file store (logged for the firm). */
  'deliverable_missing',
  /** A release could not store its PDF; recorded as failed, the revision stays approved. */
  'release_failed',
  'internal',
] as const;
export type ApiErrorCode = (typeof API_ERROR_CODES)[number];

/** Header every state-changing request must carry (CSRF defence, see README). */
export const CSRF_HEADER = 'x-sojourn-csrf';
export const CSRF_HEADER_VALUE = '1';
