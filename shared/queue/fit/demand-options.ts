import { z } from 'zod';
import { parseOrThrow } from '../sim/zod-to-queue-error';

/** Interval lengths (minutes) that tile an hour or a day, so each interval sits in whole hours. */
export const INTERVAL_MINUTES = [1, 2, 3, 4, 5, 6, 10, 12, 15, 20, 30, 60, 120, 180, 240, 360, 480, 720, 1440] as const;
/** Most intervals a demand fit will lay out between the first and the last observation. */
export const MAX_INTERVALS = 1_000_000;

/** Options of the arrival and interval-count accumulators. */
export const demandOptionsSchema = z
  .object({
    intervalMinutes: z
      .number({ error: 'intervalMinutes must be a number' })
      .refine((m) => (INTERVAL_MINUTES as readonly number[]).includes(m), `intervalMinutes must be one of ${INTERVAL_MINUTES.join(', ')}`),
    /** IANA time zone for intervals, hours of day and days of week; default UTC. */
    timeZone: z.string({ error: 'timeZone must be a string' }).min(1).default('UTC'),
  })
  .strict();

export type DemandOptions = z.input<typeof demandOptionsSchema>;

export function parseDemandOptions(input: unknown): z.output<typeof demandOptionsSchema> {
  return parseOrThrow(demandOptionsSchema, input, 'fitting options');
}
