import chisquareQuantile from '@stdlib/stats-base-dists-chisquare-quantile';

/**
 * Exact (Garwood, 1936) confidence interval for the mean of a Poisson count k:
 * lower = χ²(α/2; 2k)/2 (0 when k = 0), upper = χ²(1 − α/2; 2k + 2)/2. Conservative: coverage is
 * at least the stated level. Returns counts; divide by the exposure for a rate.
 */
export function poissonInterval(k: number, level = 0.95): { lower: number; upper: number } {
  const alpha = 1 - level;
  return {
    lower: k > 0 ? chisquareQuantile(alpha / 2, 2 * k) / 2 : 0,
    upper: chisquareQuantile(1 - alpha / 2, 2 * k + 2) / 2,
  };
}
