/**
 * Waiting-time tail of a first-come-first-served queue with c exponential servers, given the
 * distribution of what an arriving (admitted) customer finds. A customer who finds c + j in the
 * system waits for j + 1 service completions at rate cμ: an Erlang(j + 1, cμ) time, whose tail is
 * P(Poisson(cμt) ≤ j). Summed by parts as Σₖ pmf(k; cμt)·P(J ≥ k): every term positive, so the
 * result keeps its relative precision however small it is.
 */
import { poissonPmfArray } from './poisson';

/**
 * P(Wq > t) = Σⱼ q[j]·P(Poisson(x) ≤ j) with x = cμt, where q[j] = P(arrival finds c + j present).
 * The q need not sum to 1 (mass that does not wait is simply absent).
 */
export function erlangWaitTail(q: Float64Array, x: number): number {
  const jMax = q.length - 1;
  if (jMax < 0) return 0;
  const pmf = poissonPmfArray(jMax, x);
  let suffix = 0;
  let total = 0;
  for (let k = jMax; k >= 0; k--) {
    suffix += q[k];
    total += pmf[k] * suffix;
  }
  return total;
}

/**
 * Smallest x ≥ 0 with tail(x) ≤ 1 − p, for a non-increasing tail with tail(0) > 1 − p, by
 * bracketing and bisection to relative precision 1e-13.
 */
export function invertTail(tail: (x: number) => number, target: number, scale: number): number {
  let lo = 0;
  let hi = scale;
  for (let i = 0; i < 200 && tail(hi) > target; i++) {
    lo = hi;
    hi *= 2;
  }
  for (let i = 0; i < 200 && hi - lo > 1e-13 * hi; i++) {
    const mid = 0.5 * (lo + hi);
    if (tail(mid) > target) lo = mid;
    else hi = mid;
  }
  return hi;
}

/**
 * Complement of erlangWaitTail: Σⱼ q[j]·P(Poisson(x) > j), every term positive, for when the tail
 * is close to the total and 1 − tail would lose digits.
 */
export function erlangWaitHead(q: Float64Array, x: number): number {
  const jMax = q.length - 1;
  if (jMax < 0 || x === 0) return 0;
  const kMax = Math.max(jMax + 1, Math.ceil(x + 40 * Math.sqrt(x) + 50));
  const pmf = poissonPmfArray(kMax, x);
  let prefix = 0;
  let total = 0;
  for (let k = 1; k <= kMax; k++) {
    if (k - 1 <= jMax) prefix += q[k - 1];
    total += pmf[k] * prefix;
  }
  return total;
}
