import type { z } from 'zod';
import { QueueError } from '../errors';

/** Turns every zod issue into one QueueError invalid_input with dotted paths ("arrival.scv"). */
export function zodToQueueError(error: z.ZodError, what: string): QueueError {
  const issues = error.issues.map((i) => ({
    path: i.path.map(String).join('.') || '(input)',
    message: i.message,
  }));
  const first = issues[0];
  const summary = first ? `${first.path}: ${first.message}` : 'invalid input';
  return new QueueError('invalid_input', `Invalid ${what}: ${summary}${issues.length > 1 ? ` (and ${issues.length - 1} more)` : ''}`, issues);
}

/** Parses `input` with `schema` or throws the QueueError above. */
export function parseOrThrow<S extends z.ZodType>(schema: S, input: unknown, what: string): z.output<S> {
  const parsed = schema.safeParse(input);
  if (!parsed.success) throw zodToQueueError(parsed.error, what);
  return parsed.data;
}
