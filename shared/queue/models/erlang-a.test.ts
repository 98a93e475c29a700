import { describe, expect, it } from 'vitest';
import { QueueError } from '../errors';
import { expectRel } from '../testing/expect-close';
import { simpson } from '../testing/integrate';
import { erlangA } from './erlang-a';
import { mmc } from './mmc';
import { mminf } from './mminf';

describe('M/M/c+M (Erlang-A)', () => {
  it('equals M/M/∞ when patience and service rates are equal (every state leaves at nμ)', () => {
    const r = erlangA({ arrivalRate: 30, serviceRate: 2, servers: 10, patienceRate: 2, n: 12 });
    const inf = mminf({ arrivalRate: 30, serviceRate: 2, n: 12 });
    expectRel(r.L, inf.L as number, 1e-12);
    expectRel(r.p0, inf.p0 as number, 1e-12);
    expectRel(r.probN, inf.probN as number, 1e-12);
  });

  it('tends to M/M/c as the patience rate goes to 0', () => {
    const base = { arrivalRate: 9, serviceRate: 1, servers: 10, t: 0.4, percentile: 0.9 };
    const limit = mmc(base);
    const r = erlangA({ ...base, patienceRate: 1e-9 });
    expectRel(r.Lq, limit.Lq as number, 1e-6);
    expectRel(r.probWait, limit.probWait as number, 1e-6);
    expectRel(r.probWqGreaterT, limit.probWqGreaterT as number, 1e-6);
    expectRel(r.wqPercentile, limit.wqPercentile as number, 1e-6);
    expect(r.probAbandon).toBeLessThan(1e-8);
  });

  it('obeys Little’s law and flow balance: λ(1 − P(abandon)) = μ·busy servers', () => {
    const r = erlangA({ arrivalRate: 120, serviceRate: 1, servers: 100, patienceRate: 0.5 });
    expectRel(r.L, 120 * (r.W as number), 1e-12);
    expectRel(r.Lq, 120 * (r.Wq as number), 1e-12);
    expectRel(r.effectiveArrivalRate, 120 * (1 - (r.probAbandon as number)), 1e-10);
  });

  it('integrates its waiting-time tail to Wq (every arrival, served or not)', () => {
    const spec = { arrivalRate: 11, serviceRate: 1, servers: 10, patienceRate: 0.7 };
    const integral = simpson((x) => erlangA({ ...spec, t: x }).probWqGreaterT as number, 30, 2000);
    expectRel(integral, erlangA(spec).Wq as number, 1e-5);
  });

  it('is stable when overloaded and warns', () => {
    const r = erlangA({ arrivalRate: 200, serviceRate: 1, servers: 100, patienceRate: 2 });
    expect(r.warnings.map((w) => w.code)).toEqual(['overloaded', 'high_abandonment']);
    expect(r.probAbandon).toBeGreaterThan(0.4);
  });

  it('refuses a patience rate so small the truncated chain would be too long', () => {
    expect(() => erlangA({ arrivalRate: 200, serviceRate: 1, servers: 100, patienceRate: 1e-9 })).toThrow(QueueError);
  });
});
