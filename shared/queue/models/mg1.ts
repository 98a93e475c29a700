/**
 * M/G/1 — Poisson arrivals, one server, general service times with mean 1/μ and squared
 * coefficient of variation cs². Pollaczek–Khinchine mean-value formula, exact for the means:
 * Lq = ρ²(1 + cs²) / (2(1 − ρ)); P(wait) = ρ (PASTA); P0 = 1 − ρ.
 * Reference: F. Pollaczek (1930), A. Y. Khinchine (1932); Gross et al. (2008), §5.1.
 */
import type { Method, ModelResult } from '../result';
import type { Mg1Spec } from '../spec';
import { utilisationWarnings } from '../warnings';
import { assertStable } from './mmc';

export const MG1_METHOD: Method = {
  name: 'Pollaczek–Khinchine (M/G/1)',
  exact: true,
  reference: 'F. Pollaczek (1930); A. Y. Khinchine (1932); Gross, Shortle, Thompson & Harris (2008), §5.1',
  note: 'Exact for the means and P(wait); the waiting-time distribution depends on more than the SCV and is not reported.',
};

/** Pollaczek–Khinchine mean values for one server; shared by M/G/1 and M/D/1. */
export function pollaczekKhinchine(model: string, method: Method, lam: number, mu: number, scv: number): ModelResult {
  assertStable(lam, mu, 1, 'arrivalRate');
  const rho = lam / mu;
  const oneMinusRho = (mu - lam) / mu;
  const Lq = (rho * rho * (1 + scv)) / (2 * oneMinusRho);
  const Wq = Lq / lam;
  const W = Wq + 1 / mu;
  return {
    model,
    method,
    warnings: utilisationWarnings(rho),
    rho,
    offeredLoad: rho,
    p0: oneMinusRho,
    L: lam * W,
    Lq,
    W,
    Wq,
    probWait: rho,
    effectiveArrivalRate: lam,
    serverUtilization: rho,
  };
}

/** M/G/1 by Pollaczek–Khinchine. Throws QueueError('unstable') when λ ≥ μ. */
export function mg1(spec: Omit<Mg1Spec, 'model'>): ModelResult {
  return pollaczekKhinchine('M/G/1', MG1_METHOD, spec.arrivalRate, spec.serviceRate, spec.serviceScv);
}
