/**
 * Zod schemas of every engine spec. The API validates request bodies with them and the editor
 * builds its forms from them (with catalog.ts for labels and units); types come from z.infer.
 */
import { z } from 'zod';
import {
  MAX_CAPACITY,
  MAX_COST,
  MAX_INTERVALS,
  MAX_NODES,
  MAX_RATE,
  MAX_SCV,
  MAX_SERVERS,
  MAX_STATES,
  MAX_SWEEP_POINTS,
  MAX_TIME,
  MIN_RATE,
  ROUTING_TOLERANCE,
} from './limits';

const rate = z
  .number()
  .min(MIN_RATE, `must be a positive rate (at least ${MIN_RATE})`)
  .max(MAX_RATE, `must be at most ${MAX_RATE}`);
/** A rate that may be 0 (no demand in an interval, no external arrivals at a node). */
const rateOrZero = z.number().min(0, 'must not be negative').max(MAX_RATE, `must be at most ${MAX_RATE}`);
const servers = z.number().int('must be a whole number').min(1, 'must be at least 1').max(MAX_SERVERS, `must be at most ${MAX_SERVERS}`);
const duration = z.number().min(0, 'must not be negative').max(MAX_TIME, `must be at most ${MAX_TIME}`);
const scv = z.number().min(0, 'must not be negative').max(MAX_SCV, `must be at most ${MAX_SCV}`);
const cost = z.number().min(0, 'must not be negative').max(MAX_COST, `must be at most ${MAX_COST}`);
const probability = z.number().gt(0, 'must be above 0').lt(1, 'must be below 1');
const state = z.number().int('must be a whole number').min(0, 'must not be negative');

/** Optional measures every waiting model can add: P(N = n), P(Wq ≤ t), a waiting-time percentile. */
const extras = { n: state.optional(), t: duration.optional(), percentile: probability.optional() };

export const Mm1SpecSchema = z.object({ model: z.literal('M/M/1'), arrivalRate: rate, serviceRate: rate, ...extras });

export const MmcSpecSchema = z.object({ model: z.literal('M/M/c'), arrivalRate: rate, serviceRate: rate, servers, ...extras });

export const MmckSpecSchema = z
  .object({
    model: z.literal('M/M/c/K'),
    arrivalRate: rate,
    serviceRate: rate,
    servers,
    capacity: z.number().int('must be a whole number').min(1, 'must be at least 1').max(MAX_CAPACITY, `must be at most ${MAX_CAPACITY}`),
    ...extras,
  })
  .superRefine((s, ctx) => {
    if (s.capacity < s.servers) ctx.addIssue({ code: 'custom', path: ['capacity'], message: 'must be at least the number of servers (K ≥ c)' });
  });

export const MmccSpecSchema = z.object({ model: z.literal('M/M/c/c'), arrivalRate: rate, serviceRate: rate, servers, n: state.optional() });

export const MminfSpecSchema = z.object({ model: z.literal('M/M/inf'), arrivalRate: rate, serviceRate: rate, n: state.optional() });

export const Mg1SpecSchema = z.object({ model: z.literal('M/G/1'), arrivalRate: rate, serviceRate: rate, serviceScv: scv });

export const Md1SpecSchema = z.object({ model: z.literal('M/D/1'), arrivalRate: rate, serviceRate: rate });

export const GgcSpecSchema = z.object({
  model: z.literal('G/G/c'),
  arrivalRate: rate,
  serviceRate: rate,
  servers,
  arrivalScv: scv,
  serviceScv: scv,
});

export const FiniteSourceSpecSchema = z.object({
  model: z.literal('M/M/c//N'),
  /** Arrival rate of each idle source. */
  arrivalRate: rate,
  serviceRate: rate,
  servers,
  population: z.number().int('must be a whole number').min(1, 'must be at least 1').max(MAX_CAPACITY, `must be at most ${MAX_CAPACITY}`),
  ...extras,
});

export const ErlangASpecSchema = z.object({
  model: z.literal('M/M/c+M'),
  arrivalRate: rate,
  serviceRate: rate,
  servers,
  patienceRate: rate,
  ...extras,
});

export const BirthDeathSpecSchema = z
  .object({
    model: z.literal('birth-death'),
    birthRates: z.array(rate).min(1, 'needs at least one rate').max(MAX_STATES, `at most ${MAX_STATES} rates`),
    deathRates: z.array(rate).min(1, 'needs at least one rate').max(MAX_STATES, `at most ${MAX_STATES} rates`),
    n: state.optional(),
  })
  .superRefine((s, ctx) => {
    if (s.birthRates.length !== s.deathRates.length) {
      ctx.addIssue({ code: 'custom', path: ['deathRates'], message: `needs one rate per birth rate (${s.birthRates.length}: μ1…μN)` });
    }
  });

