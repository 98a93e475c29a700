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

export class QueueError extends Error {
  readonly code: QueueErrorCode;
  readonly issues: QueueIssue[];

  constructor(code: QueueErrorCode, message: string, issues: QueueIssue[] = []) {
    super(message);
    this.name = 'QueueError';
    this.code = code;
    this.issues = issues;
  }

  toJSON(): { code: QueueErrorCode; message: string; issues: QueueIssue[] } {
    return { code: this.code, message: this.message, issues: this.issues };
  }
}

/** Shorthand for an invalid_input error about one field. */
export function invalidInput(path: string, message: string): QueueError {
  return new QueueError('invalid_input', `${path}: ${message}`, [{ path, message }]);
}
