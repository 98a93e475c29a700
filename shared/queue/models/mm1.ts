/**
 * M/M/1 — the single-server case of M/M/c: P0 = 1 − ρ, L = ρ/(1 − ρ), W = 1/(μ − λ),
 * P(Wq > t) = ρ·e^{−(μ−λ)t}. Exact.
 * Reference: L. Kleinrock, Queueing Systems Vol. 1 (1975), §3.2; Gross et al. (2008), §2.2.
 */
import type { Method, ModelResult } from '../result';
import type { Mm1Spec } from '../spec';
import { utilisationWarnings } from '../warnings';
import { assertStable, mmcMeasures } from './mmc';

export const MM1_METHOD: Method = {
  name: 'M/M/1',
  exact: true,
  reference: 'L. Kleinrock, Queueing Systems Vol. 1 (1975), §3.2; Gross, Shortle, Thompson & Harris (2008), §2.2',
};

/** M/M/1. Throws QueueError('unstable') when λ ≥ μ. */
export function mm1(spec: Omit<Mm1Spec, 'model'>): ModelResult {
  assertStable(spec.arrivalRate, spec.serviceRate, 1, 'arrivalRate');
  const m = mmcMeasures(spec.arrivalRate, spec.serviceRate, 1, spec);
  return { model: 'M/M/1', method: MM1_METHOD, warnings: utilisationWarnings(m.rho as number), ...m };
}
