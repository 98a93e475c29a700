import type { ApiIssue } from '#shared/api-error';

/**
 * A failed API call. `status` 0 means the request never got an answer (network, server down);
 * `issues` carry field-level problems that forms map onto their inputs by `path`.
 */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly issues: ApiIssue[] = [],
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

export function isApiError(err: unknown): err is ApiError {
  return err instanceof ApiError;
}
