import pmf from '@stdlib/stats-base-dists-poisson-pmf';
import cdf from '@stdlib/stats-base-dists-poisson-cdf';
import { describe, expect, it } from 'vitest';
import { exactErlangB } from '../testing/decimal-reference';
import { expectRel } from '../testing/expect-close';
import { erlangB, erlangC } from './erlang-b';

/** Largest offered load with Erlang B ≤ target, by bisection on the engine's B. */
function maxLoad(servers: number, target: number): number {
  let lo = 0;
  let hi = servers * 2 + 10;
  for (let i = 0; i < 200; i++) {
    const mid = (lo + hi) / 2;
    if (erlangB(servers, mid) <= target) lo = mid;
    else hi = mid;
  }
  return lo;
}

/** Half a unit in the last of three printed significant figures. */
const halfUnit = (printed: number): number => 0.5 * 10 ** (Math.floor(Math.log10(printed)) - 2);

describe('Erlang B', () => {
  // Source: Erlang B table as reprinted in teletraffic engineering handbooks (ITU-D/ITC Teletraffic
  // Engineering Handbook), from memory, 3 significant figures (/work/shared/reference-values.md).
  it.each([
    [1, 0.01, 0.0101],
    [2, 0.01, 0.153],
    [3, 0.01, 0.455],
    [4, 0.01, 0.869],
    [5, 0.01, 1.36],
    [10, 0.01, 4.46],
    [20, 0.01, 12.0],
    [24, 0.01, 15.3],
    [30, 0.01, 20.3],
    [50, 0.01, 37.9],
    [100, 0.01, 84.1],
    [1, 0.02, 0.0204],
    [5, 0.02, 1.66],
    [10, 0.02, 5.08],
    [20, 0.02, 13.2],
    [24, 0.02, 16.6],
    [30, 0.02, 21.9],
    [100, 0.02, 88.0],
    [10, 0.001, 3.09],
  ])('N = %i at B = %f carries %f erlangs (source: Erlang B table, teletraffic handbook, from memory)', (n, b, printed) => {
    expect(Math.abs(maxLoad(n, b) - printed)).toBeLessThanOrEqual(halfUnit(printed) * 1.0001);
  });

  // Source: @stdlib Poisson pmf/cdf, B = pmf(c; a) / cdf(c; a).
  it.each([
    [1, 0.5],
    [5, 3.2],
    [10, 4.46],
    [30, 25],
    [50, 60],
    [100, 84.1],
    [200, 180],
    [500, 400],
    [1000, 950],
  ])('matches pmf(c; a)/cdf(c; a) from @stdlib for c = %i, a = %f', (c, a) => {
    expectRel(erlangB(c, a), pmf(c, a) / cdf(c, a), 1e-9);
  });

  // Source: definition (a^c/c!)/Σ aⁿ/n! in 50-digit arithmetic (decimal.js).
  it.each([
    [10_000, 9_990],
    [10_000, 10_100],
    [5_000, 4_000],
    [1_000, 10],
    [200, 1],
  ])('agrees with 50-digit arithmetic at c = %i, a = %f', (c, a) => {
    expectRel(erlangB(c, a), exactErlangB(c, a), 1e-12);
  });

  it('keeps its digits when C is tiny (not 1 − P(N < c))', () => {
    const c = 200;
    const a = 50;
    const b = exactErlangB(c, a);
    const rho = a / c;
    expectRel(erlangC(c, a), b / (1 - rho * (1 - b)), 1e-12);
    expect(erlangC(c, a)).toBeLessThan(1e-40);
  });
});
