import { describe, expect, it } from 'vitest';
import { QueueError } from '../errors';
import { exactMmc } from '../testing/decimal-reference';
import { expectRel } from '../testing/expect-close';
import { mm1 } from './mm1';
import { mmc } from './mmc';

// Source: Hillier & Lieberman, Introduction to Operations Research, queueing chapter, emergency-room
// example (λ = 2, μ = 3 per hour), from memory; printed to 3 decimals where not a fraction.
describe('M/M/1 and M/M/c against published examples', () => {
  const one = mm1({ arrivalRate: 2, serviceRate: 3 });
  const two = mmc({ arrivalRate: 2, serviceRate: 3, servers: 2 });
  it.each([
    ['one server P0', one.p0, 1 / 3, 1e-12],
    ['one server Lq', one.Lq, 4 / 3, 1e-12],
    ['one server L', one.L, 2, 1e-12],
    ['one server Wq', one.Wq, 2 / 3, 1e-12],
    ['one server W', one.W, 1, 1e-12],
    ['one server P(Wq > 0)', one.probWait, 0.667, 5e-4],
    ['one server P(Wq > 1/2)', mm1({ arrivalRate: 2, serviceRate: 3, t: 0.5 }).probWqGreaterT, 0.404, 1.5e-3],
    ['one server P(Wq > 1)', mm1({ arrivalRate: 2, serviceRate: 3, t: 1 }).probWqGreaterT, 0.245, 2e-3],
    ['two servers P0', two.p0, 1 / 2, 1e-12],
    ['two servers Lq', two.Lq, 1 / 12, 1e-12],
    ['two servers L', two.L, 3 / 4, 1e-12],
    ['two servers Wq', two.Wq, 1 / 24, 1e-12],
    ['two servers W', two.W, 3 / 8, 1e-12],
    ['two servers P(Wq > 0)', two.probWait, 0.167, 2e-3],
  ])('%s (source: Hillier & Lieberman, from memory)', (_name, actual, expected, tol) => {
    expectRel(actual as number, expected, tol);
  });

  it('two servers P(Wq > 1 h) = 0.003 (source: Hillier & Lieberman, from memory)', () => {
    const r = mmc({ arrivalRate: 2, serviceRate: 3, servers: 2, t: 1 });
    expect((r.probWqGreaterT as number).toFixed(3)).toBe('0.003');
  });

  // Source: Render, Stair & Hanna, Quantitative Analysis for Management, repair-shop example, from memory.
  it.each([
    [0, 0.667],
    [1, 0.444],
    [2, 0.296],
    [3, 0.198],
    [4, 0.132],
    [5, 0.088],
    [7, 0.039],
  ])('P(more than %i in system) = %f (source: Render, Stair & Hanna, from memory)', (k, printed) => {
    let below = 0;
    for (let n = 0; n <= k; n++) below += mm1({ arrivalRate: 2, serviceRate: 3, n }).probN as number;
    expect(Math.abs(1 - below - printed)).toBeLessThanOrEqual(0.0005 + 1e-12);
  });

  it.each([
    ['P0', two.p0, 0.5, 0.005],
    ['L', two.L, 0.75, 0.005],
    ['W in minutes', (two.W as number) * 60, 22.5, 0.05],
    ['Lq', two.Lq, 0.083, 0.0005],
    ['Wq in minutes', (two.Wq as number) * 60, 2.5, 0.05],
  ])('two servers %s (source: Render, Stair & Hanna, from memory)', (_n, actual, printed, halfUnit) => {
    expect(Math.abs((actual as number) - printed)).toBeLessThanOrEqual(halfUnit);
  });
});

describe('M/M/c against 50-digit arithmetic', () => {
  it.each([
    [2, 3, 2],
    [9.5, 1, 10],
    [45, 0.5, 100],
    [99.9, 1, 100],
    [50, 1, 200],
    [950, 1, 1000],
    [999, 1, 1000],
    [600, 2, 301],
  ])('λ = %f, μ = %f, c = %i', (lam, mu, c) => {
    const exact = exactMmc(lam, mu, c);
    const r = mmc({ arrivalRate: lam, serviceRate: mu, servers: c, n: Math.floor(c / 2) });
    expectRel(r.probWait, exact.C);
    expectRel(r.Lq, exact.Lq);
    expectRel(r.Wq, exact.Wq);
    expectRel(r.L, exact.L);
    expectRel(r.p0, exact.p0);
    expectRel(r.probN, exact.probN(Math.floor(c / 2)));
    const above = mmc({ arrivalRate: lam, serviceRate: mu, servers: c, n: c + 7 });
    expectRel(above.probN, exact.probN(c + 7));
  });

  it('holds 1e-9 at c = 10,000 and ρ = 0.999', () => {
    const exact = exactMmc(9990, 1, 10_000);
    const r = mmc({ arrivalRate: 9990, serviceRate: 1, servers: 10_000, n: 9_990 });
    expectRel(r.probWait, exact.C);
    expectRel(r.Lq, exact.Lq);
    expectRel(r.probN, exact.probN(9_990));
  });
});

describe('M/M/c waiting-time distribution', () => {
  it('P(Wq > t) = C·exp(−(cμ − λ)t) and the percentile inverts it', () => {
    const r = mmc({ arrivalRate: 8, serviceRate: 1, servers: 10, t: 0.3, percentile: 0.95 });
    expectRel(r.probWqGreaterT, (r.probWait as number) * Math.exp(-2 * 0.3), 1e-14);
    expectRel((r.serviceLevel as number) + (r.probWqGreaterT as number), 1, 1e-14);
    const x = r.wqPercentile as number;
    const at = mmc({ arrivalRate: 8, serviceRate: 1, servers: 10, t: x });
    expectRel(at.serviceLevel, 0.95, 1e-12);
  });

  it('gives percentile 0 when the no-wait mass covers it', () => {
    const r = mmc({ arrivalRate: 1, serviceRate: 1, servers: 5, percentile: 0.5 });
    expect(r.wqPercentile).toBe(0);
  });

  it('refuses ρ ≥ 1 with the servers stability needs', () => {
    try {
      mmc({ arrivalRate: 10, serviceRate: 1, servers: 10 });
      expect.unreachable();
    } catch (err) {
      expect(err).toBeInstanceOf(QueueError);
      const e = err as QueueError;
      expect(e.code).toBe('unstable');
      expect(e.details).toMatchObject({ rho: 1, minServers: 11 });
      expect(e.issues[0].path).toBe('servers');
    }
  });

  it('warns above 85 % and in heavy traffic', () => {
    expect(mmc({ arrivalRate: 9, serviceRate: 1, servers: 10 }).warnings.map((w) => w.code)).toEqual(['high_utilisation']);
    expect(mmc({ arrivalRate: 9.9, serviceRate: 1, servers: 10 }).warnings.map((w) => w.code)).toEqual(['heavy_traffic']);
  });
});
