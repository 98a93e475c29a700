/**
 * Typed errors of the queueing engine. Every invalid or unstable input ends here instead of
 * producing NaN or Infinity, so the API can turn it into a 4xx body naming the field.
 */
export type QueueErrorCode = 'invalid_input' | 'unstable';

export interface QueueIssue {
  /** Dotted path of the offending input, e.g. "servers" or "routing.1.2". */
  path: string;
  message: string;
}

/**
 * Machine-readable facts about an `unstable` error: the offered utilisation ρ and the smallest
 * number of servers (or the largest arrival rate) that would make the model stable.
 */
export interface QueueErrorDetails {
  rho?: number;
  minServers?: number;
  maxArrivalRate?: number;
  node?: number;
}

export class QueueError extends Error {
  readonly code: QueueErrorCode;
  readonly issues: QueueIssue[];
  readonly details?: QueueErrorDetails;

  constructor(code: QueueErrorCode, message: string, issues: QueueIssue[] = [], details?: QueueErrorDetails) {
    super(message);
    this.name = 'QueueError';
    this.code = code;
    this.issues = issues;
    if (details) this.details = details;
  }

  toJSON(): { code: QueueErrorCode; message: string; issues: QueueIssue[]; details?: QueueErrorDetails } {
    const body = { code: this.code, message: this.message, issues: this.issues };
    return this.details ? { ...body, details: this.details } : body;
  }
}

/** Shorthand for an invalid_input error about one field. */
export function invalidInput(path: string, message: string): QueueError {
  return new QueueError('invalid_input', `${path}: ${message}`, [{ path, message }]);
}

/** Shorthand for an `unstable` error about one field, with ρ and the capacity stability needs. */
export function unstable(path: string, message: string, details: QueueErrorDetails): QueueError {
  return new QueueError('unstable', message, [{ path, message }], details);
}
