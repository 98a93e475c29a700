import type { z } from 'zod';
import { HttpError } from '../http-error';

/** Parses with a zod schema; a ZodError reaches the error handler as 400 validation_failed. */
export function parse<S extends z.ZodType>(schema: S, value: unknown): z.infer<S> {
  return schema.parse(value ?? {});
}

/** A positive integer route parameter; anything else is a 404 so ids are not probed. */
export function idParam(value: string | string[] | undefined, what = 'That item'): number {
  const s = Array.isArray(value) ? value[0] : value;
  if (!s || !/^[1-9]\d{0,9}$/.test(s)) throw new HttpError(404, 'not_found', `${what} was not found.`);
  return Number(s);
}
