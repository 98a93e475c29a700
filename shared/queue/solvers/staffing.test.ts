import { describe, expect, it } from 'vitest';
import { erlangA } from '../models/erlang-a';
import { mmc } from '../models/mmc';
import { mmcc } from '../models/mmcc';
import { costOptimum } from './cost-optimum';
import { intervalStaffing } from './interval-staffing';
import { staffing } from './staffing';

describe('staffing', () => {
  it.each([
    // Contact-centre practice: 80 % answered within 20 s (common practice); rates per hour.
    [360, 12, 0.8, 20 / 3600],
    [1000, 20, 0.8, 20 / 3600],
    [10_000, 1, 0.9, 0.01],
    [3, 1, 0.95, 0.1],
  ])('finds the fewest servers for a service level: λ = %f, μ = %f, target %f within t = %f', (lam, mu, target, t) => {
    const r = staffing({ arrivalRate: lam, serviceRate: mu, criterion: 'serviceLevel', target, t });
    const below = r.servers - 1 > lam / mu ? (mmc({ arrivalRate: lam, serviceRate: mu, servers: r.servers - 1, t }).serviceLevel as number) : 0;
    expect(below).toBeLessThan(target);
    expect(mmc({ arrivalRate: lam, serviceRate: mu, servers: r.servers, t }).serviceLevel).toBeGreaterThanOrEqual(target);
    expect(r.options.map((o) => o.servers)).toEqual([r.servers - 1, r.servers, r.servers + 1]);
    expect(r.options.map((o) => o.meetsTarget)).toEqual([false, true, true]);
  });

  it('square-root staffing puts β between about 0.5 and 2 for usual targets (common practice)', () => {
    const r = staffing({ arrivalRate: 400, serviceRate: 1, criterion: 'serviceLevel', target: 0.8, t: 20 / 180 });
    expect(r.sqrtStaffingBeta).toBeGreaterThanOrEqual(0.5);
    expect(r.sqrtStaffingBeta).toBeLessThan(2);
  });

  it('meets a mean-wait target', () => {
    const r = staffing({ arrivalRate: 50, serviceRate: 1, criterion: 'meanWait', target: 0.01 });
    expect(mmc({ arrivalRate: 50, serviceRate: 1, servers: r.servers }).Wq).toBeLessThanOrEqual(0.01);
    expect(mmc({ arrivalRate: 50, serviceRate: 1, servers: r.servers - 1 }).Wq).toBeGreaterThan(0.01);
  });

  // Source: Erlang B table (teletraffic handbook), from memory: 10 servers carry 4.46 erlangs at 1 %.
  it('meets a blocking target (source: Erlang B table, from memory)', () => {
    const r = staffing({ arrivalRate: 4.4, serviceRate: 1, criterion: 'blocking', target: 0.01 });
    expect(r.servers).toBe(10);
    expect(mmcc({ arrivalRate: 4.4, serviceRate: 1, servers: 10 }).probBlock).toBeLessThanOrEqual(0.01);
  });

  it('meets a utilisation cap exactly at the boundary', () => {
    expect(staffing({ arrivalRate: 85, serviceRate: 1, criterion: 'utilization', target: 0.85 }).servers).toBe(100);
    expect(staffing({ arrivalRate: 85.0001, serviceRate: 1, criterion: 'utilization', target: 0.85 }).servers).toBe(101);
  });

  it('meets an abandonment target on Erlang-A', () => {
    const r = staffing({ arrivalRate: 100, serviceRate: 1, criterion: 'abandonment', target: 0.02, patienceRate: 1 });
    const at = (c: number): number => erlangA({ arrivalRate: 100, serviceRate: 1, servers: c, patienceRate: 1 }).probAbandon as number;
    expect(at(r.servers)).toBeLessThanOrEqual(0.02);
    expect(at(r.servers - 1)).toBeGreaterThan(0.02);
    expect(r.method.name).toMatch(/Erlang-A/);
  });

  it('warns that Erlang C ignores abandonment', () => {
    const r = staffing({ arrivalRate: 10, serviceRate: 1, criterion: 'serviceLevel', target: 0.8, t: 0.1 });
    expect(r.warnings.map((w) => w.code)).toContain('abandonment_ignored');
  });
});

describe('cost optimum', () => {
  it('matches a brute-force scan of server cost × c + waiting cost × Lq', () => {
    for (const [lam, sc, wc] of [
      [100, 20, 50],
      [5, 10, 100],
      [2, 1, 0.1],
    ]) {
      const r = costOptimum({ arrivalRate: lam, serviceRate: 1, serverCost: sc, waitingCost: wc, costBasis: 'Lq' });
      let best = Infinity;
      let bestC = 0;
      for (let c = Math.floor(lam) + 1; c < lam + 100; c++) {
        const cost = sc * c + wc * (mmc({ arrivalRate: lam, serviceRate: 1, servers: c }).Lq as number);
        if (cost < best) [best, bestC] = [cost, c];
      }
      expect(r.servers).toBe(bestC);
      expect(r.totalCost).toBeCloseTo(best, 9);
    }
  });

  it('charges the whole system with costBasis L', () => {
    const r = costOptimum({ arrivalRate: 5, serviceRate: 1, serverCost: 10, waitingCost: 100, costBasis: 'L' });
    expect(r.waitingCost).toBeCloseTo(100 * (r.measures.L as number), 9);
  });
});

describe('interval staffing', () => {
  it('staffs each interval as its own steady queue and says so', () => {
    const r = intervalStaffing({ arrivalRates: [0, 10, 50, 20], serviceRate: 1, criterion: 'serviceLevel', target: 0.8, t: 0.1, intervalLength: 0.5 });
    expect(r.intervals.map((i) => i.servers)).toEqual([
      0,
      staffing({ arrivalRate: 10, serviceRate: 1, criterion: 'serviceLevel', target: 0.8, t: 0.1 }).servers,
      staffing({ arrivalRate: 50, serviceRate: 1, criterion: 'serviceLevel', target: 0.8, t: 0.1 }).servers,
      staffing({ arrivalRate: 20, serviceRate: 1, criterion: 'serviceLevel', target: 0.8, t: 0.1 }).servers,
    ]);
    expect(r.peakServers).toBe(r.intervals[2].servers);
    expect(r.method.exact).toBe(false);
    expect(r.warnings.map((w) => w.code)).toEqual(['stationary_intervals', 'short_interval']);
  });
});
