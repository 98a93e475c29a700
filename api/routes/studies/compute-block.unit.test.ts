import { describe, expect, it } from 'vitest';
import { blockConfigSchema } from '../../../shared/schemas/model-block';
import { computeBlock } from './compute-block';
import { movedMeasures } from './moved-numbers';
import type { RegisterEntry } from './resolve-spec';

const register = (...entries: Omit<RegisterEntry, 'version'>[]) => new Map(entries.map((e) => [e.id, { ...e, version: 1 }]));
const config = (c: unknown) => blockConfigSchema.parse(c);

describe('computeBlock', () => {
  it('converts linked assumptions into the block unit, inverting a duration into a rate', () => {
    // 120 per hour = 2 per minute; a 6-minute service time = a service rate of 1/6 per minute.
    const reg = register({ id: 1, name: 'Peak arrivals', value: 120, unit: 'per_hour' }, { id: 2, name: 'Handling time', value: 6, unit: 'minutes' });
    const out = computeBlock('blockA1', config({ timeUnit: 'minute', spec: { model: 'M/M/c', arrivalRate: { assumption: 1 }, serviceRate: { assumption: 2 }, servers: 15 } }), reg);
    expect(out.status).toBe('ok');
    expect(out.resolvedSpec).toMatchObject({ arrivalRate: 2, servers: 15 });
    expect(out.resolvedSpec!.serviceRate).toBeCloseTo(1 / 6, 12);
    // Offered load λ/μ = 2 × 6 = 12 erlangs (Little's law; from memory).
    expect(out.result!.offeredLoad).toBeCloseTo(12, 10);
    expect(out.assumptionIds).toEqual([1, 2]);
  });

  it("types a solver's target by its criterion, as the browser preview does: 80 % is 0.8, a 20-second wait a duration", () => {
    const reg = register({ id: 4, name: 'Service level target', value: 80, unit: 'percent' }, { id: 5, name: 'Acceptable mean wait', value: 20, unit: 'seconds' });
    const level = computeBlock('blockA1', config({ timeUnit: 'minute', spec: { model: 'staffing', arrivalRate: 10, serviceRate: 1, criterion: 'serviceLevel', target: { assumption: 4 }, t: 0.5 } }), reg);
    expect(level.status).toBe('ok');
    expect(level.resolvedSpec!.target).toBe(0.8);
    const wait = computeBlock('blockA1', config({ timeUnit: 'minute', spec: { model: 'staffing', arrivalRate: 10, serviceRate: 1, criterion: 'meanWait', target: { assumption: 5 } } }), reg);
    expect(wait.status).toBe('ok');
    expect(wait.resolvedSpec!.target).toBeCloseTo(1 / 3, 12);
    // A wait in seconds cannot be a service level: refused naming the input.
    const wrong = computeBlock('blockA1', config({ spec: { model: 'staffing', arrivalRate: 10, serviceRate: 1, criterion: 'serviceLevel', target: { assumption: 5 }, t: 0.5 } }), reg);
    expect(wrong.error!.issues[0].path).toBe('target');
  });

  it('gives the block an error naming the input when a link cannot fit', () => {
    const reg = register({ id: 3, name: 'Agent cost', value: 30, unit: 'currency_per_hour' });
    const out = computeBlock('blockA1', config({ spec: { model: 'M/M/1', arrivalRate: { assumption: 3 }, serviceRate: 4 } }), reg);
    expect(out.status).toBe('error');
    expect(out.error!.issues[0].path).toBe('arrivalRate');
    expect(out.error!.message).toContain('Arrival rate');
    expect(out.error!.message).toContain('Agent cost');
  });

  it('stores engine refusals as the block error', () => {
    const out = computeBlock('blockA1', config({ spec: { model: 'M/M/1', arrivalRate: 5, serviceRate: 4 } }), register());
    expect(out).toMatchObject({ status: 'error', result: null, error: { code: 'unstable' } });
  });

  it('computes scenarios and chart rows with gaps where the model has no answer', () => {
    const out = computeBlock(
      'blockA1',
      config({
        spec: { model: 'M/M/c', arrivalRate: 10, serviceRate: 4, servers: 3 },
        scenarios: [{ label: 'Growth', overrides: { arrivalRate: 11 } }],
        chart: { parameter: 'servers', from: 2, to: 5, steps: 4, measures: ['Wq'] },
      }),
      register(),
    );
    expect(out.scenarios[0].result!.rho).toBeCloseTo(11 / 12, 12);
    expect(out.chart!.map((r) => [r.x, r.value === null])).toEqual([[2, true], [3, false], [4, false], [5, false]]);
  });
});

describe('movedMeasures', () => {
  it('lists the measures that changed, scenarios by label', () => {
    const c = config({ spec: { model: 'M/M/1', arrivalRate: { assumption: 1 }, serviceRate: 4 }, scenarios: [{ label: 'Quiet', overrides: { arrivalRate: 1 } }] });
    const before = computeBlock('blockA1', c, register({ id: 1, name: 'a', value: 2, unit: 'per_hour' }));
    const after = computeBlock('blockA1', c, register({ id: 1, name: 'a', value: 3, unit: 'per_hour' }));
    const moved = movedMeasures(before, after);
    expect(moved).toContainEqual({ measure: 'rho', before: 0.5, after: 0.75 });
    expect(moved.some((m) => m.measure.startsWith('Quiet:'))).toBe(false);
  });
});
