import pmf from '@stdlib/stats-base-dists-poisson-pmf';
import { describe, expect, it } from 'vitest';
import { expectRel } from '../testing/expect-close';
import { logPoissonPmf, poissonPmf, poissonPmfArray } from './poisson';

describe('Poisson pmf (Loader)', () => {
  // Source: @stdlib/stats-base-dists-poisson-pmf.
  it.each([
    [0, 0.3],
    [3, 2.5],
    [15, 15],
    [16, 20],
    [40, 35.5],
    [100, 90],
    [600, 620],
    [10_000, 9_990],
  ])('pmf(%i; %f) matches @stdlib', (k, x) => {
    expectRel(poissonPmf(k, x), pmf(k, x), 1e-11);
  });

  it('gives logs where the probability itself underflows', () => {
    // ln pmf(10; 10000) = −10000 + 10 ln 10000 − ln 10!
    const expected = -10000 + 10 * Math.log(10000) - Math.log(3628800);
    expectRel(logPoissonPmf(10, 10000), expected, 1e-13);
    expect(poissonPmf(10, 10000)).toBe(0);
  });

  it('builds arrays that agree with single values and sum to about 1', () => {
    const arr = poissonPmfArray(200, 50);
    for (const k of [0, 10, 50, 120, 200]) expectRel(arr[k], poissonPmf(k, 50), 1e-12);
    expectRel(arr.reduce((s, p) => s + p, 0), 1, 1e-12);
  });
});
