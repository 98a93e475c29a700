import kstest from '@stdlib/stats-kstest';
import type { Rng } from '../sim/rng';

/** Largest sample handed to the KS test; bigger samples are tested on a random subsample. */
export const KS_MAX_SAMPLE = 5000;
/** Stephens' 5 % critical value of the modified statistic for an exponential with estimated mean. */
const STEPHENS_CRITICAL_5 = 1.094;

/** Kolmogorov–Smirnov test of "service times are exponential with the observed mean". */
export interface ExponentialTest {
  test: 'Kolmogorov–Smirnov, exponential with the sample mean';
  statistic: number;
  /** p-value from @stdlib/stats-kstest, which assumes the mean was known beforehand (conservative). */
  pValue: number;
  alpha: 0.05;
  /** pValue < alpha: the data clearly are not exponential. */
  rejected: boolean;
  /**
   * The same D with the mean estimated from the data taken into account (Lilliefors' problem),
   * by Stephens' (1974) modified statistic (D − 0.2/n)(√n + 0.26 + 0.5/√n) against 1.094 at 5 %
   * (values from memory). Rejects more readily than the plain p-value, as it should.
   */
  lillieforsAdjusted: { statistic: number; criticalValue: number; rejected: boolean };
  sampleSize: number;
  subsampled: boolean;
  note: string;
}

/**
 * Runs the test on `values` (service times, ≥ 0, at least 2). Samples above KS_MAX_SAMPLE are
 * replaced by a uniform random subsample of that size drawn with `rng` (partial Fisher–Yates):
 * the exact p-value is costly for huge n, and a huge n rejects deviations too small to matter.
 */
export function testExponential(values: Float64Array, rng: Rng, maxSample = KS_MAX_SAMPLE): ExponentialTest {
  let sample = values;
  const subsampled = values.length > maxSample;
  if (subsampled) {
    const copy = Float64Array.from(values);
    for (let i = 0; i < maxSample; i++) {
      const j = i + Math.floor(rng.next() * (copy.length - i));
      const tmp = copy[i];
      copy[i] = copy[j];
      copy[j] = tmp;
    }
    sample = copy.subarray(0, maxSample);
  }
  const n = sample.length;
  let sum = 0;
  for (let i = 0; i < n; i++) sum += sample[i];
  const mean = sum / n;
  const out = kstest(sample, 'exponential', 1 / mean, { alpha: 0.05 });
  const rootN = Math.sqrt(n);
  const modified = (out.statistic - 0.2 / n) * (rootN + 0.26 + 0.5 / rootN);
  const lRejected = modified > STEPHENS_CRITICAL_5;
  const note =
    'The mean was estimated from the same data, so the plain KS p-value is conservative (too large; Lilliefors): ' +
    'a rejection is reliable, an acceptance is weak evidence. The Lilliefors-adjusted verdict corrects for this.' +
    (subsampled ? ` Tested on a random subsample of ${n} of the ${values.length} times.` : '');
  return {
    test: 'Kolmogorov–Smirnov, exponential with the sample mean',
    statistic: out.statistic,
    pValue: out.pValue,
    alpha: 0.05,
    rejected: out.pValue < 0.05,
    lillieforsAdjusted: { statistic: modified, criticalValue: STEPHENS_CRITICAL_5, rejected: lRejected },
    sampleSize: n,
    subsampled,
    note,
  };
}
