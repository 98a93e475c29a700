import { describe, expect, it } from 'vitest';
import { compute } from '../compute';
import { QueueError } from '../errors';
import type { ModelResult } from '../result';
import { compareWithAnalytic } from './from-spec-comparison';
import { CHECK_CUSTOMERS, CHECK_REPLICATIONS, simulationInputFromSpec } from './from-spec';
import { simulationInputSchema } from './simulation-schema';
import { simulate } from './simulate';

const queueError = (fn: () => unknown): QueueError => {
  try {
    fn();
  } catch (err) {
    if (err instanceof QueueError) return err;
    throw err;
  }
  throw new Error('expected a QueueError');
};

describe('simulationInputFromSpec', () => {
  it.each([
    [{ model: 'M/M/1', arrivalRate: 2, serviceRate: 3, t: 0.5 }, { servers: 1, t: 0.5 }],
    [{ model: 'M/M/c', arrivalRate: 4, serviceRate: 1, servers: 5 }, { servers: 5 }],
    [{ model: 'M/M/c/K', arrivalRate: 5, serviceRate: 1, servers: 4, capacity: 7 }, { servers: 4, capacity: 7 }],
    [{ model: 'M/M/c/c', arrivalRate: 5, serviceRate: 1, servers: 6 }, { servers: 6, capacity: 6 }],
    [{ model: 'M/M/c+M', arrivalRate: 3.5, serviceRate: 1, servers: 3, patienceRate: 0.4 }, { servers: 3, patienceRate: 0.4 }],
    [{ model: 'M/G/1', arrivalRate: 1, serviceRate: 2, serviceScv: 0 }, { servers: 1, service: { kind: 'deterministic' } }],
    [{ model: 'M/G/1', arrivalRate: 1, serviceRate: 2, serviceScv: 1 }, { service: { kind: 'exponential' } }],
    [{ model: 'M/G/1', arrivalRate: 1, serviceRate: 2, serviceScv: 2.5 }, { service: { kind: 'gamma', scv: 2.5 } }],
    [{ model: 'M/D/1', arrivalRate: 1, serviceRate: 2 }, { servers: 1, service: { kind: 'deterministic' } }],
    [
      { model: 'G/G/c', arrivalRate: 3, serviceRate: 1, servers: 4, arrivalScv: 0.5, serviceScv: 0 },
      { servers: 4, arrival: { kind: 'gamma', scv: 0.5 }, service: { kind: 'deterministic' } },
    ],
  ])('maps %j onto the same queue', (spec, expected) => {
    const input = simulationInputFromSpec(spec);
    expect(input).toMatchObject({ arrivalRate: spec.arrivalRate, serviceRate: spec.serviceRate, ...expected });
    // The simulator accepts what the mapping produces.
    expect(simulationInputSchema.safeParse(input).success).toBe(true);
  });

  it('spends the customer budget over ten replications, warm-up included', () => {
    const input = simulationInputFromSpec({ model: 'M/M/c', arrivalRate: 4, serviceRate: 1, servers: 5 }, { seed: 9 });
    expect(input).toMatchObject({ method: 'replications', replications: CHECK_REPLICATIONS, horizonUnit: 'customers', seed: 9 });
    const total = CHECK_REPLICATIONS * ((input.horizon as number) + (input.warmup as number));
    expect(total).toBeLessThanOrEqual(CHECK_CUSTOMERS);
    expect(total).toBeGreaterThan(0.99 * CHECK_CUSTOMERS);
  });

  it('gives a heavily loaded unbounded queue a longer warm-up', () => {
    const light = simulationInputFromSpec({ model: 'M/M/1', arrivalRate: 1, serviceRate: 2 });
    const heavy = simulationInputFromSpec({ model: 'M/M/1', arrivalRate: 1.9, serviceRate: 2 });
    expect((light.warmup as number) / light.horizon).toBeCloseTo(0.1, 3);
    expect((heavy.warmup as number) / heavy.horizon).toBeCloseTo(0.25, 3);
  });

  it.each(['M/M/c//N', 'jackson', 'birth-death'])('refuses %s with "no simulation for model"', (model) => {
    const specs: Record<string, object> = {
      'M/M/c//N': { model, arrivalRate: 0.1, serviceRate: 1, servers: 2, population: 10 },
      jackson: { model, externalArrivalRates: [1], routing: [[0]], serviceRates: [2], servers: [1] },
      'birth-death': { model, birthRates: [1], deathRates: [2] },
    };
    const err = queueError(() => simulationInputFromSpec(specs[model]));
    expect(err.code).toBe('invalid_input');
    expect(err.message).toContain(`no simulation for model ${model}`);
    expect(err.issues).toEqual([{ path: 'model', message: `no simulation for model ${model}` }]);
  });

  it('reports an invalid spec at the field, as the engine does', () => {
    const err = queueError(() => simulationInputFromSpec({ model: 'M/M/c', arrivalRate: 4, serviceRate: 1, servers: 0 }));
    expect(err.code).toBe('invalid_input');
    expect(err.issues.map((i) => i.path)).toEqual(['servers']);
  });

  it('refuses a service SCV the simulator cannot draw', () => {
    const err = queueError(() => simulationInputFromSpec({ model: 'M/G/1', arrivalRate: 1, serviceRate: 2, serviceScv: 500 }));
    expect(err.issues[0]?.path).toBe('serviceScv');
  });
});

describe('compareWithAnalytic', () => {
  const est = (mean: number, halfWidth: number) => ({ mean, lower: mean - halfWidth, upper: mean + halfWidth, halfWidth, samples: 10 });

  it('says per measure whether the analytic value is inside the interval, and skips what one side lacks', () => {
    const c = compareWithAnalytic(
      { Wq: 0.5, Lq: 2, probBlock: 0, method: { exact: true } },
      { estimates: { wq: est(0.52, 0.03), lq: est(2.2, 0.1), probBlock: { mean: 0, lower: 0, upper: 0, halfWidth: 0, samples: 10 }, l: est(3, 0.1) } },
    );
    expect(c.measures.map((m) => [m.measure, m.inside])).toEqual([
      ['Wq', true],
      ['Lq', false],
      ['probBlock', true],
    ]);
    expect(c.measures[0]).toMatchObject({ label: 'Mean wait in queue Wq', analytic: 0.5, mean: 0.52 });
    expect(c.allInside).toBe(false);
    expect(c.formulaExact).toBe(true);
  });

  it('finds the exact M/M/1 values inside a real run (λ = 2, μ = 3: Wq = 2/3 h)', () => {
    // source: Hillier & Lieberman worked example, from memory; the engine gives the same values.
    const spec = { model: 'M/M/1', arrivalRate: 2, serviceRate: 3, t: 0.5 };
    const analytic = compute(spec) as ModelResult;
    expect(analytic.Wq).toBeCloseTo(2 / 3, 12);
    const c = compareWithAnalytic(analytic, simulate(simulationInputFromSpec(spec, { seed: 7, customers: 300_000 })));
    expect(c.measures.map((m) => m.measure)).toEqual(expect.arrayContaining(['Wq', 'W', 'Lq', 'L', 'probWait', 'serviceLevel', 'serverUtilization']));
    expect(c.measures.find((m) => m.measure === 'Wq')?.inside).toBe(true);
  });
});
