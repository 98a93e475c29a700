/**
 * Virtual waiting time of M/M/c+M (the wait of a customer who would never abandon): a customer
 * who finds i others queued ahead moves up at rate cμ + iθ (a service ends or someone ahead
 * abandons), so its wait is a sum of exponentials with rates cμ + iθ, …, cμ. Their mixture's tail
 * is computed by uniformisation at rate Λ = cμ + Jθ: P(V > t) = Σₖ pmf(k; Λt)·Sₖ, where Sₖ is the
 * mass not yet served after k uniformised steps. Every term is positive, so small tails keep
 * their relative precision; the sum stops once the rest is below 1e-17 of it.
 * Reference: W. K. Grassmann (1977), "Transient solutions in Markovian queueing systems".
 */
import { invalidInput } from '../errors';
import { logPoissonPmf, poissonPmfArray } from './poisson';

/** Largest number of state-steps one tail evaluation may take (about a second of work). */
export const MAX_UNIFORMISATION_WORK = 2e8;

/** P(V > t) where start[i] = P(an arrival finds c + i present), i = 0…J. */
export function virtualWaitTail(start: Float64Array, c: number, mu: number, theta: number, t: number): number {
  const J = start.length - 1;
  if (J < 0) return 0;
  let mass = 0;
  for (let i = 0; i <= J; i++) mass += start[i];
  if (t === 0) return mass;
  // V is stochastically below an Erlang(J + 1, cμ) time: P(V > t) ≤ P(Poisson(cμt) ≤ J). When that
  // bound is below 1e-300 the tail underflows anyway, and uniformising would take needless steps.
  const y = c * mu * t;
  if (y > J + 1 && logPoissonPmf(J, y) + Math.log(y / (y - J)) < -700) return 0;
  const lambda = c * mu + J * theta;
  const x = lambda * t;
  const kMax = Math.ceil(x + 12 * Math.sqrt(x) + 60);
  if (kMax * (J + 1) > MAX_UNIFORMISATION_WORK) {
    throw invalidInput('t', 'is too long for an exact waiting-time distribution at this load and patience rate');
  }
  const pmf = poissonPmfArray(kMax, x);
  const stay = new Float64Array(J + 1);
  const move = new Float64Array(J + 1);
  for (let i = 0; i <= J; i++) {
    stay[i] = ((J - i) * theta) / lambda;
    move[i] = (c * mu + i * theta) / lambda;
  }
  let m = Float64Array.from(start);
  let next = new Float64Array(J + 1);
  let total = 0;
  for (let k = 0; k <= kMax; k++) {
    let s = 0;
    for (let i = 0; i <= J; i++) s += m[i];
    total += pmf[k] * s;
    if (s === 0) break;
    if (k + 2 > x && k < kMax) {
      const restBound = (s * pmf[k + 1]) / (1 - x / (k + 2));
      if (restBound < 1e-17 * total) break;
    }
    for (let i = 0; i < J; i++) next[i] = m[i] * stay[i] + m[i + 1] * move[i + 1];
    next[J] = m[J] * stay[J];
    [m, next] = [next, m];
  }
  return total;
}
