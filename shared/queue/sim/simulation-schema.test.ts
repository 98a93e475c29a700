import { describe, expect, it } from 'vitest';
import { QueueError } from '../errors';
import { simulate } from './simulate';
import type { SimulationInput } from './simulation-schema';

const base: SimulationInput = { arrivalRate: 2, serviceRate: 3, servers: 1, horizon: 1000 };

function issuesOf(input: unknown): { code: string; paths: string[] } {
  try {
    simulate(input as SimulationInput);
  } catch (e) {
    expect(e).toBeInstanceOf(QueueError);
    const q = e as QueueError;
    return { code: q.code, paths: q.issues.map((i) => i.path) };
  }
  throw new Error('expected a QueueError');
}

describe('simulate: invalid input', () => {
  it.each([
    ['a zero arrival rate', { arrivalRate: 0 }, 'arrivalRate'],
    ['a negative service rate', { serviceRate: -1 }, 'serviceRate'],
    ['NaN as a rate', { serviceRate: Number.NaN }, 'serviceRate'],
    ['Infinity as a rate', { arrivalRate: Number.POSITIVE_INFINITY }, 'arrivalRate'],
    ['a fractional server count', { servers: 1.5 }, 'servers'],
    ['zero servers', { servers: 0 }, 'servers'],
    ['too many servers', { servers: 10_001 }, 'servers'],
    ['capacity below servers', { servers: 3, capacity: 2 }, 'capacity'],
    ['a fractional capacity', { capacity: 2.5 }, 'capacity'],
    ['a negative patience rate', { patienceRate: -0.1 }, 'patienceRate'],
    ['a negative service-level threshold', { t: -1 }, 't'],
    ['an unknown distribution kind', { service: { kind: 'weibull' } }, 'service.kind'],
    ['a gamma without scv', { service: { kind: 'gamma' } }, 'service.scv'],
    ['a lognormal with scv 0', { arrival: { kind: 'lognormal', scv: 0 } }, 'arrival.scv'],
    ['an empirical with no values', { service: { kind: 'empirical', values: [] } }, 'service.values'],
    ['an empirical with a negative value', { service: { kind: 'empirical', values: [1, -2] } }, 'service.values.1'],
    ['an empirical of zeros only', { service: { kind: 'empirical', values: [0, 0] } }, 'service.values'],
    ['a mean that contradicts the rate', { service: { kind: 'exponential', mean: 2 } }, 'service.mean'],
    ['a seed that is not a 32-bit integer', { seed: -1 }, 'seed'],
    ['a fractional customer horizon', { horizon: 1000.5 }, 'horizon'],
    ['a horizon too short per batch', { method: 'batch-means', batches: 50, horizon: 1000 }, 'horizon'],
    ['a run too long', { horizon: 1e8, replications: 10 }, 'horizon'],
    ['a negative warm-up', { warmup: -5 }, 'warmup'],
    ['a single replication', { replications: 1 }, 'replications'],
    ['an unknown method', { method: 'bootstrap' }, 'method'],
    ['an unknown horizon unit', { horizonUnit: 'days' }, 'horizonUnit'],
    ['an unknown field', { queueDiscipline: 'LIFO' }, 'queueDiscipline'],
    ['an unknown field inside a distribution', { service: { kind: 'exponential', shape: 2 } }, 'service.shape'],
  ])('refuses %s with invalid_input at its path', (_what, patch, path) => {
    const { code, paths } = issuesOf({ ...base, ...patch });
    expect(code).toBe('invalid_input');
    if (path) expect(paths).toContain(path);
    else expect(paths.length).toBeGreaterThan(0);
  });

  it('reports every issue at once', () => {
    const { paths } = issuesOf({ arrivalRate: -1, serviceRate: 0, servers: 0, horizon: 1000 });
    expect(paths).toEqual(expect.arrayContaining(['arrivalRate', 'serviceRate', 'servers']));
  });

  it('refuses a missing or non-object input', () => {
    expect(issuesOf(undefined).code).toBe('invalid_input');
    expect(issuesOf({ arrivalRate: 1 }).paths).toEqual(expect.arrayContaining(['serviceRate', 'servers', 'horizon']));
  });

  it('refuses ρ ≥ 1 without capacity or patience as unstable, but simulates it with either', () => {
    expect(issuesOf({ ...base, arrivalRate: 3 }).code).toBe('unstable');
    expect(simulate({ ...base, arrivalRate: 3, capacity: 5 }).estimates.probBlock.mean).toBeGreaterThan(0);
    expect(simulate({ ...base, arrivalRate: 3, patienceRate: 1 }).estimates.probAbandon.mean).toBeGreaterThan(0);
  });
});
