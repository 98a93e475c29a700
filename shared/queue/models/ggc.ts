/**
 * G/G/c — general arrivals and service, c servers. Allen–Cunneen approximation:
 * Wq ≈ C(c, a)/(cμ − λ) · (ca² + cs²)/2, with C the Erlang C probability of the M/M/c queue with
 * the same rates. For c = 1 this is Kingman's heavy-traffic formula
 * Wq ≈ ρ/(1 − ρ) · (ca² + cs²)/2 · 1/μ. Approximate (exact for M/M/c when ca² = cs² = 1).
 * References: A. O. Allen, Probability, Statistics and Queueing Theory (1990); J. F. C. Kingman (1961).
 */
import { erlangB, erlangCFromB } from '../numeric/erlang-b';
import type { Method, ModelResult } from '../result';
import type { GgcSpec } from '../spec';
import { approximationWarning, utilisationWarnings } from '../warnings';
import { assertStable } from './mmc';

export const ALLEN_CUNNEEN_METHOD: Method = {
  name: 'Allen–Cunneen (G/G/c)',
  exact: false,
  reference: 'A. O. Allen, Probability, Statistics and Queueing Theory, 2nd ed. (1990), §6; Erlang C for the M/M/c waiting probability',
  note: 'Approximation; exact for M/M/c (both SCVs 1). Best in moderate to heavy traffic.',
};

export const KINGMAN_METHOD: Method = {
  name: 'Kingman (G/G/1)',
  exact: false,
  reference: 'J. F. C. Kingman (1961), "The single server queue in heavy traffic", Proc. Camb. Phil. Soc. 57',
  note: 'Heavy-traffic approximation; exact for M/M/1 and M/G/1 (arrival SCV 1).',
};

/** G/G/c by Allen–Cunneen (Kingman for c = 1). Throws QueueError('unstable') when λ ≥ cμ. */
export function ggc(spec: Omit<GgcSpec, 'model'>): ModelResult {
  const { arrivalRate: lam, serviceRate: mu, servers: c, arrivalScv, serviceScv } = spec;
  assertStable(lam, mu, c);
  const a = lam / mu;
  const rho = lam / (c * mu);
  const C = erlangCFromB(erlangB(c, a), c, a);
  const Wq = (C / (c * mu - lam)) * ((arrivalScv + serviceScv) / 2);
  const W = Wq + 1 / mu;
  const method = c === 1 ? KINGMAN_METHOD : ALLEN_CUNNEEN_METHOD;
  return {
    model: 'G/G/c',
    method,
    warnings: [...utilisationWarnings(rho), approximationWarning(method.name)],
    rho,
    offeredLoad: a,
    L: lam * W,
    Lq: lam * Wq,
    W,
    Wq,
    erlangC: C,
    effectiveArrivalRate: lam,
    serverUtilization: rho,
  };
}
