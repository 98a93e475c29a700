import { describe, expect, it } from 'vitest';
import { simulate } from './simulate';
import type { Estimate } from './estimate';
import { birthDeath, erlangC } from './exact-mmc.test-helper';

const inside = (e: Estimate, exact: number): void => {
  // The interval is a 95 % one; these seeds were fixed once, so the check is deterministic.
  expect(exact, `${exact} outside [${e.lower}, ${e.upper}]`).toBeGreaterThanOrEqual(e.lower - 1e-12);
  expect(exact).toBeLessThanOrEqual(e.upper + 1e-12);
};

describe('simulate: M/M/1 and M/M/c against published worked examples', () => {
  it('M/M/1, λ = 2/h, μ = 3/h: Wq = 2/3 h, W = 1 h, Lq = 4/3, L = 2, P(wait) = 0.667, P(Wq > 1/2 h) = 0.404', () => {
    // source: Hillier & Lieberman, emergency-room example (from memory, reference-values.md)
    const r = simulate({ arrivalRate: 2, serviceRate: 3, servers: 1, horizon: 40_000, replications: 10, t: 0.5, seed: 7 });
    inside(r.estimates.wq, 2 / 3);
    inside(r.estimates.w, 1);
    inside(r.estimates.lq, 4 / 3);
    inside(r.estimates.l, 2);
    inside(r.estimates.probWait, 2 / 3);
    inside(r.estimates.serviceLevel!, 1 - 0.404);
    expect(r.estimates.probBlock.mean).toBe(0);
    expect(r.model).toBe('M/M/1');
  });

  it('M/M/2, λ = 2/h, μ = 3/h: Wq = 1/24 h, W = 3/8 h, Lq = 1/12, L = 3/4, P(wait) = 1/6', () => {
    // source: Hillier & Lieberman, two-server case (from memory, reference-values.md)
    const r = simulate({ arrivalRate: 2, serviceRate: 3, servers: 2, horizon: 40_000, replications: 10, seed: 11 });
    inside(r.estimates.wq, 1 / 24);
    inside(r.estimates.w, 3 / 8);
    inside(r.estimates.lq, 1 / 12);
    inside(r.estimates.l, 3 / 4);
    inside(r.estimates.probWait, 1 / 6);
  });

  it('M/M/10 at ρ = 0.85 by batch means matches Erlang C (closed form computed in the test)', () => {
    const lambda = 8.5, mu = 1, c = 10, t = 0.2;
    const ex = birthDeath(lambda, mu, c, 4000, 0); // K far out ≈ unlimited
    const ec = erlangC(lambda, mu, c, t);
    const r = simulate({ arrivalRate: lambda, serviceRate: mu, servers: c, horizon: 400_000, method: 'batch-means', batches: 20, warmup: 5000, t, seed: 3 });
    inside(r.estimates.wq, ex.wq);
    inside(r.estimates.lq, ex.lq);
    inside(r.estimates.probWait, ec.probWait);
    inside(r.estimates.serviceLevel!, ec.serviceLevel);
    inside(r.estimates.utilisation, 0.85);
  });
});

describe('simulate: finite room and abandonment', () => {
  it('M/M/3/6 matches the birth–death stationary distribution, blocking included', () => {
    const ex = birthDeath(4, 1.5, 3, 6, 0);
    const r = simulate({ arrivalRate: 4, serviceRate: 1.5, servers: 3, capacity: 6, horizon: 30_000, seed: 5 });
    expect(r.model).toBe('M/M/3/6');
    for (const k of ['wq', 'w', 'lq', 'l', 'probWait', 'probBlock', 'utilisation'] as const) inside(r.estimates[k], ex[k]);
  });

  it('M/M/2+M matches its birth–death chain (probAbandon = θ·Lq/λ), even with ρ > 1', () => {
    const ex = birthDeath(3, 1, 2, 400, 0.5);
    const r = simulate({ arrivalRate: 3, serviceRate: 1, servers: 2, patienceRate: 0.5, horizon: 30_000, seed: 9 });
    expect(r.model).toBe('M/M/2+M');
    for (const k of ['wq', 'lq', 'l', 'probWait', 'probAbandon'] as const) inside(r.estimates[k], ex[k]);
  });

  it('M/M/1+M overloaded 100-fold keeps about 2000 waiting (the waiting line grows past its first buffer)', () => {
    const ex = birthDeath(100, 1, 1, 6000, 0.05);
    const r = simulate({ arrivalRate: 100, serviceRate: 1, servers: 1, patienceRate: 0.05, horizon: 30_000, warmup: 20_000, seed: 12 });
    expect(r.estimates.lq.mean).toBeGreaterThan(1500);
    for (const k of ['lq', 'probAbandon'] as const) inside(r.estimates[k], ex[k]);
  });

  it('Little’s law holds inside the simulation: L ≈ λ·W for M/M/c/K (λ admitted)', () => {
    const r = simulate({ arrivalRate: 5, serviceRate: 1, servers: 4, capacity: 8, horizon: 20_000, seed: 2 });
    const admitted = 5 * (1 - r.estimates.probBlock.mean);
    expect(r.estimates.l.mean).toBeCloseTo(admitted * r.estimates.w.mean, 1);
  });
});

