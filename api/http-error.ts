import type { ApiErrorCode, ApiIssue } from '../shared/api-error';

/** An error with the status and body the client should get; thrown from services and routes. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: ApiErrorCode,
    message: string,
    readonly issues?: ApiIssue[],
  ) {
    super(message);
    this.name = 'HttpError';
  }
}

export const notFound = (what = 'That item'): HttpError => new HttpError(404, 'not_found', `${what} was not found.`);
export const forbidden = (message = 'Your role does not allow this.'): HttpError => new HttpError(403, 'forbidden', message);
export const conflict = (message: string): HttpError => new HttpError(409, 'conflict', message);
