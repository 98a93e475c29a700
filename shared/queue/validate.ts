/** Spec validation: zod issues become one QueueError('invalid_input') with dotted paths. */
import type { z } from 'zod';
import { QueueError, type QueueIssue } from './errors';
import { MODEL_NAMES, SPEC_SCHEMAS, type ModelName, type QueueSpec } from './spec';

/** Turns every issue of a failed parse into a QueueError issue with a dotted path ("routing.1.2"). */
export function queueErrorFromZod(error: z.ZodError, prefix = ''): QueueError {
  const issues: QueueIssue[] = error.issues.map((issue) => ({
    path: [prefix, ...issue.path.map(String)].filter((p) => p !== '').join('.'),
    message: issue.message,
  }));
  const first = issues[0];
  const summary = first ? `${first.path || 'spec'}: ${first.message}` : 'invalid spec';
  const more = issues.length > 1 ? ` (and ${issues.length - 1} more)` : '';
  return new QueueError('invalid_input', `${summary}${more}`, issues);
}

function isModelName(x: unknown): x is ModelName {
  return typeof x === 'string' && (MODEL_NAMES as string[]).includes(x);
}

/** Validates an unknown value as an engine spec; throws QueueError('invalid_input') listing every issue. */
export function parseSpec(spec: unknown): QueueSpec {
  if (typeof spec !== 'object' || spec === null || Array.isArray(spec)) {
    throw new QueueError('invalid_input', 'spec: must be an object with a model field', [{ path: '', message: 'must be an object with a model field' }]);
  }
  const model = (spec as { model?: unknown }).model;
  if (!isModelName(model)) {
    const message = `must be one of ${MODEL_NAMES.join(', ')}`;
    throw new QueueError('invalid_input', `model: ${message}`, [{ path: 'model', message }]);
  }
  const parsed = SPEC_SCHEMAS[model].safeParse(spec);
  if (!parsed.success) throw queueErrorFromZod(parsed.error);
  return parsed.data as QueueSpec;
}
