import { describe, expect, it } from 'vitest';
import { compute } from '#shared/queue/index';
import type { BlockConfig } from '#shared/schemas/model-block';
import { changeBlockTimeUnit } from './block-time-unit';

const block = (spec: Record<string, unknown>, extra: Partial<BlockConfig> = {}): BlockConfig => ({
  title: 'Desk',
  timeUnit: 'hour',
  spec: { model: String(spec.model), ...spec },
  scenarios: [],
  chart: null,
  ...extra,
});

describe('changeBlockTimeUnit', () => {
  it('converts rates and durations from per hour to per minute', () => {
    const next = changeBlockTimeUnit(block({ model: 'M/M/c', arrivalRate: 120, serviceRate: 15, servers: 10, t: 1 / 30 }), 'minute');
    expect(next.timeUnit).toBe('minute');
    expect(next.spec.arrivalRate).toBeCloseTo(2);
    expect(next.spec.serviceRate).toBeCloseTo(0.25);
    expect(next.spec.t).toBeCloseTo(2);
    expect(next.spec.servers).toBe(10);
  });

  it('keeps the meaning: the service level and utilisation do not move', () => {
    const before = block({ model: 'M/M/c', arrivalRate: 120, serviceRate: 15, servers: 10, t: 1 / 30 });
    const after = changeBlockTimeUnit(before, 'second');
    const a = compute(before.spec) as { serviceLevel: number; rho: number; Wq: number };
    const b = compute(after.spec) as { serviceLevel: number; rho: number; Wq: number };
    expect(b.serviceLevel).toBeCloseTo(a.serviceLevel, 10);
    expect(b.rho).toBeCloseTo(a.rho, 10);
    expect(b.Wq).toBeCloseTo(a.Wq * 3600, 6);
  });

  it('leaves links to assumptions alone (the server converts them)', () => {
    const next = changeBlockTimeUnit(block({ model: 'M/M/1', arrivalRate: { assumption: 4 }, serviceRate: 15 }), 'minute');
    expect(next.spec.arrivalRate).toEqual({ assumption: 4 });
    expect(next.spec.serviceRate).toBeCloseTo(0.25);
  });

  it('converts lists of rates, costs, a mean-wait target, scenario overrides and the chart range', () => {
    const next = changeBlockTimeUnit(
      block(
        { model: 'interval-staffing', arrivalRates: [60, 120], intervalLength: 0.5, serviceRate: 15, criterion: 'meanWait', target: 0.05 },
        { scenarios: [{ label: 'Busy', overrides: { serviceRate: 12 } }], chart: { parameter: 'serviceRate', from: 10, to: 20, steps: 3, measures: ['peakServers'] } },
      ),
      'minute',
    );
    expect(next.spec.arrivalRates).toEqual([1, 2]);
    expect(next.spec.intervalLength).toBeCloseTo(30);
    expect(next.spec.target).toBeCloseTo(3);
    expect(next.scenarios[0].overrides.serviceRate).toBeCloseTo(0.2);
    expect(next.chart).toMatchObject({ from: 10 / 60, to: 20 / 60, steps: 3 });
  });

  it('scales a cost per time unit like a rate', () => {
    const next = changeBlockTimeUnit(block({ model: 'cost-optimum', arrivalRate: 120, serviceRate: 15, serverCost: 30, waitingCost: 60 }), 'minute');
    expect(next.spec.serverCost).toBeCloseTo(0.5);
    expect(next.spec.waitingCost).toBeCloseTo(1);
  });

  it('does not touch a chart over servers', () => {
    const chart = { parameter: 'servers', from: 9, to: 14, steps: 6, measures: ['Wq'] };
    expect(changeBlockTimeUnit(block({ model: 'M/M/c', arrivalRate: 120, serviceRate: 15, servers: 10 }, { chart }), 'day').chart).toEqual(chart);
  });
});
