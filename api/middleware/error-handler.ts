import type { ErrorRequestHandler } from 'express';
import { ZodError } from 'zod';
import type { ApiErrorBody } from '../../shared/api-error';
import { QueueError } from '../../shared/queue/errors';
import { HttpError } from '../http-error';

/** Dotted path as the web forms expect ("members.0.email"). */
export function zodIssues(err: ZodError): { path: string; message: string }[] {
  return err.issues.map((i) => ({ path: i.path.map(String).join('.'), message: i.message }));
}

const DB_DOWN = new Set([
  'ECONNREFUSED',
  'ECONNRESET',
  'ETIMEDOUT',
  'EHOSTUNREACH',
  'ENOTFOUND',
  'EPIPE',
  'PROTOCOL_CONNECTION_LOST',
  'PROTOCOL_ENQUEUE_AFTER_FATAL_ERROR',
  'ER_CON_COUNT_ERROR',
  'ER_SERVER_SHUTDOWN',
  'ER_CONNECTION_KILLED',
]);

/** AWS SDK errors (object storage) carry `$metadata`; network failures arrive with a Node code. */
function fromStorage(err: unknown): boolean {
  return typeof err === 'object' && err !== null && '$metadata' in err;
}

/** Storage did not answer (no HTTP status: refused, reset, timed out) or answered 5xx. */
function storageDown(err: unknown): boolean {
  if (!fromStorage(err)) return false;
  const status = (err as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode;
  return status === undefined || status >= 500;
}

/**
 * True when the database could not be reached. Drizzle wraps the driver's error in a
 * DrizzleQueryError whose `cause` carries the code, so the whole cause chain is searched;
 * mysql2 also marks any error that killed its connection `fatal`.
 */
function databaseDown(err: unknown): boolean {
  // The AWS SDK reports a refused storage connection with the same Node codes: not the database.
  if (fromStorage(err)) return false;
  let e = err as { code?: unknown; fatal?: unknown; cause?: unknown } | undefined;
  for (let depth = 0; e && typeof e === 'object' && depth < 5; depth++, e = e.cause as typeof e) {
    if ((typeof e.code === 'string' && DB_DOWN.has(e.code)) || e.fatal === true) return true;
  }
  return false;
}

function toBody(err: unknown): { status: number; body: ApiErrorBody } {
  if (err instanceof HttpError) {
    return { status: err.status, body: { error: { code: err.code, message: err.message, ...(err.issues ? { issues: err.issues } : {}) } } };
  }
  if (err instanceof ZodError) {
    const issues = zodIssues(err);
    const first = issues[0];
    const message = first ? `${first.path || 'body'}: ${first.message}` : 'The request is not valid.';
    return { status: 400, body: { error: { code: 'validation_failed', message, issues } } };
  }
  if (err instanceof QueueError) {
    return { status: 422, body: { error: { code: err.code, message: err.message, issues: err.issues } } };
  }
  const e = err as { type?: string; code?: string; status?: number; limit?: number };
  if (e.type === 'entity.too.large') {
    // body-parser names its limit: say it, so a client knows how much is accepted.
    const limit = typeof e.limit === 'number' ? ` (at most ${Math.round(e.limit / 1024 / 1024)} MB here)` : '';
    return { status: 413, body: { error: { code: 'payload_too_large', message: `The request body is too large${limit}.` } } };
  }
  if (e.type === 'entity.parse.failed') {
    return { status: 400, body: { error: { code: 'validation_failed', message: 'The request body is not valid JSON.' } } };
  }
  if (storageDown(err)) {
    return { status: 503, body: { error: { code: 'storage_unavailable', message: 'The file store is unavailable; try again in a few minutes.' } } };
  }
  if (databaseDown(err)) {
    return { status: 503, body: { error: { code: 'unavailable', message: 'The database is unavailable; try again in a few seconds.' } } };
  }
  return { status: 500, body: { error: { code: 'internal', message: 'Something went wrong on the server. It has been logged.' } } };
}

/** Registered last: every failure leaves with the one error body of shared/api-error.ts. */
export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  const { status, body } = toBody(err);
  if (status >= 500 && status !== 503) console.error(`[api] ${req.method} ${req.originalUrl}`, err);
  if (res.headersSent) return;
  res.status(status).json(body);
};
