import { z } from 'zod';
import { invalidInput } from '../errors';
import { createRng } from '../sim/rng';
import { parseOrThrow } from '../sim/zod-to-queue-error';
import { testExponential, KS_MAX_SAMPLE, type ExponentialTest } from './exponential-test';
import type { FitWarning } from './fit-warning';
import { buildHistogram, type ServiceHistogram } from './service-histogram';

/** A p-value as a reader takes it: below 0.001 it is just that (the test cannot tell more). */
const pText = (p: number): string => (p < 0.001 ? 'p < 0.001' : `p = ${p.toPrecision(2)}`);

/** Options of createServiceAccumulator. */
export const serviceOptionsSchema = z
  .object({
    /** Values kept for exact percentiles; past it a uniform reservoir of this size is kept. */
    bufferLimit: z.number().int().min(1000).max(20_000_000).default(2_000_000),
    /** Largest sample for the KS test (random subsample beyond). */
    ksMaxSample: z.number().int().min(50).max(100_000).default(KS_MAX_SAMPLE),
    /** Seed of the reservoir and of the KS subsample, so a refit gives the same answer. */
    seed: z.number().int().min(0).max(0xffffffff).default(1),
  })
  .strict();

export interface ServiceFit {
  count: number;
  meanSeconds: number;
  /** 95 % interval of the mean by the normal approximation (central limit theorem): mean ± 1.96·s/√n. */
  meanInterval: { lower: number; upper: number; method: 'normal approximation' };
  sdSeconds: number;
  /** Squared coefficient of variation s²/mean² (1 for exponential times, 0 for constant ones). */
  scv: number;
  /** 3600 / mean: services per hour by one server. */
  serviceRatePerHour: number;
  minSeconds: number;
  maxSeconds: number;
  percentiles: { p50: number; p80: number; p90: number; p95: number; p99: number };
  /**
   * 'exact': all values kept, linear interpolation between order statistics (Hyndman & Fan type 7).
   * 'reservoir sample': past bufferLimit values, percentiles of a uniform random sample of that size
   * (reservoir sampling, Vitter's Algorithm R); mean, SCV, min and max stay exact.
   */
  percentileMethod: 'exact' | 'reservoir sample';
  goodnessOfFit: ExponentialTest;
  histogram: ServiceHistogram;
  warnings: FitWarning[];
}

export interface ServiceAccumulator {
  /** Adds one service time in seconds (finite, ≥ 0). */
  add(durationSeconds: number): void;
  readonly count: number;
  /** The fit; needs at least 2 times, not all 0. */
  result(): ServiceFit;
}

function quantile(sorted: Float64Array, p: number): number {
  const h = (sorted.length - 1) * p;
  const lo = Math.floor(h);
  const hi = Math.min(sorted.length - 1, lo + 1);
  return sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo]);
}

/**
 * Streams service durations (seconds): exact mean and variance by Welford's method, exact min and
 * max, and a bounded buffer for percentiles, the histogram and the exponential test.
 */
export function createServiceAccumulator(options: z.input<typeof serviceOptionsSchema> = {}): ServiceAccumulator {
  const opts = parseOrThrow(serviceOptionsSchema, options, 'service fitting options');
  const rng = createRng(opts.seed);
  let buffer = new Float64Array(Math.min(opts.bufferLimit, 65_536));
  let kept = 0;
  let n = 0, mean = 0, m2 = 0, min = Infinity, max = -Infinity;
  return {
    add(x: number): void {
      if (typeof x !== 'number' || !Number.isFinite(x) || x < 0) throw invalidInput(`durations.${n}`, 'must be a finite number of seconds, 0 or more');
      n++;
      const d = x - mean;
      mean += d / n;
      m2 += d * (x - mean);
      if (x < min) min = x;
      if (x > max) max = x;
      if (kept < opts.bufferLimit) {
        if (kept === buffer.length) {
          const bigger = new Float64Array(Math.min(opts.bufferLimit, buffer.length * 2));
          bigger.set(buffer);
          buffer = bigger;
        }
        buffer[kept++] = x;
      } else {
        const j = Math.floor(rng.next() * n);
        if (j < kept) buffer[j] = x;
      }
    },
    get count() {
      return n;
    },
    result(): ServiceFit {
      if (n < 2) throw invalidInput('durations', 'at least 2 service times are needed');
      if (max === 0) throw invalidInput('durations', 'all service times are 0');
      const sorted = buffer.slice(0, kept).sort();
      const variance = m2 / (n - 1);
      const sd = Math.sqrt(variance);
      const half = (1.96 * sd) / Math.sqrt(n);
      const p99 = quantile(sorted, 0.99);
      const gof = testExponential(sorted, createRng(opts.seed, 1), opts.ksMaxSample);
      const scv = variance / (mean * mean);
      const warnings: FitWarning[] = [];
      // Thresholds are common practice.
      if (n < 30) warnings.push({ code: 'small_sample', message: `Only ${n} service times: the mean is rough, the variability (SCV) very uncertain, and the exponential test can hardly reject anything.` });
      if (gof.rejected) {
        warnings.push({ code: 'not_exponential', message: `Service times are clearly not exponential (KS ${pText(gof.pValue)}, SCV ${scv.toFixed(2)} where exponential gives 1). Prefer models that take the SCV into account (M/G/1, G/G/c) or check by simulation.` });
      } else if (gof.lillieforsAdjusted.rejected) {
        warnings.push({ code: 'exponential_doubtful', message: `The exponential assumption is doubtful once the estimated mean is allowed for (Lilliefors-adjusted KS, SCV ${scv.toFixed(2)}); treat M/M results as approximate.` });
      }
      return {
        count: n,
        meanSeconds: mean,
        meanInterval: { lower: Math.max(0, mean - half), upper: mean + half, method: 'normal approximation' },
        sdSeconds: sd,
        scv,
        serviceRatePerHour: 3600 / mean,
        minSeconds: min,
        maxSeconds: max,
        percentiles: { p50: quantile(sorted, 0.5), p80: quantile(sorted, 0.8), p90: quantile(sorted, 0.9), p95: quantile(sorted, 0.95), p99 },
        percentileMethod: kept === n ? 'exact' : 'reservoir sample',
        goodnessOfFit: gof,
        histogram: buildHistogram(sorted, mean, p99),
        warnings,
      };
    },
  };
}
