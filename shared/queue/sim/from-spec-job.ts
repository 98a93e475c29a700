import { z } from 'zod';

/**
 * HTTP contract of a simulation check (POST/GET/DELETE /api/simulations), shared by the API and
 * the web client. It sits beside from-spec.ts because it carries exactly what that file produces.
 */

/** Largest spec accepted, as JSON characters; every simulable spec is a handful of numbers. */
export const MAX_SIMULATION_SPEC_CHARS = 4_000;

export const simulationJobRequestSchema = z
  .object({
    /** The resolved engine spec (numbers, not assumption links); validated by the engine afterwards. */
    spec: z
      .looseObject({ model: z.string().max(40) })
      .refine((s) => JSON.stringify(s).length <= MAX_SIMULATION_SPEC_CHARS, `spec must be at most ${MAX_SIMULATION_SPEC_CHARS} characters of JSON`),
    seed: z.number().int('must be a whole number').min(0, 'must be 0 or more').max(0xffffffff, 'must fit in 32 bits').optional(),
  })
  .strict();
export type SimulationJobRequest = z.infer<typeof simulationJobRequestSchema>;

export const SIMULATION_JOB_STATUSES = ['running', 'done', 'failed', 'cancelled'] as const;
export type SimulationJobStatus = (typeof SIMULATION_JOB_STATUSES)[number];

const estimateSchema = z.object({ mean: z.number(), lower: z.number(), upper: z.number(), halfWidth: z.number(), samples: z.number() });

const simulationResultSchema = z.object({
  model: z.string(),
  method: z.enum(['replications', 'batch-means']),
  seed: z.number(),
  horizonUnit: z.enum(['customers', 'time']),
  horizon: z.number(),
  warmup: z.number(),
  offeredLoad: z.number(),
  rho: z.number(),
  estimates: z.object({
    wq: estimateSchema,
    w: estimateSchema,
    lq: estimateSchema,
    l: estimateSchema,
    probWait: estimateSchema,
    serviceLevel: estimateSchema.optional(),
    probBlock: estimateSchema,
    probAbandon: estimateSchema,
    utilisation: estimateSchema,
    throughput: estimateSchema,
  }),
  customers: z.number(),
  events: z.number(),
  warnings: z.array(z.object({ code: z.string(), message: z.string() })),
});

const comparisonSchema = z.object({
  formulaExact: z.boolean(),
  allInside: z.boolean(),
  measures: z.array(
    z.object({
      measure: z.string(),
      label: z.string(),
      analytic: z.number(),
      mean: z.number(),
      lower: z.number(),
      upper: z.number(),
      halfWidth: z.number(),
      inside: z.boolean(),
    }),
  ),
});

/** A job as GET /api/simulations/:id answers it; `result` and `comparison` only when done. */
export const simulationJobSchema = z.object({
  id: z.string(),
  status: z.enum(SIMULATION_JOB_STATUSES),
  /** Fraction done, 0–1. */
  progress: z.number().min(0).max(1),
  /** ISO 8601. */
  startedAt: z.string(),
  result: simulationResultSchema.optional(),
  comparison: comparisonSchema.optional(),
  error: z.object({ code: z.string(), message: z.string() }).optional(),
});
export type SimulationJob = z.infer<typeof simulationJobSchema>;

export const simulationJobBodySchema = z.object({ job: simulationJobSchema });
