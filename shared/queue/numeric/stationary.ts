/**
 * Stationary distribution of a finite birth–death chain from its ratios r(n) = λ(n−1)/μ(n),
 * p(n) ∝ r(1)·…·r(n). To avoid overflow and underflow the products are taken outward from the
 * most likely state (found from the running sum of ln r), so every weight is ≤ about 1 and the
 * relative error of p(n) grows only like |n − mode|·ε.
 */

export interface Stationary {
  /** p(0…N), summing to 1. */
  p: Float64Array;
  /** Index of the most likely state. */
  mode: number;
}

/** Stationary probabilities of states 0…N; `ratio(n)` must be > 0 and finite for n = 1…N. */
export function stationaryFromRatios(n: number, ratio: (k: number) => number): Stationary {
  const r = new Float64Array(n + 1);
  let logW = 0;
  let best = 0;
  let mode = 0;
  for (let k = 1; k <= n; k++) {
    r[k] = ratio(k);
    logW += Math.log(r[k]);
    if (logW > best) {
      best = logW;
      mode = k;
    }
  }
  const p = new Float64Array(n + 1);
  p[mode] = 1;
  for (let k = mode + 1; k <= n; k++) p[k] = p[k - 1] * r[k];
  for (let k = mode - 1; k >= 0; k--) p[k] = p[k + 1] / r[k + 1];
  let sum = 0;
  for (let k = 0; k <= n; k++) sum += p[k];
  for (let k = 0; k <= n; k++) p[k] /= sum;
  return { p, mode };
}

/** Σ f(n)·p(n) over all states. */
export function expectation(p: Float64Array, f: (n: number) => number): number {
  let s = 0;
  for (let k = 0; k < p.length; k++) if (p[k] !== 0) s += f(k) * p[k];
  return s;
}
