/**
 * M/M/∞ — every arrival is served at once; the number present is Poisson with mean a = λ/μ.
 * Exact (for any service-time distribution with the given mean).
 * Reference: Gross, Shortle, Thompson & Harris (2008), §2.7.
 */
import { logPoissonPmf } from '../numeric/poisson';
import type { Method, ModelResult } from '../result';
import type { MminfSpec } from '../spec';

export const MMINF_METHOD: Method = {
  name: 'M/M/∞ (infinite servers)',
  exact: true,
  reference: 'Gross, Shortle, Thompson & Harris, Fundamentals of Queueing Theory, 4th ed., §2.7',
};

/** M/M/∞. Never unstable; nobody waits. */
export function mminf(spec: Omit<MminfSpec, 'model'>): ModelResult {
  const a = spec.arrivalRate / spec.serviceRate;
  const result: ModelResult = {
    model: 'M/M/inf',
    method: MMINF_METHOD,
    warnings: [],
    offeredLoad: a,
    p0: Math.exp(-a),
    L: a,
    Lq: 0,
    W: 1 / spec.serviceRate,
    Wq: 0,
    probWait: 0,
    effectiveArrivalRate: spec.arrivalRate,
  };
  if (spec.n !== undefined) result.probN = Math.exp(logPoissonPmf(spec.n, a));
  return result;
}
