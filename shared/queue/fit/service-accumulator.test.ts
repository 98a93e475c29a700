import kstest from '@stdlib/stats-kstest';
import { describe, expect, it } from 'vitest';
import { QueueError } from '../errors';
import { createRng } from '../sim/rng';
import { createSampler } from '../sim/samplers';
import { createServiceAccumulator } from './service-accumulator';

function fitOf(kind: 'exponential' | 'lognormal', n: number, mean: number, seed: number, options = {}) {
  const draw = createSampler(kind === 'exponential' ? { kind } : { kind, scv: 0.25 }, mean, createRng(seed));
  const acc = createServiceAccumulator(options);
  const values: number[] = [];
  for (let i = 0; i < n; i++) {
    const x = draw();
    values.push(x);
    acc.add(x);
  }
  return { fit: acc.result(), values };
}

describe('createServiceAccumulator', () => {
  it('recovers an exponential mean of 180 s within its interval, SCV ≈ 1, exact percentiles, KS not rejected', () => {
    const { fit } = fitOf('exponential', 4000, 180, 1);
    expect(fit.meanInterval.lower).toBeLessThanOrEqual(180);
    expect(fit.meanInterval.upper).toBeGreaterThanOrEqual(180);
    expect(Math.abs(fit.scv - 1)).toBeLessThan(0.15);
    // exponential median = m·ln 2 (textbook identity)
    expect(Math.abs(fit.percentiles.p50 - 180 * Math.LN2)).toBeLessThan(15);
    expect(fit.percentileMethod).toBe('exact');
    expect(fit.goodnessOfFit.rejected).toBe(false);
    expect(fit.warnings).toEqual([]);
    expect(fit.serviceRatePerHour).toBeCloseTo(3600 / fit.meanSeconds, 10);
  });

  it('gives the same KS statistic and p-value as @stdlib/stats-kstest called directly with the sample mean', () => {
    const { fit, values } = fitOf('exponential', 800, 60, 2);
    const mean = values.reduce((a, b) => a + b, 0) / values.length;
    const direct = kstest(values, 'exponential', 1 / mean);
    expect(fit.goodnessOfFit.statistic).toBeCloseTo(direct.statistic, 12);
    expect(fit.goodnessOfFit.pValue).toBeCloseTo(direct.pValue, 12);
    expect(fit.goodnessOfFit.rejected).toBe(direct.rejected);
    expect(fit.goodnessOfFit.note).toMatch(/conservative/);
  });

  it('rejects the exponential for lognormal times of SCV 0.25 and says so in plain words', () => {
    const { fit } = fitOf('lognormal', 2000, 120, 3);
    expect(fit.goodnessOfFit.rejected).toBe(true);
    expect(fit.goodnessOfFit.lillieforsAdjusted.rejected).toBe(true);
    expect(fit.warnings.map((w) => w.code)).toContain('not_exponential');
    expect(fit.scv).toBeCloseTo(0.25, 1);
  });

  it('tests a random subsample of a huge sample and says so; keeps a reservoir past the buffer limit', () => {
    const { fit } = fitOf('exponential', 30_000, 10, 4, { bufferLimit: 10_000, ksMaxSample: 2000 });
    expect(fit.goodnessOfFit.subsampled).toBe(true);
    expect(fit.goodnessOfFit.sampleSize).toBe(2000);
    expect(fit.goodnessOfFit.note).toMatch(/subsample of 2000 of the 10000/);
    expect(fit.percentileMethod).toBe('reservoir sample');
    expect(fit.count).toBe(30_000);
    expect(Math.abs(fit.percentiles.p90 - 10 * Math.log(10))).toBeLessThan(1.5);
  });

  it('builds a histogram whose densities track the fitted exponential density', () => {
    const { fit } = fitOf('exponential', 20_000, 100, 5);
    const h = fit.histogram;
    const mass = h.bins.reduce((s, b) => s + b.density * (b.toSeconds - b.fromSeconds), 0);
    expect(mass + h.overflow / h.basis).toBeCloseTo(1, 10);
    for (const b of h.bins.slice(0, 5)) expect(Math.abs(b.density - b.exponentialDensity) / b.exponentialDensity).toBeLessThan(0.15);
  });

  it('warns about a small sample', () => {
    const { fit } = fitOf('exponential', 12, 60, 6);
    expect(fit.warnings.map((w) => w.code)).toContain('small_sample');
  });

  it('refuses negative or non-finite durations (naming the row), too few values and bad options', () => {
    const acc = createServiceAccumulator();
    acc.add(5);
    expect(() => acc.result()).toThrow(QueueError);
    expect(() => acc.add(-1)).toThrow(expect.objectContaining({ issues: [expect.objectContaining({ path: 'durations.1' })] }));
    expect(() => acc.add(Number.POSITIVE_INFINITY)).toThrow(QueueError);
    const zeros = createServiceAccumulator();
    zeros.add(0);
    zeros.add(0);
    expect(() => zeros.result()).toThrow(QueueError);
    expect(() => createServiceAccumulator({ bufferLimit: 5 })).toThrow(QueueError);
  });
});
