import chisquareQuantile from '@stdlib/stats-base-dists-chisquare-quantile';
import { invalidInput } from '../errors';
import { MAX_INTERVALS } from './demand-options';
import { createProfileBuilder, type DemandProfile } from './demand-profile';
import { poissonInterval } from './poisson-interval';
import type { FitWarning } from './fit-warning';

/** One interval's arrivals with its rate and exact 95 % Poisson (Garwood) interval, per hour. */
export interface IntervalRate {
  /** Local wall-clock start, "YYYY-MM-DDTHH:mm", in the fit's time zone. */
  start: string;
  count: number;
  ratePerHour: number;
  lowerPerHour: number;
  upperPerHour: number;
}

/** What a demand fit reports: rates per interval and overall, dispersion, profile and peak. */
export interface DemandFit {
  intervalMinutes: number;
  timeZone: string;
  totalArrivals: number;
  /** Intervals observed (for event logs: every interval from the first arrival's to the last's). */
  intervalCount: number;
  hoursObserved: number;
  /** Overall arrivals per hour with its exact 95 % (Garwood) interval. */
  overall: { ratePerHour: number; lowerPerHour: number; upperPerHour: number; method: 'exact Poisson (Garwood)' };
  intervals: IntervalRate[];
  peak: IntervalRate | null;
  /**
   * Index of dispersion D = variance / mean of interval counts (1 for a constant-rate Poisson
   * stream); (n − 1)·D is compared with the χ²(n − 1) 2.5 % and 97.5 % points.
   */
  dispersion: { index: number; statistic: number; lowerCritical: number; upperCritical: number; verdict: 'consistent with Poisson' | 'overdispersed' | 'underdispersed' | 'too few intervals' };
  profile: DemandProfile;
  warnings: FitWarning[];
}

const localLabel = (localMs: number): string => new Date(localMs).toISOString().slice(0, 16);

/**
 * Builds a DemandFit from counts per local interval index. `observed` lists the intervals that were
 * watched (zeros included); counts for other intervals are ignored.
 */
export function buildDemandFit(counts: Map<number, number>, observed: Iterable<number>, intervalMinutes: number, timeZone: string): DemandFit {
  const intervalMs = intervalMinutes * 60_000;
  const hoursPer = intervalMinutes / 60;
  const profile = createProfileBuilder(intervalMinutes);
  const intervals: IntervalRate[] = [];
  let total = 0, sumSq = 0, peak: IntervalRate | null = null;
  for (const index of observed) {
    if (intervals.length >= MAX_INTERVALS) throw invalidInput('intervalMinutes', `the data span more than ${MAX_INTERVALS} intervals; choose a longer interval`);
    const count = counts.get(index) ?? 0;
    const ci = poissonInterval(count);
    const row = { start: localLabel(index * intervalMs), count, ratePerHour: count / hoursPer, lowerPerHour: ci.lower / hoursPer, upperPerHour: ci.upper / hoursPer };
    intervals.push(row);
    profile.add(index * intervalMs, count);
    total += count;
    sumSq += count * count;
    if (peak === null || count > peak.count) peak = row;
  }
  const n = intervals.length;
  const hours = n * hoursPer;
  const ci = poissonInterval(total);
  const mean = n > 0 ? total / n : 0;
  const variance = n > 1 ? (sumSq - n * mean * mean) / (n - 1) : 0;
  const index = mean > 0 ? variance / mean : 0;
  const dispersion: DemandFit['dispersion'] =
    n < 2 || mean === 0
      ? { index, statistic: 0, lowerCritical: 0, upperCritical: 0, verdict: 'too few intervals' }
      : (() => {
          const statistic = (n - 1) * index;
          const lowerCritical = chisquareQuantile(0.025, n - 1);
          const upperCritical = chisquareQuantile(0.975, n - 1);
          const verdict = statistic > upperCritical ? 'overdispersed' : statistic < lowerCritical ? 'underdispersed' : 'consistent with Poisson';
          return { index, statistic, lowerCritical, upperCritical, verdict };
        })();
  const built = profile.build();
  const warnings: FitWarning[] = [];
  // Thresholds below are common practice, not published rules.
  if (total < 30) warnings.push({ code: 'small_sample', message: `Only ${total} arrivals were observed; the rates are rough and their intervals wide.` });
  else if (mean < 5) warnings.push({ code: 'few_per_interval', message: `On average ${mean.toFixed(1)} arrivals fall in a ${intervalMinutes}-minute interval, so each interval's rate is imprecise; a longer interval gives firmer rates.` });
  if (dispersion.verdict === 'overdispersed') {
    warnings.push({ code: 'variable_demand', message: `Demand varies much more between intervals than a steady random stream would (index of dispersion ${index.toFixed(2)}, 1 expected). Size capacity on the busy intervals or the profile by hour, not on the overall average.` });
  }
  const minWeekdayHours = Math.min(...built.byWeekday.map((d) => d.hoursObserved));
  if (total >= 30 && minWeekdayHours < 48) {
    warnings.push({ code: 'short_period', message: 'Some days of the week were observed fewer than two times; the profile by day of week is indicative only.' });
  }
  return {
    intervalMinutes,
    timeZone,
    totalArrivals: total,
    intervalCount: n,
    hoursObserved: hours,
    overall: { ratePerHour: hours > 0 ? total / hours : 0, lowerPerHour: hours > 0 ? ci.lower / hours : 0, upperPerHour: hours > 0 ? ci.upper / hours : 0, method: 'exact Poisson (Garwood)' },
    intervals,
    peak,
    dispersion,
    profile: built,
    warnings,
  };
}
