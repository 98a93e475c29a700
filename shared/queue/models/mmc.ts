/**
 * M/M/c — Poisson arrivals, c exponential servers, unlimited room, first come first served
 * (Erlang C). Exact. B by Jagerman's recursion, C = cB/(c − a(1 − B)), probabilities from
 * Loader's Poisson pmf (no factorials), so c up to MAX_SERVERS and ρ up to 1 − 1e-12 keep
 * their relative precision.
 * Reference: A. K. Erlang (1917); Gross, Shortle, Thompson & Harris, Fundamentals of Queueing
 * Theory, 4th ed. (2008), §2.3.
 */
import { unstable } from '../errors';
import { erlangB, erlangCFromB, logPoissonCdfFromB } from '../numeric/erlang-b';
import { logPoissonPmf } from '../numeric/poisson';
import type { Method, ModelResult, QueueMeasures } from '../result';
import type { MeasureExtras, MmcSpec } from '../spec';
import { utilisationWarnings } from '../warnings';

export const MMC_METHOD: Method = {
  name: 'Erlang C (M/M/c)',
  exact: true,
  reference: 'A. K. Erlang (1917); Gross, Shortle, Thompson & Harris, Fundamentals of Queueing Theory, 4th ed., §2.3',
};

/** Throws `unstable` unless λ < cμ, naming ρ and the fewest servers that would be stable. */
export function assertStable(arrivalRate: number, serviceRate: number, servers: number, path = 'servers'): void {
  if (arrivalRate < servers * serviceRate) return;
  const rho = arrivalRate / (servers * serviceRate);
  const minServers = Math.floor(arrivalRate / serviceRate) + 1;
  throw unstable(
    path,
    `ρ = λ/(cμ) = ${rho.toPrecision(4)} ≥ 1: the queue grows without bound. Stability needs at least ${minServers} servers (or an arrival rate below ${servers * serviceRate}).`,
    { rho, minServers, maxArrivalRate: servers * serviceRate },
  );
}

/**
 * Measures of a stable M/M/c queue (λ < cμ): ρ, offered load, P0, P(N = n), L, Lq, W, Wq,
 * P(wait) = Erlang C, P(Wq > t) = C·e^{−(cμ−λ)t}, service level and waiting-time percentile.
 */
export function mmcMeasures(arrivalRate: number, serviceRate: number, servers: number, extras: MeasureExtras = {}): QueueMeasures {
  const lam = arrivalRate;
  const mu = serviceRate;
  const c = servers;
  const a = lam / mu;
  const gap = c * mu - lam; // drain rate cμ − λ > 0
  const rho = lam / (c * mu);
  const b = erlangB(c, a);
  const C = erlangCFromB(b, c, a);
  const oneMinusC = ((c - a) * (1 - b)) / (c - a + a * b);
  const Wq = C / gap;
  const W = Wq + 1 / mu;
  // P(N = n) = pmf(n; a)/cdf(c; a)·(1 − C)·… written in logs: the truncated Poisson scaled by 1/(1 + Bλ/gap).
  const logScale = -logPoissonCdfFromB(c, a, b) - Math.log1p((b * lam) / gap);
  const logProb = (n: number): number =>
    n <= c ? logPoissonPmf(n, a) + logScale : logPoissonPmf(c, a) + logScale + (n - c) * Math.log1p(-gap / (c * mu));
  const m: QueueMeasures = {
    rho,
    offeredLoad: a,
    p0: Math.exp(logProb(0)),
    L: lam * W,
    Lq: (C * lam) / gap,
    W,
    Wq,
    probWait: C,
    effectiveArrivalRate: lam,
    serverUtilization: rho,
  };
  if (extras.n !== undefined) m.probN = Math.exp(logProb(extras.n));
  if (extras.t !== undefined) {
    m.probWqGreaterT = C * Math.exp(-gap * extras.t);
    m.serviceLevel = oneMinusC - C * Math.expm1(-gap * extras.t);
  }
  if (extras.percentile !== undefined) {
    const p = extras.percentile;
    m.wqPercentile = oneMinusC >= p ? 0 : Math.log(C / (1 - p)) / gap;
  }
  return m;
}

/** M/M/c (Erlang C). Throws QueueError('unstable') when λ ≥ cμ. */
export function mmc(spec: Omit<MmcSpec, 'model'>): ModelResult {
  assertStable(spec.arrivalRate, spec.serviceRate, spec.servers);
  const m = mmcMeasures(spec.arrivalRate, spec.serviceRate, spec.servers, spec);
  return { model: 'M/M/c', method: MMC_METHOD, warnings: utilisationWarnings(m.rho as number), ...m };
}