export const JacksonSpecSchema = z
  .object({
    model: z.literal('jackson'),
    externalArrivalRates: z.array(rateOrZero).min(1).max(MAX_NODES),
    routing: z.array(z.array(z.number().min(0, 'must not be negative').max(1, 'must be at most 1'))),
    serviceRates: z.array(rate),
    servers: z.array(servers),
  })
  .superRefine((s, ctx) => {
    const m = s.externalArrivalRates.length;
    if (s.serviceRates.length !== m) ctx.addIssue({ code: 'custom', path: ['serviceRates'], message: `needs ${m} entries, one per node` });
    if (s.servers.length !== m) ctx.addIssue({ code: 'custom', path: ['servers'], message: `needs ${m} entries, one per node` });
    if (s.routing.length !== m) ctx.addIssue({ code: 'custom', path: ['routing'], message: `needs ${m} rows, one per node` });
    s.routing.forEach((row, i) => {
      if (row.length !== m) ctx.addIssue({ code: 'custom', path: ['routing', i], message: `needs ${m} entries, one per node` });
      const sum = row.reduce((acc, p) => acc + p, 0);
      if (sum > 1 + ROUTING_TOLERANCE) ctx.addIssue({ code: 'custom', path: ['routing', i], message: `probabilities add to ${sum}, more than 1` });
    });
    if (!s.externalArrivalRates.some((g) => g > 0)) {
      ctx.addIssue({ code: 'custom', path: ['externalArrivalRates'], message: 'at least one node needs external arrivals' });
    }
  });

export const STAFFING_CRITERIA = ['serviceLevel', 'meanWait', 'blocking', 'utilization', 'abandonment'] as const;
export type StaffingCriterion = (typeof STAFFING_CRITERIA)[number];

/** Fields shared by the staffing solvers; checked together by refineStaffing. */
const staffingFields = {
  serviceRate: rate,
  criterion: z.enum(STAFFING_CRITERIA),
  /** serviceLevel, blocking, abandonment: a probability; utilization: a cap in (0, 1]; meanWait: a time > 0. */
  target: z.number(),
  /** Waiting-time threshold of the service-level criterion. */
  t: duration.optional(),
  /** With a patience rate, serviceLevel and meanWait use M/M/c+M; abandonment needs it. */
  patienceRate: rate.optional(),
};

type StaffingFields = { criterion: StaffingCriterion; target: number; t?: number; patienceRate?: number };

function refineStaffing(s: StaffingFields, ctx: z.RefinementCtx): void {
  const bad = (path: string, message: string): void => ctx.addIssue({ code: 'custom', path: [path], message });
  switch (s.criterion) {
    case 'serviceLevel':
      if (!(s.target > 0 && s.target < 1)) bad('target', 'a service-level target must be between 0 and 1 (exclusive)');
      if (s.t === undefined) bad('t', 'the service-level criterion needs a waiting-time threshold t');
      break;
    case 'meanWait':
      if (!(s.target > 0)) bad('target', 'a mean-wait target must be a positive time');
      break;
    case 'blocking':
    case 'abandonment':
      if (!(s.target > 0 && s.target < 1)) bad('target', 'a probability target must be between 0 and 1 (exclusive)');
      if (s.criterion === 'abandonment' && s.patienceRate === undefined) bad('patienceRate', 'the abandonment criterion needs a patience rate');
      break;
    case 'utilization':
      if (!(s.target > 0 && s.target <= 1)) bad('target', 'a utilisation cap must be above 0 and at most 1');
      break;
  }
}

export const StaffingSpecSchema = z.object({ model: z.literal('staffing'), arrivalRate: rate, ...staffingFields }).superRefine(refineStaffing);

export const CostOptimumSpecSchema = z.object({
  model: z.literal('cost-optimum'),
  arrivalRate: rate,
  serviceRate: rate,
  /** Cost of one server per time unit. */
  serverCost: cost.positive('must be positive'),
  /** Cost of one customer waiting (Lq) or present (L) per time unit. */
  waitingCost: cost,
  costBasis: z.enum(['Lq', 'L']).default('Lq'),
});

export const IntervalStaffingSpecSchema = z
  .object({
    model: z.literal('interval-staffing'),
    arrivalRates: z.array(rateOrZero).min(1, 'needs at least one interval').max(MAX_INTERVALS),
    /** Length of one interval, in the time unit of the rates (optional; used for warnings). */
    intervalLength: duration.positive('must be positive').optional(),
    ...staffingFields,
  })
  .superRefine(refineStaffing);

