/**
 * Erlang B (loss probability) and Erlang C (waiting probability) by Jagerman's recursion
 * B(0) = 1, B(k) = a·B(k−1) / (k + a·B(k−1)). The recursion contracts rounding errors, so B is
 * accurate to a few ulps for any number of servers; it never forms a^c or c!.
 * Reference: D. L. Jagerman (1974), "Some properties of the Erlang loss function", BSTJ 53.
 */
import { logPoissonPmf } from './poisson';

/** Erlang B: blocking probability of M/M/c/c with c servers and offered load a erlangs (a > 0). */
export function erlangB(c: number, a: number): number {
  let b = 1;
  for (let k = 1; k <= c; k++) b = (a * b) / (k + a * b);
  return b;
}

/** Advance Erlang B by one server: B(c) from B(c − 1). */
export function erlangBNext(bPrev: number, c: number, a: number): number {
  return (a * bPrev) / (c + a * bPrev);
}

/**
 * Erlang C from Erlang B: C = c·B / (c − a(1 − B)), valid for a < c. Written this way (and not as
 * 1 − P(N < c)) it keeps full relative precision when C is tiny.
 */
export function erlangCFromB(b: number, c: number, a: number): number {
  return (c * b) / (c - a + a * b);
}

/** Erlang C: probability of waiting in M/M/c with offered load a < c erlangs. */
export function erlangC(c: number, a: number): number {
  return erlangCFromB(erlangB(c, a), c, a);
}

/**
 * ln P(X ≤ c) for X ~ Poisson(a), from B = pmf(c; a) / cdf(c; a). When B has (nearly) underflowed
 * the upper tail is below ~1e-280 of the whole and ln cdf is 0 to double precision.
 */
export function logPoissonCdfFromB(c: number, a: number, b: number): number {
  if (b > 1e-280) return logPoissonPmf(c, a) - Math.log(b);
  return 0;
}
