import tQuantile from '@stdlib/stats-base-dists-t-quantile';

/** A mean over independent samples with its 95 % confidence interval (Student t, n − 1 d.f.). */
export interface Estimate {
  mean: number;
  lower: number;
  upper: number;
  halfWidth: number;
  /** Number of replications or batches behind the interval. */
  samples: number;
}

/**
 * Mean and 95 % interval of per-sample values (replication means or batch means), which the
 * method of independent replications and the batch-means method treat as roughly independent and
 * normal. Probabilities are clipped to [0, 1] so an interval never leaves the possible range.
 */
export function estimate(values: ArrayLike<number>, clip?: { min: number; max: number }): Estimate {
  const n = values.length;
  let sum = 0;
  for (let i = 0; i < n; i++) sum += values[i];
  const mean = sum / n;
  let ss = 0;
  for (let i = 0; i < n; i++) ss += (values[i] - mean) ** 2;
  const sd = n > 1 ? Math.sqrt(ss / (n - 1)) : 0;
  const halfWidth = n > 1 ? tQuantile(0.975, n - 1) * (sd / Math.sqrt(n)) : 0;
  let lower = mean - halfWidth;
  let upper = mean + halfWidth;
  if (clip) {
    lower = Math.max(clip.min, lower);
    upper = Math.min(clip.max, upper);
  }
  return { mean, lower, upper, halfWidth, samples: n };
}

/** Lag-1 autocorrelation of a series; near 0 when batch means are long enough to be independent. */
export function lag1Autocorrelation(values: ArrayLike<number>): number {
  const n = values.length;
  if (n < 3) return 0;
  let mean = 0;
  for (let i = 0; i < n; i++) mean += values[i] / n;
  let num = 0;
  let den = 0;
  for (let i = 0; i < n; i++) {
    const d = values[i] - mean;
    den += d * d;
    if (i > 0) num += d * (values[i - 1] - mean);
  }
  return den > 0 ? num / den : 0;
}
