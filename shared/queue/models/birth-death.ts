/**
 * General birth–death chain on states 0…N from user-given rates λ₀…λ_{N−1} (up) and μ₁…μ_N
 * (down). Exact stationary distribution pₙ ∝ Π λₖ₋₁/μₖ (computed from the mode outward, so no
 * overflow), and the embedded jump chain: holding rate vₙ = λₙ + μₙ (v₀ = λ₀, v_N = μ_N), moves up
 * with probability λₙ/vₙ and down with μₙ/vₙ; its stationary law is ∝ pₙvₙ.
 * Reference: Gross, Shortle, Thompson & Harris (2008), §2.1; J. R. Norris, Markov Chains (1997), §2.6.
 */
import { stationaryFromRatios } from '../numeric/stationary';
import type { Method, ModelResult } from '../result';
import type { BirthDeathSpec } from '../spec';

export const BIRTH_DEATH_METHOD: Method = {
  name: 'Birth–death chain (balance equations) with embedded jump chain',
  exact: true,
  reference: 'Gross, Shortle, Thompson & Harris, Fundamentals of Queueing Theory, 4th ed., §2.1; J. R. Norris, Markov Chains (1997), §2.6',
  note: 'effectiveArrivalRate is the mean birth rate Σλₙpₙ; W = L / effectiveArrivalRate by Little’s law.',
};

/** Birth–death chain. Never unstable (the state space is finite). */
export function birthDeath(spec: Omit<BirthDeathSpec, 'model'>): ModelResult {
  const { birthRates: up, deathRates: down } = spec;
  const N = up.length;
  const { p } = stationaryFromRatios(N, (n) => up[n - 1] / down[n - 1]);
  const holdingRates: number[] = [];
  const probUp: number[] = [];
  const probDown: number[] = [];
  let L = 0;
  let throughput = 0;
  let jumpTotal = 0;
  const jump: number[] = [];
  for (let n = 0; n <= N; n++) {
    const lam = n < N ? up[n] : 0;
    const mu = n > 0 ? down[n - 1] : 0;
    const v = lam + mu;
    holdingRates.push(v);
    probUp.push(lam / v);
    probDown.push(mu / v);
    L += n * p[n];
    throughput += lam * p[n];
    jump.push(p[n] * v);
    jumpTotal += p[n] * v;
  }
  const result: ModelResult = {
    model: 'birth-death',
    method: BIRTH_DEATH_METHOD,
    warnings: [],
    p0: p[0],
    L,
    W: L / throughput,
    effectiveArrivalRate: throughput,
    stationary: Array.from(p),
    holdingRates,
    probUp,
    probDown,
    jumpChainStationary: jump.map((w) => w / jumpTotal),
  };
  if (spec.n !== undefined) result.probN = spec.n <= N ? p[spec.n] : 0;
  return result;
}
