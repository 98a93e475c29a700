/**
 * M/M/c//N — finite source (machine repair): N sources, each idle source generates a request at
 * rate λ; c exponential servers. Exact birth–death solution with λₙ = (N − n)λ, μₙ = min(n, c)μ.
 * Arrivals see the arrival-point distribution (N − n)pₙ/(N − L), which gives P(wait), P(Wq ≤ t)
 * (exact Erlang/Poisson sum) and the percentile.
 * Reference: Gross, Shortle, Thompson & Harris, Fundamentals of Queueing Theory, 4th ed., §2.8.
 */
import { stationaryFromRatios } from '../numeric/stationary';
import type { Method, ModelResult } from '../result';
import type { FiniteSourceSpec } from '../spec';
import { utilisationWarnings } from '../warnings';
import { waitTimeMeasures } from './mmck';

export const FINITE_SOURCE_METHOD: Method = {
  name: 'Finite source (M/M/c//N, machine repair)',
  exact: true,
  reference: 'Gross, Shortle, Thompson & Harris, Fundamentals of Queueing Theory, 4th ed., §2.8',
  note: 'rho and offeredLoad are what N idle sources would offer (Nλ/(cμ), Nλ/μ); serverUtilization is the carried load per server.',
};

/** M/M/c//N. Never unstable (the population is finite). */
export function finiteSource(spec: Omit<FiniteSourceSpec, 'model'>): ModelResult {
  const { arrivalRate: lam, serviceRate: mu, servers: c, population: N } = spec;
  const { p } = stationaryFromRatios(N, (n) => ((N - n + 1) * lam) / (Math.min(n, c) * mu));
  let idle = 0; // Σ (N − n)pₙ = N − L, summed so it keeps its digits
  let waitingArrivals = 0;
  let L = 0;
  let Lq = 0;
  let busy = 0;
  for (let n = 0; n <= N; n++) {
    busy += Math.min(n, c) * p[n];
    idle += (N - n) * p[n];
    if (n >= c) waitingArrivals += (N - n) * p[n];
    L += n * p[n];
    if (n > c) Lq += (n - c) * p[n];
  }
  const lamEff = lam * idle;
  const probWait = waitingArrivals / idle;
  const q = new Float64Array(Math.max(N - c, 0));
  for (let j = 0; j < q.length; j++) q[j] = ((N - c - j) * p[c + j]) / idle;
  const result: ModelResult = {
    model: 'M/M/c//N',
    method: FINITE_SOURCE_METHOD,
    warnings: utilisationWarnings(busy / c),
    rho: (N * lam) / (c * mu),
    offeredLoad: (N * lam) / mu,
    p0: p[0],
    L,
    Lq,
    W: L / lamEff,
    Wq: Lq / lamEff,
    probWait,
    effectiveArrivalRate: lamEff,
    serverUtilization: busy / c,
    distribution: Array.from(p),
    ...waitTimeMeasures(q, probWait, c, mu, spec.t, spec.percentile),
  };
  if (spec.n !== undefined) result.probN = spec.n <= N ? p[spec.n] : 0;
  return result;
}
