import { describe, expect, it } from 'vitest';
import { compute } from '../compute';
import { QueueError } from '../errors';
import type { SweepResult } from '../result';

describe('sweep', () => {
  it('returns long-format rows and per-point errors for unstable points', () => {
    const r = compute({
      model: 'sweep',
      base: { model: 'M/M/c', arrivalRate: 1, serviceRate: 1, servers: 2 },
      parameter: 'arrivalRate',
      from: 0.5,
      to: 2.5,
      steps: 5,
      measures: ['Wq', 'rho'],
    }) as SweepResult;
    expect(r.xs).toEqual([0.5, 1, 1.5, 2, 2.5]);
    expect(r.rows).toHaveLength(6);
    expect(r.rows[0]).toEqual({ x: 0.5, measure: 'Wq', value: expect.any(Number) });
    expect(r.errors.map((e) => [e.x, e.code])).toEqual([
      [2, 'unstable'],
      [2.5, 'unstable'],
    ]);
    expect(r.warnings.map((w) => w.code)).toEqual(['unstable_point']);
  });

  it('varies an array entry by dotted path and reports invalid points', () => {
    const r = compute({
      model: 'sweep',
      base: { model: 'jackson', externalArrivalRates: [1, 0], routing: [[0, 1], [0, 0]], serviceRates: [2, 2], servers: [1, 1] },
      parameter: 'servers.1',
      values: [1, 1.5, 2],
      measures: ['L'],
    }) as SweepResult;
    expect(r.rows.map((row) => row.x)).toEqual([1, 2]);
    expect(r.errors).toEqual([{ x: 1.5, code: 'invalid_input', message: expect.stringContaining('servers.1') }]);
  });

  it('sweeps a solver: servers needed as demand grows', () => {
    const r = compute({
      model: 'sweep',
      base: { model: 'staffing', arrivalRate: 1, serviceRate: 1, criterion: 'serviceLevel', target: 0.8, t: 0.1 },
      parameter: 'arrivalRate',
      values: [10, 100, 1000],
      measures: ['servers'],
    }) as SweepResult;
    const servers = r.rows.map((row) => row.value);
    expect(servers[0]).toBeLessThan(servers[1]);
    expect(servers[1]).toBeLessThan(servers[2]);
  });

  it('refuses a parameter outside the base spec', () => {
    expect(() => compute({ model: 'sweep', base: { model: 'jackson', servers: [1] }, parameter: 'servers.3', values: [1] })).toThrow(QueueError);
  });
});
