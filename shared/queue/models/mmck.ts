/**
 * M/M/c/K — c exponential servers and room for K customers in total (K ≥ c); arrivals finding K
 * present are blocked. Exact for every ρ, including ρ ≥ 1 and the ρ = 1 limit (the stationary
 * distribution is built by ratios from its mode, so no geometric closed form divides by 1 − ρ).
 * W and Wq are per admitted customer (Little's law with λ(1 − P_K)). P(Wq ≤ t) is the exact
 * Erlang/Poisson sum over the states admitted arrivals see.
 * Reference: Gross, Shortle, Thompson & Harris, Fundamentals of Queueing Theory, 4th ed., §2.5.
 */
import { erlangWaitHead, erlangWaitTail, invertTail } from '../numeric/erlang-tail';
import { stationaryFromRatios } from '../numeric/stationary';
import type { Method, ModelResult, QueueMeasures } from '../result';
import type { MmckSpec } from '../spec';
import { highShareWarning, overloadWarning, utilisationWarnings } from '../warnings';

export const MMCK_METHOD: Method = {
  name: 'M/M/c/K (finite room)',
  exact: true,
  reference: 'Gross, Shortle, Thompson & Harris, Fundamentals of Queueing Theory, 4th ed., §2.5',
  note: 'W and Wq are per admitted customer; P(Wq ≤ t) is the exact sum over the states admitted arrivals find.',
};

/**
 * Waiting-time measures for c servers at rate μ, given q[j] = P(an admitted arrival finds c + j present)
 * and the probability that it waits at all. Shared by the finite-room and finite-source models.
 */
export function waitTimeMeasures(q: Float64Array, probWait: number, c: number, mu: number, t?: number, percentile?: number): QueueMeasures {
  const m: QueueMeasures = {};
  const tail = (x: number): number => erlangWaitTail(q, c * mu * x);
  if (t !== undefined) {
    const gt = tail(t);
    m.probWqGreaterT = gt;
    m.serviceLevel = gt <= 0.5 ? 1 - gt : 1 - probWait + erlangWaitHead(q, c * mu * t);
  }
  if (percentile !== undefined) {
    m.wqPercentile = 1 - probWait >= percentile ? 0 : invertTail(tail, 1 - percentile, 1 / (c * mu));
  }
  return m;
}

/** M/M/c/K. Never unstable (room is finite); warns when overloaded or blocking is high. */
export function mmck(spec: Omit<MmckSpec, 'model'>): ModelResult {
  const { arrivalRate: lam, serviceRate: mu, servers: c, capacity: K } = spec;
  const a = lam / mu;
  const rho = lam / (c * mu);
  const { p } = stationaryFromRatios(K, (n) => (n <= c ? a / n : rho));
  let admitted = 0; // 1 − P_K, summed directly so it keeps its digits when P_K ≈ 1
  let L = 0;
  let Lq = 0;
  let waiting = 0;
  for (let n = 0; n <= K; n++) {
    if (n < K) admitted += p[n];
    if (n < K && n >= c) waiting += p[n];
    L += n * p[n];
    if (n > c) Lq += (n - c) * p[n];
  }
  const lamEff = lam * admitted;
  const probWait = waiting / admitted;
  const q = new Float64Array(Math.max(K - c, 0));
  for (let j = 0; j < q.length; j++) q[j] = p[c + j] / admitted;
  const m: QueueMeasures = {
    rho,
    offeredLoad: a,
    p0: p[0],
    L,
    Lq,
    W: L / lamEff,
    Wq: Lq / lamEff,
    probWait,
    probBlock: p[K],
    effectiveArrivalRate: lamEff,
    serverUtilization: lamEff / (c * mu),
    ...waitTimeMeasures(q, probWait, c, mu, spec.t, spec.percentile),
  };
  if (spec.n !== undefined) m.probN = spec.n <= K ? p[spec.n] : 0;
  const warnings = [...utilisationWarnings(rho), ...overloadWarning(rho), ...highShareWarning('high_blocking', p[K])];
  return { model: 'M/M/c/K', method: MMCK_METHOD, warnings, ...m };
}
