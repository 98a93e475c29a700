import { describe, expect, it } from 'vitest';
import { compute, ENGINE_VERSION, MODEL_CATALOG, MODEL_NAMES, SPEC_SCHEMAS } from './index';

const examples: Record<string, unknown> = {
  'M/M/1': { model: 'M/M/1', arrivalRate: 2, serviceRate: 3 },
  'M/M/c': { model: 'M/M/c', arrivalRate: 2, serviceRate: 3, servers: 2 },
  'M/M/c/K': { model: 'M/M/c/K', arrivalRate: 2, serviceRate: 3, servers: 2, capacity: 5 },
  'M/M/c/c': { model: 'M/M/c/c', arrivalRate: 2, serviceRate: 3, servers: 2 },
  'M/M/inf': { model: 'M/M/inf', arrivalRate: 2, serviceRate: 3 },
  'M/G/1': { model: 'M/G/1', arrivalRate: 2, serviceRate: 3, serviceScv: 0.5 },
  'M/D/1': { model: 'M/D/1', arrivalRate: 2, serviceRate: 3 },
  'G/G/c': { model: 'G/G/c', arrivalRate: 2, serviceRate: 3, servers: 2, arrivalScv: 0.8, serviceScv: 1.2 },
  'M/M/c//N': { model: 'M/M/c//N', arrivalRate: 0.2, serviceRate: 3, servers: 2, population: 10 },
  'M/M/c+M': { model: 'M/M/c+M', arrivalRate: 2, serviceRate: 3, servers: 2, patienceRate: 1 },
  'birth-death': { model: 'birth-death', birthRates: [1, 1], deathRates: [2, 2] },
  jackson: { model: 'jackson', externalArrivalRates: [1], routing: [[0]], serviceRates: [2], servers: [1] },
  staffing: { model: 'staffing', arrivalRate: 20, serviceRate: 1, criterion: 'meanWait', target: 0.05 },
  'cost-optimum': { model: 'cost-optimum', arrivalRate: 20, serviceRate: 1, serverCost: 10, waitingCost: 30 },
  'interval-staffing': { model: 'interval-staffing', arrivalRates: [5, 20], serviceRate: 1, criterion: 'blocking', target: 0.01 },
  sweep: { model: 'sweep', base: { model: 'M/M/1', arrivalRate: 1, serviceRate: 3 }, parameter: 'arrivalRate', values: [1, 2] },
};

describe('public API', () => {
  it('has a semver engine version', () => {
    expect(ENGINE_VERSION).toMatch(/^\d+\.\d+\.\d+$/);
  });

  it.each(MODEL_NAMES)('computes %s with a method and warnings', (model) => {
    const r = compute(examples[model]);
    expect(r.model).toBe(model);
    expect(r.method).toMatchObject({ name: expect.any(String), exact: expect.any(Boolean), reference: expect.any(String) });
    expect(Array.isArray(r.warnings)).toBe(true);
  });

  it.each(MODEL_NAMES)('catalogues %s with fields its schema knows', (model) => {
    const entry = MODEL_CATALOG.find((e) => e.model === model);
    expect(entry).toBeDefined();
    const shape = (SPEC_SCHEMAS[model] as unknown as { shape?: Record<string, unknown> }).shape;
    if (shape) for (const field of entry?.inputs ?? []) expect(Object.keys(shape)).toContain(field.name);
  });
});
