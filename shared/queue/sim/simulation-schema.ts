import { z } from 'zod';
import { distributionSchema } from './distribution-schema';

/** Limits shared by forms and the server. */
export const SIMULATION_LIMITS = {
  maxServers: 10_000,
  maxReplications: 1_000,
  maxBatches: 1_000,
  /** Customers (expected customers for a time horizon) in one replication or batch, at least. */
  minCustomersPerSample: 100,
  /** Customers (expected, for a time horizon) over the whole run, warm-up included, at most. */
  maxCustomersTotal: 200_000_000,
} as const;

const count = (what: string, min: number, max: number) =>
  z
    .number({ error: `${what} must be a number` })
    .int(`${what} must be a whole number`)
    .min(min, `${what} must be at least ${min}`)
    .max(max, `${what} must be at most ${max}`);
const rate = (what: string) => z.number({ error: `${what} must be a number` }).positive(`${what} must be greater than 0`);

/**
 * Input of `simulate`. Names match the analytic engine: rates per unit of time (any unit, used
 * consistently), `servers` c, `capacity` K = total room (waiting + in service, K ≥ c; absent =
 * unlimited), `patienceRate` θ of exponential patience (absent or 0 = nobody abandons), `t` the
 * service-level threshold in the same time unit. `horizon` and `warmup` count customers or time
 * units per replication (or for the whole batch-means run), as `horizonUnit` says.
 */
export const simulationInputSchema = z
  .object({
    arrivalRate: rate('arrivalRate'),
    serviceRate: rate('serviceRate'),
    servers: count('servers', 1, SIMULATION_LIMITS.maxServers),
    capacity: z.number({ error: 'capacity must be a number' }).int('capacity must be a whole number').positive('capacity must be greater than 0').optional(),
    patienceRate: z.number({ error: 'patienceRate must be a number' }).nonnegative('patienceRate must be 0 or more').optional(),
    t: z.number({ error: 't must be a number' }).nonnegative('t must be 0 or more').optional(),
    arrival: distributionSchema.default({ kind: 'exponential' }),
    service: distributionSchema.default({ kind: 'exponential' }),
    seed: z.number({ error: 'seed must be a number' }).int('seed must be a whole number').min(0, 'seed must be 0 or more').max(0xffffffff, 'seed must fit in 32 bits').default(1),
    horizonUnit: z.enum(['customers', 'time'], { error: "horizonUnit must be 'customers' or 'time'" }).default('customers'),
    horizon: rate('horizon'),
    warmup: z.number({ error: 'warmup must be a number' }).nonnegative('warmup must be 0 or more').optional(),
    method: z.enum(['replications', 'batch-means'], { error: "method must be 'replications' or 'batch-means'" }).default('replications'),
    replications: count('replications', 2, SIMULATION_LIMITS.maxReplications).default(10),
    batches: count('batches', 2, SIMULATION_LIMITS.maxBatches).default(20),
  })
  .strict()
  .superRefine((v, ctx) => {
    if (v.capacity !== undefined && v.capacity < v.servers) {
      ctx.addIssue({ code: 'custom', path: ['capacity'], message: 'capacity (total room K) must be at least servers' });
    }
    if (v.horizonUnit === 'customers') {
      if (!Number.isInteger(v.horizon)) ctx.addIssue({ code: 'custom', path: ['horizon'], message: 'horizon must be a whole number of customers' });
      if (v.warmup !== undefined && !Number.isInteger(v.warmup)) ctx.addIssue({ code: 'custom', path: ['warmup'], message: 'warmup must be a whole number of customers' });
    }
    for (const side of ['arrival', 'service'] as const) {
      const m = v[side].mean;
      const implied = 1 / (side === 'arrival' ? v.arrivalRate : v.serviceRate);
      if (m !== undefined && Math.abs(m - implied) > 1e-9 * implied) {
        ctx.addIssue({ code: 'custom', path: [side, 'mean'], message: `mean contradicts ${side}Rate (expected ${implied})` });
      }
    }
    const samples = v.method === 'replications' ? 1 : v.batches;
    const perSample = (v.horizonUnit === 'customers' ? v.horizon : v.horizon * v.arrivalRate) / samples;
    if (perSample < SIMULATION_LIMITS.minCustomersPerSample) {
      ctx.addIssue({ code: 'custom', path: ['horizon'], message: `horizon must give at least ${SIMULATION_LIMITS.minCustomersPerSample} customers per ${v.method === 'replications' ? 'replication' : 'batch'}` });
    }
    const runs = v.method === 'replications' ? v.replications : 1;
    const warm = v.warmup ?? v.horizon / 10;
    const total = runs * (v.horizonUnit === 'customers' ? v.horizon + warm : (v.horizon + warm) * v.arrivalRate);
    if (total > SIMULATION_LIMITS.maxCustomersTotal) {
      ctx.addIssue({ code: 'custom', path: ['horizon'], message: `the run would simulate about ${Math.round(total)} customers; at most ${SIMULATION_LIMITS.maxCustomersTotal} are allowed` });
    }
  });

/** What callers may pass (defaults not yet applied). */
export type SimulationInput = z.input<typeof simulationInputSchema>;
/** The input after validation, defaults applied. */
export type SimulationSpec = z.output<typeof simulationInputSchema>;
