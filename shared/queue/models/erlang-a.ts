/**
 * M/M/c+M — Erlang-A (Palm's model): c exponential servers, customers abandon the queue after an
 * exponential patience with rate θ. Always stable. Exact stationary distribution of the
 * birth–death chain with μₙ = min(n, c)μ + (n − c)⁺θ, truncated where the remaining states
 * weigh less than 1e-17 of the mode. probAbandon = θ·Lq/λ; probWait = P(an arrival finds all
 * servers busy); Wq is the time spent queueing by every arrival, served or not (so Wq = Lq/λ),
 * and P(Wq > t) = e^{−θt}·P(V > t) with V the virtual wait (exact, by uniformisation).
 * References: C. Palm (1943); O. Garnett, A. Mandelbaum & M. Reiman (2002), "Designing a call
 * center with impatient customers", M&SOM 4(3).
 */
import { invalidInput } from '../errors';
import { MAX_STATES } from '../limits';
import { invertTail } from '../numeric/erlang-tail';
import { stationaryFromRatios } from '../numeric/stationary';
import { virtualWaitTail } from '../numeric/virtual-wait';
import type { Method, ModelResult } from '../result';
import type { ErlangASpec } from '../spec';
import { highShareWarning, overloadWarning, utilisationWarnings } from '../warnings';

export const ERLANG_A_METHOD: Method = {
  name: 'Erlang-A (M/M/c+M, Palm)',
  exact: true,
  reference: 'C. Palm (1943); Garnett, Mandelbaum & Reiman (2002), Manufacturing & Service Operations Management 4(3)',
  note: 'Exact stationary distribution (tail below 1e-17 dropped). Waiting times count every arrival, including those who abandon; P(Wq ≤ t) is exact by uniformisation.',
};

/**
 * Number of states to keep: past the mode, and until the weight falls 1e-17 below the largest
 * weight at or above c (so queue measures such as Lq keep their relative precision too).
 */
function truncation(lam: number, mu: number, c: number, theta: number): number {
  const cut = Math.log(1e17);
  let logW = 0;
  let bestQueued = -Infinity;
  for (let n = 1; n <= MAX_STATES; n++) {
    const r = lam / (Math.min(n, c) * mu + Math.max(n - c, 0) * theta);
    logW += Math.log(r);
    if (n >= c && logW > bestQueued) bestQueued = logW;
    if (n > c && r < 1 && logW < bestQueued - cut) return n;
  }
  throw invalidInput('patienceRate', `is too small for this load: the queue would need more than ${MAX_STATES} states; use M/M/c if customers do not abandon`);
}

/** M/M/c+M (Erlang-A). Never unstable: impatient customers bound the queue. */
export function erlangA(spec: Omit<ErlangASpec, 'model'>): ModelResult {
  const { arrivalRate: lam, serviceRate: mu, servers: c, patienceRate: theta } = spec;
  const N = truncation(lam, mu, c, theta);
  const { p } = stationaryFromRatios(N, (n) => lam / (Math.min(n, c) * mu + Math.max(n - c, 0) * theta));
  let L = 0;
  let Lq = 0;
  let busy = 0;
  let probWait = 0;
  for (let n = 0; n <= N; n++) {
    L += n * p[n];
    busy += Math.min(n, c) * p[n];
    if (n >= c) probWait += p[n];
    if (n > c) Lq += (n - c) * p[n];
  }
  const probAbandon = (theta * Lq) / lam;
  const rho = lam / (c * mu);
  const start = p.subarray(c);
  const tail = (x: number): number => Math.exp(-theta * x) * virtualWaitTail(start, c, mu, theta, x);
  const result: ModelResult = {
    model: 'M/M/c+M',
    method: ERLANG_A_METHOD,
    warnings: [...utilisationWarnings(rho), ...overloadWarning(rho), ...highShareWarning('high_abandonment', probAbandon)],
    rho,
    offeredLoad: lam / mu,
    p0: p[0],
    L,
    Lq,
    W: L / lam,
    Wq: Lq / lam,
    probWait,
    probAbandon,
    effectiveArrivalRate: mu * busy,
    serverUtilization: busy / c,
  };
  if (spec.n !== undefined) result.probN = spec.n <= N ? p[spec.n] : 0;
  if (spec.t !== undefined) {
    result.probWqGreaterT = tail(spec.t);
    result.serviceLevel = 1 - result.probWqGreaterT;
  }
  if (spec.percentile !== undefined) {
    result.wqPercentile = 1 - probWait >= spec.percentile ? 0 : invertTail(tail, 1 - spec.percentile, 1 / (c * mu));
  }
  return result;
}
