/**
 * M/D/1 — constant service times: Pollaczek–Khinchine with cs² = 0, Lq = ρ²/(2(1 − ρ)), half the
 * M/M/1 queue. Exact for the means.
 * Reference: Pollaczek–Khinchine; Gross, Shortle, Thompson & Harris (2008), §5.1.
 */
import type { Method, ModelResult } from '../result';
import type { Md1Spec } from '../spec';
import { pollaczekKhinchine } from './mg1';

export const MD1_METHOD: Method = {
  name: 'Pollaczek–Khinchine with constant service (M/D/1)',
  exact: true,
  reference: 'Pollaczek–Khinchine formula with cs² = 0; Gross, Shortle, Thompson & Harris (2008), §5.1',
  note: 'Exact for the means and P(wait).',
};

/** M/D/1. Throws QueueError('unstable') when λ ≥ μ. */
export function md1(spec: Omit<Md1Spec, 'model'>): ModelResult {
  return pollaczekKhinchine('M/D/1', MD1_METHOD, spec.arrivalRate, spec.serviceRate, 0);
}
