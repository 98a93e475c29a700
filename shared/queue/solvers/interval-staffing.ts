/**
 * Interval-by-interval staffing from a demand profile: each interval is solved as its own steady
 * queue (stationary independent period approximation, SIPP). Approximate: it understaffs when
 * demand changes quickly or service times are long relative to the interval.
 * Reference: L. V. Green, P. J. Kolesar & J. Soares (2001), "Improving the SIPP approach for
 * staffing service systems that have cyclic demands", Operations Research 49(4).
 */
import { QueueError } from '../errors';
import type { IntervalStaffing, IntervalStaffingResult, QueueWarning } from '../result';
import type { IntervalStaffingSpec } from '../spec';
import { criterionValue, minimumServers, staffingMethod, zeroDemandValue } from './staffing';

/** Staffing per interval of a demand profile (same criterion in every interval). */
export function intervalStaffing(spec: Omit<IntervalStaffingSpec, 'model'>): IntervalStaffingResult {
  const intervals: IntervalStaffing[] = spec.arrivalRates.map((lam, index) => {
    const problem = { ...spec, arrivalRate: lam };
    try {
      const servers = minimumServers(problem);
      const achieved = servers === 0 ? zeroDemandValue(problem) : (criterionValue(problem, servers) as number);
      return { index, arrivalRate: lam, servers, achieved, rho: servers === 0 ? 0 : lam / (servers * spec.serviceRate) };
    } catch (err) {
      if (!(err instanceof QueueError)) throw err;
      throw new QueueError(err.code, `interval ${index}: ${err.message}`, [{ path: `arrivalRates.${index}`, message: err.message }], err.details);
    }
  });
  const warnings: QueueWarning[] = [
    {
      code: 'stationary_intervals',
      message:
        'Each interval is staffed as if its demand were steady and unrelated to the intervals around it (stationary independent period approximation). It can understaff when demand rises quickly or service times are long compared with the interval.',
    },
  ];
  if (spec.intervalLength !== undefined && 1 / spec.serviceRate > 0.1 * spec.intervalLength) {
    warnings.push({
      code: 'short_interval',
      message: `The mean service time is more than 10 % of the interval length: queues carry over between intervals and the per-interval answers are less reliable.`,
    });
  }
  const base = staffingMethod({ ...spec, arrivalRate: 1 });
  return {
    model: 'interval-staffing',
    method: {
      name: `Stationary independent period approximation (SIPP) with ${base.name}`,
      exact: false,
      reference: `Green, Kolesar & Soares (2001), Operations Research 49(4); ${base.reference}`,
      note: 'Exact per interval for a steady queue; approximate for the time-varying system.',
    },
    warnings,
    criterion: spec.criterion,
    target: spec.target,
    intervals,
    peakServers: Math.max(...intervals.map((i) => i.servers)),
    totalServerIntervals: intervals.reduce((s, i) => s + i.servers, 0),
  };
}
