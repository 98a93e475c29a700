import { describe, expect, it } from 'vitest';
import { exactMmck } from '../testing/decimal-reference';
import { expectRel } from '../testing/expect-close';
import { simpson } from '../testing/integrate';
import { mmc } from './mmc';
import { mmck } from './mmck';

describe('M/M/c/K', () => {
  it.each([
    [2, 3, 1, 5],
    [3, 3, 2, 5],
    [12, 1, 10, 15],
    [80, 1, 100, 100],
    [1200, 1, 1000, 1100],
    [999, 1, 1000, 1500],
    [5, 1, 1, 400],
  ])('agrees with 50-digit arithmetic for λ = %f, μ = %f, c = %i, K = %i', (lam, mu, c, K) => {
    const exact = exactMmck(lam, mu, c, K);
    const r = mmck({ arrivalRate: lam, serviceRate: mu, servers: c, capacity: K, n: c });
    expectRel(r.L, exact.L);
    expectRel(r.Lq, exact.Lq);
    expectRel(r.probBlock, exact.probBlock);
    expectRel(r.W, exact.W);
    expectRel(r.p0, exact.p[0]);
    expectRel(r.probN, exact.p[c]);
  });

  it('handles ρ = 1 exactly (uniform above c)', () => {
    // With ρ = 1 and c = 1, all K + 1 states are equally likely: L = K/2.
    const r = mmck({ arrivalRate: 3, serviceRate: 3, servers: 1, capacity: 9 });
    expectRel(r.p0, 0.1, 1e-14);
    expectRel(r.L, 4.5, 1e-14);
    expectRel(r.probBlock, 0.1, 1e-14);
    const exact = exactMmck(6, 2, 3, 20);
    expectRel(mmck({ arrivalRate: 6, serviceRate: 2, servers: 3, capacity: 20 }).Lq, exact.Lq);
  });

  it('tends to M/M/c as K grows, including the waiting-time tail', () => {
    const inf = mmc({ arrivalRate: 9, serviceRate: 1, servers: 10, t: 0.5, percentile: 0.9 });
    const fin = mmck({ arrivalRate: 9, serviceRate: 1, servers: 10, capacity: 2000, t: 0.5, percentile: 0.9 });
    expectRel(fin.Lq, inf.Lq as number, 1e-9);
    expectRel(fin.probWait, inf.probWait as number, 1e-9);
    expectRel(fin.probWqGreaterT, inf.probWqGreaterT as number, 1e-9);
    expectRel(fin.serviceLevel, inf.serviceLevel as number, 1e-9);
    expectRel(fin.wqPercentile, inf.wqPercentile as number, 1e-9);
  });

  it('integrates its waiting-time tail to Wq', () => {
    const spec = { arrivalRate: 14, serviceRate: 1, servers: 10, capacity: 25 };
    const integral = simpson((x) => mmck({ ...spec, t: x }).probWqGreaterT as number, 20, 2000);
    expectRel(integral, mmck(spec).Wq as number, 1e-5);
  });

  it('is never unstable, but warns when overloaded and blocking is high', () => {
    const r = mmck({ arrivalRate: 30, serviceRate: 1, servers: 10, capacity: 12 });
    expect(r.warnings.map((w) => w.code)).toEqual(['overloaded', 'high_blocking']);
    expect(Number.isFinite(r.Wq)).toBe(true);
  });

  it('has no queue when K = c', () => {
    const r = mmck({ arrivalRate: 4.46, serviceRate: 1, servers: 10, capacity: 10, t: 1 });
    expect(r.Lq).toBe(0);
    expect(r.probWqGreaterT).toBe(0);
    expect(r.probBlock).toBeCloseTo(0.01, 4);
  });
});
