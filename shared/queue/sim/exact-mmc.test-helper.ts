/**
 * Textbook closed forms used only as test oracles (M/M/c by Erlang C, M/M/c/K by the birth–death
 * stationary distribution, M/M/c+M by its birth–death chain truncated far out). Source: the standard
 * birth–death derivations in any queueing text, e.g. Gross & Harris, Fundamentals of Queueing Theory
 * (from memory); computed in log space.
 */
export interface Exact {
  wq: number;
  w: number;
  lq: number;
  l: number;
  probWait: number;
  probBlock: number;
  probAbandon: number;
  utilisation: number;
}

/** Stationary distribution of the birth–death chain with up rate λ·[n < K] and down rate min(n,c)μ + θ·max(0,n−c). */
export function birthDeath(lambda: number, mu: number, c: number, K: number, theta: number): Exact {
  // Log weights, so heavily loaded chains do not overflow.
  const logp: number[] = [0];
  for (let n = 1; n <= K; n++) logp.push(logp[n - 1] + Math.log(lambda) - Math.log(Math.min(n, c) * mu + theta * Math.max(0, n - c)));
  const top = Math.max(...logp);
  const p = logp.map((x) => Math.exp(x - top));
  const z = p.reduce((a, b) => a + b, 0);
  const pi = p.map((x) => x / z);
  let l = 0, lq = 0, busy = 0, waitOnArrival = 0;
  for (let n = 0; n <= K; n++) {
    l += n * pi[n];
    lq += Math.max(0, n - c) * pi[n];
    busy += Math.min(n, c) * pi[n];
    if (n >= c && n < K) waitOnArrival += pi[n];
  }
  const probBlock = K < Infinity ? pi[K] : 0;
  const admittedRate = lambda * (1 - probBlock);
  return {
    lq,
    l,
    wq: lq / admittedRate,
    w: l / admittedRate,
    probWait: waitOnArrival / (1 - probBlock),
    probBlock,
    probAbandon: (theta * lq) / admittedRate,
    utilisation: busy / c,
  };
}

/** Erlang C P(wait) and P(Wq ≤ t) = 1 − C·e^{−(cμ−λ)t} for M/M/c. */
export function erlangC(lambda: number, mu: number, c: number, t: number): { probWait: number; serviceLevel: number } {
  const a = lambda / mu;
  let b = 1; // Erlang B by the usual recursion
  for (let k = 1; k <= c; k++) b = (a * b) / (k + a * b);
  const rho = a / c;
  const probWait = b / (1 - rho + rho * b);
  return { probWait, serviceLevel: 1 - probWait * Math.exp(-(c * mu - lambda) * t) };
}
