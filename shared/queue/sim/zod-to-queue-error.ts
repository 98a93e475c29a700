import type { z } from 'zod';
import { QueueError } from '../errors';

/** Turns every zod issue into one QueueError invalid_input with dotted paths ("arrival.scv"). */
export function zodToQueueError(error: z.ZodError, what: string): QueueError {
  const dotted = (path: PropertyKey[]): string => path.map(String).join('.') || '(input)';
  // An unknown field is reported at its own path, so a form can point at it.
  const issues = error.issues.flatMap((i) =>
    i.code === 'unrecognized_keys'
      ? i.keys.map((k) => ({ path: dotted([...i.path, k]), message: 'is not a known field' }))
      : [{ path: dotted(i.path), message: i.message }],
  );
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
