import { describe, expect, it } from 'vitest';
import { compute } from './compute';
import { QueueError } from './errors';
import { MAX_SERVERS } from './limits';

const mmc = { model: 'M/M/c', arrivalRate: 2, serviceRate: 3, servers: 2 };
const staffing = { model: 'staffing', arrivalRate: 10, serviceRate: 1, criterion: 'serviceLevel', target: 0.8, t: 0.1 };

function errorOf(spec: unknown): QueueError {
  try {
    compute(spec);
  } catch (err) {
    if (err instanceof QueueError) return err;
    throw err;
  }
  throw new Error('expected a QueueError');
}

describe('invalid input gives a typed error naming the field', () => {
  it.each([
    ['a negative rate', { ...mmc, arrivalRate: -1 }, 'arrivalRate'],
    ['a zero rate', { ...mmc, serviceRate: 0 }, 'serviceRate'],
    ['non-integer servers', { ...mmc, servers: 2.5 }, 'servers'],
    ['zero servers', { ...mmc, servers: 0 }, 'servers'],
    ['too many servers', { ...mmc, servers: MAX_SERVERS + 1 }, 'servers'],
    ['K < c', { model: 'M/M/c/K', arrivalRate: 1, serviceRate: 1, servers: 3, capacity: 2 }, 'capacity'],
    ['a percentile of 0', { ...mmc, percentile: 0 }, 'percentile'],
    ['a percentile of 1', { ...mmc, percentile: 1 }, 'percentile'],
    ['a percentile above 1', { ...mmc, percentile: 95 }, 'percentile'],
    ['a negative t', { ...mmc, t: -1 }, 't'],
    ['a negative SCV', { model: 'M/G/1', arrivalRate: 1, serviceRate: 2, serviceScv: -0.1 }, 'serviceScv'],
    ['NaN', { ...mmc, arrivalRate: Number.NaN }, 'arrivalRate'],
    ['Infinity', { ...mmc, arrivalRate: Number.POSITIVE_INFINITY }, 'arrivalRate'],
    ['a string', { ...mmc, servers: '2' }, 'servers'],
    ['a missing field', { model: 'M/M/c', arrivalRate: 2, serviceRate: 3 }, 'servers'],
    ['an unknown model', { model: 'M/M/2' }, 'model'],
    ['no model', { arrivalRate: 1 }, 'model'],
    ['a non-integer state n', { ...mmc, n: 1.5 }, 'n'],
    ['birth and death rates of different lengths', { model: 'birth-death', birthRates: [1, 2], deathRates: [1] }, 'deathRates'],
    ['a routing row above 1', { model: 'jackson', externalArrivalRates: [1, 0], routing: [[0, 0.6], [0.7, 0.4]], serviceRates: [5, 5], servers: [1, 1] }, 'routing.1'],
    ['a routing entry above 1', { model: 'jackson', externalArrivalRates: [1], routing: [[1.5]], serviceRates: [5], servers: [1] }, 'routing.0.0'],
    ['per-node arrays of the wrong length', { model: 'jackson', externalArrivalRates: [1, 0], routing: [[0, 0], [0, 0]], serviceRates: [5], servers: [1, 1] }, 'serviceRates'],
    ['a network nobody can leave', { model: 'jackson', externalArrivalRates: [1, 0], routing: [[0, 1], [1, 0]], serviceRates: [5, 5], servers: [1, 1] }, 'routing'],
    ['a service-level target above 1', { ...staffing, target: 1.2 }, 'target'],
    ['a service-level target without t', { ...staffing, t: undefined }, 't'],
    ['a blocking target of 0', { ...staffing, criterion: 'blocking', target: 0 }, 'target'],
    ['a mean-wait target of 0', { ...staffing, criterion: 'meanWait', target: 0 }, 'target'],
    ['a utilisation cap above 1', { ...staffing, criterion: 'utilization', target: 1.1 }, 'target'],
    ['abandonment without a patience rate', { ...staffing, criterion: 'abandonment', target: 0.05 }, 'patienceRate'],
    ['an unknown criterion', { ...staffing, criterion: 'happiness' }, 'criterion'],
    ['a sweep without a range', { model: 'sweep', base: mmc, parameter: 'servers' }, 'values'],
    ['a sweep of a sweep', { model: 'sweep', base: { model: 'sweep' }, parameter: 'x', values: [1] }, 'base.model'],
  ])('refuses %s', (_what, spec, path) => {
    const e = errorOf(spec);
    expect(e.code).toBe('invalid_input');
    expect(e.issues.map((i) => i.path)).toContain(path);
    expect(e.message.length).toBeGreaterThan(0);
  });

  it('reports every issue at once', () => {
    const e = errorOf({ model: 'M/M/c', arrivalRate: -1, serviceRate: 'x', servers: 0.5 });
    expect(e.issues.map((i) => i.path).sort()).toEqual(['arrivalRate', 'servers', 'serviceRate']);
  });

  it('refuses a non-object spec', () => {
    expect(errorOf(null).code).toBe('invalid_input');
    expect(errorOf([1]).code).toBe('invalid_input');
  });
});

describe('unstable input gives a typed error with ρ and the capacity needed', () => {
  it.each([
    ['M/M/1', { model: 'M/M/1', arrivalRate: 3, serviceRate: 3 }, 1, 2],
    ['M/M/c', { model: 'M/M/c', arrivalRate: 7, serviceRate: 3, servers: 2 }, 7 / 6, 3],
    ['M/G/1', { model: 'M/G/1', arrivalRate: 5, serviceRate: 4, serviceScv: 0.5 }, 1.25, 2],
    ['M/D/1', { model: 'M/D/1', arrivalRate: 13, serviceRate: 12 }, 13 / 12, 2],
    ['G/G/c', { model: 'G/G/c', arrivalRate: 10, serviceRate: 1, servers: 9, arrivalScv: 1, serviceScv: 1 }, 10 / 9, 11],
  ])('%s', (_m, spec, rho, minServers) => {
    const e = errorOf(spec);
    expect(e.code).toBe('unstable');
    expect(e.details?.rho).toBeCloseTo(rho, 12);
    expect(e.details?.minServers).toBe(minServers);
    expect(e.message).toContain('ρ');
    expect(e.toJSON()).toMatchObject({ code: 'unstable', issues: [{ path: expect.any(String) }] });
  });
});