/** The specs a sweep may vary (every model and solver except a sweep). */
export const BASE_SCHEMAS = {
  'M/M/1': Mm1SpecSchema,
  'M/M/c': MmcSpecSchema,
  'M/M/c/K': MmckSpecSchema,
  'M/M/c/c': MmccSpecSchema,
  'M/M/inf': MminfSpecSchema,
  'M/G/1': Mg1SpecSchema,
  'M/D/1': Md1SpecSchema,
  'G/G/c': GgcSpecSchema,
  'M/M/c//N': FiniteSourceSpecSchema,
  'M/M/c+M': ErlangASpecSchema,
  'birth-death': BirthDeathSpecSchema,
  jackson: JacksonSpecSchema,
  staffing: StaffingSpecSchema,
  'cost-optimum': CostOptimumSpecSchema,
  'interval-staffing': IntervalStaffingSpecSchema,
} as const;

export const SweepSpecSchema = z
  .object({
    model: z.literal('sweep'),
    /** The spec to vary; validated point by point once the parameter is substituted. */
    base: z.looseObject({ model: z.enum(Object.keys(BASE_SCHEMAS) as [keyof typeof BASE_SCHEMAS, ...(keyof typeof BASE_SCHEMAS)[]]) }),
    /** The input to vary: a field name, or a dotted path into an array such as "serviceRates.1". */
    parameter: z.string().min(1),
    from: z.number().optional(),
    to: z.number().optional(),
    steps: z.number().int('must be a whole number').min(2, 'must be at least 2').max(MAX_SWEEP_POINTS, `must be at most ${MAX_SWEEP_POINTS}`).optional(),
    values: z.array(z.number()).min(1).max(MAX_SWEEP_POINTS).optional(),
    /** Measures to keep (default: every numeric measure of the result). */
    measures: z.array(z.string()).optional(),
  })
  .superRefine((s, ctx) => {
    const range = s.from !== undefined || s.to !== undefined || s.steps !== undefined;
    if (s.values === undefined && !(s.from !== undefined && s.to !== undefined && s.steps !== undefined)) {
      ctx.addIssue({ code: 'custom', path: ['values'], message: 'give either values or from, to and steps' });
    } else if (s.values !== undefined && range) {
      ctx.addIssue({ code: 'custom', path: ['values'], message: 'give either values or from, to and steps, not both' });
    }
  });

export const SPEC_SCHEMAS = { ...BASE_SCHEMAS, sweep: SweepSpecSchema } as const;
export type ModelName = keyof typeof SPEC_SCHEMAS;
export const MODEL_NAMES = Object.keys(SPEC_SCHEMAS) as ModelName[];

/** Any engine spec, discriminated by `model`. */
export const QueueSpecSchema = z.discriminatedUnion('model', [
  Mm1SpecSchema,
  MmcSpecSchema,
  MmckSpecSchema,
  MmccSpecSchema,
  MminfSpecSchema,
  Mg1SpecSchema,
  Md1SpecSchema,
  GgcSpecSchema,
  FiniteSourceSpecSchema,
  ErlangASpecSchema,
  BirthDeathSpecSchema,
  JacksonSpecSchema,
  StaffingSpecSchema,
  CostOptimumSpecSchema,
  IntervalStaffingSpecSchema,
  SweepSpecSchema,
]);

export type Mm1Spec = z.infer<typeof Mm1SpecSchema>;
export type MmcSpec = z.infer<typeof MmcSpecSchema>;
export type MmckSpec = z.infer<typeof MmckSpecSchema>;
export type MmccSpec = z.infer<typeof MmccSpecSchema>;
export type MminfSpec = z.infer<typeof MminfSpecSchema>;
export type Mg1Spec = z.infer<typeof Mg1SpecSchema>;
export type Md1Spec = z.infer<typeof Md1SpecSchema>;
export type GgcSpec = z.infer<typeof GgcSpecSchema>;
export type FiniteSourceSpec = z.infer<typeof FiniteSourceSpecSchema>;
export type ErlangASpec = z.infer<typeof ErlangASpecSchema>;
export type BirthDeathSpec = z.infer<typeof BirthDeathSpecSchema>;
export type JacksonSpec = z.infer<typeof JacksonSpecSchema>;
export type StaffingSpec = z.infer<typeof StaffingSpecSchema>;
export type CostOptimumSpec = z.infer<typeof CostOptimumSpecSchema>;
export type IntervalStaffingSpec = z.infer<typeof IntervalStaffingSpecSchema>;
export type SweepSpec = z.infer<typeof SweepSpecSchema>;
export type QueueSpec = z.infer<typeof QueueSpecSchema>;
/** Optional extras of the waiting models. */
export interface MeasureExtras {
  n?: number;
  t?: number;
  percentile?: number;
}
