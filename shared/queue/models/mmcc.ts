/**
 * M/M/c/c — the Erlang loss system: c servers, no waiting room, blocked arrivals are lost.
 * Exact (and insensitive: it holds for any service-time distribution with the same mean).
 * B by Jagerman's recursion; P(N = n) = pmf(n; a)/cdf(c; a), the truncated Poisson law.
 * Reference: A. K. Erlang (1917); Gross, Shortle, Thompson & Harris (2008), §2.6.
 */
import { erlangB, logPoissonCdfFromB } from '../numeric/erlang-b';
import { logPoissonPmf } from '../numeric/poisson';
import type { Method, ModelResult } from '../result';
import type { MmccSpec } from '../spec';
import { highShareWarning } from '../warnings';

export const MMCC_METHOD: Method = {
  name: 'Erlang B (M/M/c/c)',
  exact: true,
  reference: 'A. K. Erlang (1917); D. L. Jagerman (1974) recursion; Gross, Shortle, Thompson & Harris (2008), §2.6',
  note: 'Exact for any service-time distribution with the given mean (insensitivity).',
};

/** M/M/c/c (Erlang B). Never unstable. */
export function mmcc(spec: Omit<MmccSpec, 'model'>): ModelResult {
  const { arrivalRate: lam, serviceRate: mu, servers: c } = spec;
  const a = lam / mu;
  const b = erlangB(c, a);
  const logCdf = logPoissonCdfFromB(c, a, b);
  const carried = a * (1 - b);
  const result: ModelResult = {
    model: 'M/M/c/c',
    method: MMCC_METHOD,
    warnings: highShareWarning('high_blocking', b),
    rho: lam / (c * mu),
    offeredLoad: a,
    p0: Math.exp(-a - logCdf),
    L: carried,
    Lq: 0,
    W: 1 / mu,
    Wq: 0,
    probWait: 0,
    probBlock: b,
    effectiveArrivalRate: lam * (1 - b),
    serverUtilization: carried / c,
  };
  if (spec.n !== undefined) result.probN = spec.n <= c ? Math.exp(logPoissonPmf(spec.n, a) - logCdf) : 0;
  return result;
}
