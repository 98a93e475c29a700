import { estimate, lag1Autocorrelation, type Estimate } from './estimate';
import { F, FIELD_COUNT } from './sample-stats';

/** Estimated measures, each a mean over replications or batches with a 95 % confidence interval. */
export interface SimulationEstimates {
  /** Mean time in queue of admitted customers (abandoning customers count with the time they waited). */
  wq: Estimate;
  /** Mean time in system of admitted customers (abandoning customers: their time in queue). */
  w: Estimate;
  /** Time-average number waiting. */
  lq: Estimate;
  /** Time-average number in system. */
  l: Estimate;
  /** Fraction of admitted customers who had to queue. */
  probWait: Estimate;
  /** P(Wq ≤ t): fraction of admitted customers whose time in queue was at most t (served or abandoned by then); only when t is given. */
  serviceLevel?: Estimate;
  /** Fraction of arriving customers turned away because the system held K (0 without capacity). */
  probBlock: Estimate;
  /** Fraction of admitted customers who left the queue before service (0 without patienceRate). */
  probAbandon: Estimate;
  /** Time-average fraction of servers busy. */
  utilisation: Estimate;
  /** Customers served per unit of time. */
  throughput: Estimate;
}

export interface SimulationWarning {
  code: 'batch_correlation' | 'wide_interval' | 'heavy_load' | 'empty_sample';
  message: string;
}

const PROB = { min: 0, max: 1 };
const NONNEG = { min: 0, max: Infinity };

/** Turns the per-sample tallies into estimates and plain-word warnings. */
export function summarise(
  stats: Float64Array,
  samples: number,
  servers: number,
  withServiceLevel: boolean,
  batchMeans: boolean,
): { estimates: SimulationEstimates; customers: number; warnings: SimulationWarning[] } {
  const col = (f: (o: number) => number): Float64Array => {
    const out = new Float64Array(samples);
    for (let i = 0; i < samples; i++) out[i] = f(i * FIELD_COUNT);
    return out;
  };
  let empty = false;
  // A sample with no admitted customer (possible only when nearly everybody is blocked) adds 0, not NaN.
  const ratio = (num: number, den: number): number => {
    if (den > 0) return num / den;
    empty = true;
    return 0;
  };
  const s = stats;
  const wqCol = col((o) => ratio(s[o + F.sumWq], s[o + F.admitted]));
  const estimates: SimulationEstimates = {
    wq: estimate(wqCol, NONNEG),
    w: estimate(col((o) => ratio(s[o + F.sumW], s[o + F.admitted])), NONNEG),
    lq: estimate(col((o) => ratio(s[o + F.areaQ], s[o + F.duration])), NONNEG),
    l: estimate(col((o) => ratio(s[o + F.areaL], s[o + F.duration])), NONNEG),
    probWait: estimate(col((o) => ratio(s[o + F.waited], s[o + F.admitted])), PROB),
    probBlock: estimate(col((o) => ratio(s[o + F.blocked], s[o + F.arrivals])), PROB),
    probAbandon: estimate(col((o) => ratio(s[o + F.abandoned], s[o + F.admitted])), PROB),
    utilisation: estimate(col((o) => ratio(s[o + F.areaBusy], servers * s[o + F.duration])), PROB),
    throughput: estimate(col((o) => ratio(s[o + F.served], s[o + F.duration])), NONNEG),
  };
  if (withServiceLevel) estimates.serviceLevel = estimate(col((o) => ratio(s[o + F.withinT], s[o + F.admitted])), PROB);

  let customers = 0;
  for (let i = 0; i < samples; i++) customers += s[i * FIELD_COUNT + F.arrivals];

  const warnings: SimulationWarning[] = [];
  if (empty) warnings.push({ code: 'empty_sample', message: 'At least one replication or batch admitted no customer; lengthen the horizon.' });
  // Thresholds below are common practice, not a published rule.
  const r1 = lag1Autocorrelation(wqCol);
  if (batchMeans && r1 > 0.3) {
    warnings.push({ code: 'batch_correlation', message: `Successive batch means are correlated (lag-1 ${r1.toFixed(2)}), so the intervals are too narrow; use fewer, longer batches or a longer horizon.` });
  }
  const wq = estimates.wq;
  if (wq.mean > 0 && wq.halfWidth > 0.1 * wq.mean) {
    warnings.push({ code: 'wide_interval', message: `The mean wait is known only to ±${((100 * wq.halfWidth) / wq.mean).toFixed(0)} %; run longer or more ${batchMeans ? 'batches' : 'replications'} for a firmer figure.` });
  }
  return { estimates, customers, warnings };
}
