import { describe, expect, it } from 'vitest';
import { createRng } from './rng';
import { createSampler } from './samplers';
import type { DistributionSpec } from './distribution-schema';

function moments(spec: DistributionSpec, mean: number, n = 200_000): { mean: number; scv: number } {
  const draw = createSampler(spec, mean, createRng(123));
  let s = 0, s2 = 0;
  for (let i = 0; i < n; i++) {
    const x = draw();
    s += x;
    s2 += x * x;
  }
  const m = s / n;
  return { mean: m, scv: (s2 / n - m * m) / (m * m) };
}

describe('createRng', () => {
  it('repeats a sequence for the same seed and stream, and differs across streams', () => {
    const a = createRng(5, 0), b = createRng(5, 0), c = createRng(5, 1);
    const xs = Array.from({ length: 5 }, () => a.nextUint32());
    expect(Array.from({ length: 5 }, () => b.nextUint32())).toEqual(xs);
    expect(Array.from({ length: 5 }, () => c.nextUint32())).not.toEqual(xs);
  });

  it('draws uniforms strictly inside (0, 1) with even deciles (chi-square, 9 d.f., 0.999 point 27.9; from memory)', () => {
    const rng = createRng(99);
    const bins = new Array(10).fill(0);
    const n = 100_000;
    for (let i = 0; i < n; i++) {
      const u = rng.next();
      expect(u > 0 && u < 1).toBe(true);
      bins[Math.floor(u * 10)]++;
    }
    const chi2 = bins.reduce((acc, b) => acc + (b - n / 10) ** 2 / (n / 10), 0);
    expect(chi2).toBeLessThan(27.9);
  });
});

describe('createSampler: mean and SCV of each kind', () => {
  it.each([
    [{ kind: 'exponential' } as const, 2, 1],
    [{ kind: 'deterministic' } as const, 2, 0],
    [{ kind: 'gamma', scv: 0.25 } as const, 3, 0.25],
    [{ kind: 'gamma', scv: 4 } as const, 3, 4],
    [{ kind: 'lognormal', scv: 0.5 } as const, 0.5, 0.5],
    [{ kind: 'lognormal', scv: 2 } as const, 0.5, 2],
  ])('%o with mean %d has SCV %d', (spec, mean, scv) => {
    const m = moments(spec, mean);
    expect(m.mean).toBeCloseTo(mean, 1);
    expect(Math.abs(m.scv - scv)).toBeLessThan(0.1 * Math.max(scv, 1));
  });

  it('rescales empirical values to the mean implied by the rate', () => {
    const m = moments({ kind: 'empirical', values: [1, 2, 3, 6] }, 6);
    expect(m.mean).toBeCloseTo(6, 1);
  });
});
