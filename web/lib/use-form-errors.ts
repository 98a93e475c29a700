import { useCallback, useState } from 'react';
import type { z } from 'zod';
import { isApiError } from './api-error';

export type FieldErrors = Record<string, string>;

/**
 * One path from validation to form: the same zod schema the API uses checks the values first,
 * and an API refusal lands on the field its issue names. Anything without a field (a 409, a
 * rate limit, a network failure) becomes the form's own message.
 */
export function useFormErrors(fields: readonly string[]) {
  const [fieldErrors, setFieldErrors] = useState<FieldErrors>({});
  const [formError, setFormError] = useState<string | null>(null);

  const clear = useCallback(() => {
    setFieldErrors({});
    setFormError(null);
  }, []);

  const validate = useCallback(
    <S extends z.ZodType>(schema: S, values: unknown): z.infer<S> | null => {
      const result = schema.safeParse(values);
      if (result.success) {
        clear();
        return result.data;
      }
      const next: FieldErrors = {};
      let general: string | null = null;
      for (const issue of result.error.issues) {
        const path = issue.path.join('.');
        if (fields.includes(path)) next[path] ??= issue.message;
        else general ??= issue.message;
      }
      setFieldErrors(next);
      setFormError(general);
      return null;
    },
    [fields, clear],
  );

  const fromError = useCallback(
    (err: unknown) => {
      const next: FieldErrors = {};
      let unplaced = false;
      if (isApiError(err)) {
        for (const issue of err.issues) {
          if (fields.includes(issue.path)) next[issue.path] ??= issue.message;
          else unplaced = true;
        }
      }
      setFieldErrors(next);
      const placedAll = Object.keys(next).length > 0 && !unplaced;
      setFormError(placedAll ? null : err instanceof Error ? err.message : 'Something went wrong.');
    },
    [fields],
  );

  return { fieldErrors, formError, validate, fromError, clear };
}
