import { z } from 'zod';

/** Largest number of observed values accepted by an empirical distribution. */
export const MAX_EMPIRICAL_VALUES = 1_000_000;
/** Largest squared coefficient of variation accepted for lognormal and gamma times. */
export const MAX_SCV = 100;

const positive = (what: string) => z.number({ error: `${what} must be a number` }).positive(`${what} must be greater than 0`);
const mean = positive('mean').optional();
const scv = positive('scv').max(MAX_SCV, `scv must be at most ${MAX_SCV}`);

/**
 * How inter-arrival or service times are distributed. The mean always comes from the rate
 * (1 / arrivalRate, 1 / serviceRate); `mean` may be repeated here but must then agree with it.
 * - exponential: SCV 1 (the "M" of Kendall notation)
 * - deterministic: every time equals the mean (SCV 0)
 * - lognormal, gamma: given by mean and squared coefficient of variation `scv` (> 0)
 * - empirical: observed times, drawn with replacement and rescaled so their mean is the mean
 *   implied by the rate (so the shape of a dataset can be reused at another rate)
 */
export const distributionSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('exponential'), mean }).strict(),
  z.object({ kind: z.literal('deterministic'), mean }).strict(),
  z.object({ kind: z.literal('lognormal'), mean, scv }).strict(),
  z.object({ kind: z.literal('gamma'), mean, scv }).strict(),
  z
    .object({
      kind: z.literal('empirical'),
      mean,
      values: z
        .array(z.number({ error: 'values must be numbers' }).nonnegative('values must be 0 or more'))
        .min(1, 'values must hold at least one observed time')
        .max(MAX_EMPIRICAL_VALUES, `values may hold at most ${MAX_EMPIRICAL_VALUES} times`)
        .refine((v) => v.some((x) => x > 0), 'values must not all be 0'),
    })
    .strict(),
], { error: "kind must be one of 'exponential', 'deterministic', 'lognormal', 'gamma', 'empirical'" });

export type DistributionSpec = z.infer<typeof distributionSchema>;
