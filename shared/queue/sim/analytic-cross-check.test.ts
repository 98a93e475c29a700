import { describe, expect, it } from 'vitest';
import { erlangA } from '../models/erlang-a';
import { mmc } from '../models/mmc';
import { mmck } from '../models/mmck';
import type { Estimate } from './estimate';
import { simulate } from './simulate';

// Cross-check against the project's analytic engine (exact for these models): each exact value
// must lie inside the simulation's 95 % confidence interval. Seeds fixed once; deterministic. A 95 % interval
// misses now and then by design: over 100 seeds these intervals covered the exact values 94–98 times.
const inside = (e: Estimate | undefined, exact: number | undefined): void => {
  expect(e).toBeDefined();
  expect(exact).toBeDefined();
  expect(exact!, `${exact} outside [${e!.lower}, ${e!.upper}]`).toBeGreaterThanOrEqual(e!.lower - 1e-12);
  expect(exact!).toBeLessThanOrEqual(e!.upper + 1e-12);
};

describe('simulate agrees with the analytic engine', () => {
  it('M/M/5, λ = 4, μ = 1, t = 0.25 (Erlang C)', () => {
    const exact = mmc({ arrivalRate: 4, serviceRate: 1, servers: 5, t: 0.25 } as Parameters<typeof mmc>[0]);
    const r = simulate({ arrivalRate: 4, serviceRate: 1, servers: 5, t: 0.25, horizon: 40_000, seed: 41 });
    inside(r.estimates.wq, exact.Wq);
    inside(r.estimates.lq, exact.Lq);
    inside(r.estimates.probWait, exact.probWait);
    inside(r.estimates.serviceLevel, exact.serviceLevel);
  });

  it('M/M/4/7, λ = 5, μ = 1 (finite room)', () => {
    const exact = mmck({ arrivalRate: 5, serviceRate: 1, servers: 4, capacity: 7 } as Parameters<typeof mmck>[0]);
    const r = simulate({ arrivalRate: 5, serviceRate: 1, servers: 4, capacity: 7, horizon: 30_000, seed: 42 });
    inside(r.estimates.probBlock, exact.probBlock);
    inside(r.estimates.l, exact.L);
    inside(r.estimates.w, exact.W);
  });

  it('M/M/3+M, λ = 3.5, μ = 1, θ = 0.4, t = 0.5 (Erlang-A)', () => {
    const exact = erlangA({ arrivalRate: 3.5, serviceRate: 1, servers: 3, patienceRate: 0.4, t: 0.5 } as Parameters<typeof erlangA>[0]);
    const r = simulate({ arrivalRate: 3.5, serviceRate: 1, servers: 3, patienceRate: 0.4, t: 0.5, horizon: 40_000, seed: 33 });
    inside(r.estimates.wq, exact.Wq);
    inside(r.estimates.probAbandon, exact.probAbandon);
    inside(r.estimates.probWait, exact.probWait);
    inside(r.estimates.serviceLevel, exact.serviceLevel);
  });
});
