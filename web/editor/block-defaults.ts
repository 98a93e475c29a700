import type { ModelName } from '#shared/queue/index';
import type { BlockConfig } from '#shared/schemas/model-block';
import { changeBlockTimeUnit } from './block-time-unit';

/**
 * Starting inputs per model, per hour: a service desk with 120 arrivals an hour and a
 * four-minute mean service (15 an hour per server). Enough to show results the moment a block
 * is inserted; the author replaces them.
 */
export const STARTING_SPECS: Record<Exclude<ModelName, 'sweep'>, Record<string, unknown>> = {
  'M/M/1': { arrivalRate: 12, serviceRate: 15, t: 1 / 30 },
  'M/M/c': { arrivalRate: 120, serviceRate: 15, servers: 10, t: 1 / 30 },
  'M/M/c/K': { arrivalRate: 120, serviceRate: 15, servers: 10, capacity: 20, t: 1 / 30 },
  'M/M/c/c': { arrivalRate: 120, serviceRate: 15, servers: 10 },
  'M/M/inf': { arrivalRate: 120, serviceRate: 15 },
  'M/G/1': { arrivalRate: 12, serviceRate: 15, serviceScv: 0.5 },
  'M/D/1': { arrivalRate: 12, serviceRate: 15 },
  'G/G/c': { arrivalRate: 120, serviceRate: 15, servers: 10, arrivalScv: 1, serviceScv: 0.5 },
  'M/M/c//N': { arrivalRate: 0.5, serviceRate: 15, servers: 3, population: 60 },
  'M/M/c+M': { arrivalRate: 120, serviceRate: 15, servers: 9, patienceRate: 12, t: 1 / 30 },
  'birth-death': { birthRates: [10, 10, 10, 10], deathRates: [5, 10, 15, 20] },
  jackson: { externalArrivalRates: [30, 0], routing: [[0, 0.6], [0.1, 0]], serviceRates: [20, 25], servers: [2, 1] },
  staffing: { arrivalRate: 120, serviceRate: 15, criterion: 'serviceLevel', target: 0.8, t: 1 / 30 },
  'cost-optimum': { arrivalRate: 120, serviceRate: 15, serverCost: 30, waitingCost: 40, costBasis: 'Lq' },
  'interval-staffing': { arrivalRates: [60, 90, 140, 120, 80], intervalLength: 1, serviceRate: 15, criterion: 'serviceLevel', target: 0.8, t: 1 / 30 },
};

/** The chart a new "chart over one input" block starts with: the main measures against servers. */
export const STARTING_CHART = { parameter: 'servers', from: 9, to: 14, steps: 6, measures: ['serviceLevel', 'Wq'] };

/** A fresh block config for a model, keeping title and time unit when the author switches model. */
export function blockForModel(model: Exclude<ModelName, 'sweep'>, previous?: Pick<BlockConfig, 'title' | 'timeUnit'>): BlockConfig {
  const fresh: BlockConfig = { title: previous?.title ?? '', timeUnit: 'hour', spec: { model, ...STARTING_SPECS[model] }, scenarios: [], chart: null };
  // The starting values are per hour; expressed in the author's unit they mean the same.
  return changeBlockTimeUnit(fresh, previous?.timeUnit ?? 'hour');
}

/** A new, unique block id (stable across saves; the server keys results by it). */
export function newBlockId(): string {
  return `b-${crypto.randomUUID()}`;
}
