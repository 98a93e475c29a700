import Decimal from 'decimal.js';
import { describe, expect, it } from 'vitest';
import { expectRel } from '../testing/expect-close';
import { simpson } from '../testing/integrate';
import { finiteSource } from './finite-source';
import { mmc } from './mmc';

/** Machine-repair distribution by its textbook product form in 50-digit arithmetic (Gross et al. §2.8). */
function exactFiniteSource(lam: number, mu: number, c: number, N: number): number[] {
  const D = Decimal.clone({ precision: 50 });
  const w = [new D(1)];
  for (let n = 1; n <= N; n++) w.push(w[n - 1].times(N - n + 1).times(lam).div(new D(Math.min(n, c)).times(mu)));
  const total = w.reduce((s, x) => s.plus(x), new D(0));
  return w.map((x) => x.div(total).toNumber());
}

describe('M/M/c//N (finite source)', () => {
  it.each([
    [0.1, 1, 2, 20],
    [0.5, 1, 1, 5],
    [0.05, 0.2, 3, 50],
    [0.01, 1, 10, 1000],
  ])('matches the product form in 50-digit arithmetic (λ = %f, μ = %f, c = %i, N = %i)', (lam, mu, c, N) => {
    const exact = exactFiniteSource(lam, mu, c, N);
    const r = finiteSource({ arrivalRate: lam, serviceRate: mu, servers: c, population: N });
    const L = exact.reduce((s, p, n) => s + n * p, 0);
    expectRel(r.L, L, 1e-9);
    expectRel(r.p0, exact[0], 1e-9);
    (r.distribution as number[]).forEach((p, n) => {
      if (exact[n] > 1e-280) expectRel(p, exact[n], 1e-9);
    });
    expectRel(r.effectiveArrivalRate, lam * (N - L), 1e-9);
    expectRel(r.L, (r.effectiveArrivalRate as number) * (r.W as number), 1e-12);
  });

  it('tends to M/M/c when the population is large and Nλ fixed', () => {
    const r = finiteSource({ arrivalRate: 8 / 1e5, serviceRate: 1, servers: 10, population: 100_000, t: 0.2 });
    const m = mmc({ arrivalRate: 8, serviceRate: 1, servers: 10, t: 0.2 });
    // the sources in the system thin the arrivals by about L/N, so agreement is to about 1e-3
    expectRel(r.Lq, m.Lq as number, 5e-3);
    expectRel(r.probWqGreaterT, m.probWqGreaterT as number, 5e-3);
  });

  it('integrates its waiting-time tail to Wq', () => {
    const spec = { arrivalRate: 0.1, serviceRate: 1, servers: 2, population: 20 };
    const integral = simpson((x) => finiteSource({ ...spec, t: x }).probWqGreaterT as number, 40, 2000);
    expectRel(integral, finiteSource(spec).Wq as number, 1e-5);
    expect(finiteSource({ ...spec, t: 0 }).probWqGreaterT).toBeCloseTo(finiteSource(spec).probWait as number, 14);
  });
});
