import { z } from 'zod';
import { PASSWORD_MAX, PASSWORD_MIN } from '#shared/schemas/auth';

/** A new password typed twice; the repeat is checked here only, the API sees one password. */
export const newPasswordPairSchema = z
  .object({
    password: z
      .string()
      .min(PASSWORD_MIN, `Use at least ${PASSWORD_MIN} characters`)
      .max(PASSWORD_MAX, `Use at most ${PASSWORD_MAX} characters`),
    repeat: z.string(),
  })
  .refine((v) => v.password === v.repeat, { path: ['repeat'], message: 'The two passwords differ' });

export const NEW_PASSWORD_HINT = `At least ${PASSWORD_MIN} characters. A short sentence is easier to remember than symbols.`;