describe('simulate: general distributions', () => {
  it('M/D/1, λ = 8/h, μ = 12/h: Lq = 0.667, Wq = 0.0833 h', () => {
    // source: Render, Stair & Hanna, constant-service example (from memory, reference-values.md)
    const r = simulate({ arrivalRate: 8, serviceRate: 12, servers: 1, service: { kind: 'deterministic' }, horizon: 40_000, seed: 4 });
    expect(r.model).toBe('M/D/1');
    inside(r.estimates.lq, 2 / 3);
    inside(r.estimates.wq, 1 / 12);
  });

  it('M/G/1 with gamma and lognormal service of SCV 2 matches Pollaczek–Khinchine Wq = ρ(1+SCV)/(2μ(1−ρ))', () => {
    // source: Pollaczek–Khinchine mean-value formula (from memory)
    const pk = (0.6 * 3) / (2 * 1 * 0.4);
    for (const kind of ['gamma', 'lognormal'] as const) {
      const r = simulate({ arrivalRate: 0.6, serviceRate: 1, servers: 1, service: { kind, scv: 2 }, horizon: 60_000, replications: 12, seed: 21 });
      expect(r.model).toBe('M/G/1');
      inside(r.estimates.wq, pk);
    }
  });

  it('an empirical service distribution with exponential-looking values behaves like M/M/1', () => {
    const values = Array.from({ length: 2000 }, (_, i) => -Math.log((i + 0.5) / 2000)); // exponential quantiles, mean ≈ 1
    const r = simulate({ arrivalRate: 2, serviceRate: 3, servers: 1, service: { kind: 'empirical', values }, horizon: 40_000, seed: 8 });
    inside(r.estimates.wq, 2 / 3);
  });

  it('D/D/1 with ρ < 1 never waits', () => {
    const r = simulate({ arrivalRate: 1, serviceRate: 2, servers: 1, arrival: { kind: 'deterministic' }, service: { kind: 'deterministic' }, horizon: 1000 });
    expect(r.estimates.wq.mean).toBe(0);
    expect(r.estimates.probWait.mean).toBe(0);
    expect(r.estimates.utilisation.mean).toBeCloseTo(0.5, 6);
  });
});

describe('simulate: reproducibility, progress and cancellation', () => {
  const input = { arrivalRate: 2, serviceRate: 3, servers: 2, horizon: 5000, seed: 42 };

  it('gives the same answer for the same seed and a different one for another seed', () => {
    expect(simulate(input)).toEqual(simulate(input));
    expect(simulate({ ...input, seed: 43 }).estimates.wq.mean).not.toBe(simulate(input).estimates.wq.mean);
  });

  it('measures over a time horizon too', () => {
    const r = simulate({ arrivalRate: 2, serviceRate: 3, servers: 1, horizonUnit: 'time', horizon: 20_000, warmup: 100, seed: 6 });
    inside(r.estimates.l, 2);
    expect(r.customers).toBeGreaterThan(10 * 2 * 20_000 * 0.95);
  });

  it('reports rising progress ending at 1 and stops when asked', async () => {
    const seen: number[] = [];
    simulate(input, { onProgress: (f) => seen.push(f), checkEvery: 1024 });
    expect(seen.length).toBeGreaterThan(5);
    expect([...seen].sort((a, b) => a - b)).toEqual(seen);
    expect(seen.at(-1)).toBe(1);
    let polls = 0;
    const { SimulationStoppedError } = await import('./simulation-stopped-error');
    expect(() => simulate(input, { shouldStop: () => ++polls > 3, checkEvery: 1024 })).toThrow(SimulationStoppedError);
  });
});
