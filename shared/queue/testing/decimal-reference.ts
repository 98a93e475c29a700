/**
 * High-precision (50-digit) recomputation of closed forms with decimal.js, used only by tests to
 * check the engine against exact arithmetic. Deliberately the textbook sums, not the engine's
 * recursions, so the two share no code path.
 */
import Decimal from 'decimal.js';

const D = Decimal.clone({ precision: 50, toExpNeg: -9e15, toExpPos: 9e15, minE: -9e15, maxE: 9e15 });

export interface ExactMeasures {
  p0: number;
  C: number;
  Lq: number;
  Wq: number;
  L: number;
  probN: (n: number) => number;
}

/** M/M/c by the textbook sums (Gross et al. §2.3) in 50-digit arithmetic. */
export function exactMmc(lam: number, mu: number, c: number): ExactMeasures {
  const a = new D(lam).div(mu);
  const rho = a.div(c);
  const terms: Decimal[] = [new D(1)];
  for (let n = 1; n <= c; n++) terms.push(terms[n - 1].times(a).div(n));
  let s = new D(0);
  for (let n = 0; n < c; n++) s = s.plus(terms[n]);
  const oneMinusRho = new D(1).minus(rho);
  const tail = terms[c].div(oneMinusRho);
  const p0 = new D(1).div(s.plus(tail));
  const C = tail.times(p0);
  const Lq = C.times(rho).div(oneMinusRho);
  const Wq = Lq.div(lam);
  return {
    p0: p0.toNumber(),
    C: C.toNumber(),
    Lq: Lq.toNumber(),
    Wq: Wq.toNumber(),
    L: Lq.plus(a).toNumber(),
    probN: (n) => (n <= c ? terms[n].times(p0) : terms[c].times(rho.pow(n - c)).times(p0)).toNumber(),
  };
}

/** M/M/c/K by the textbook sums (Gross et al. §2.5) in 50-digit arithmetic. */
export function exactMmck(lam: number, mu: number, c: number, K: number): { p: number[]; L: number; Lq: number; probBlock: number; W: number } {
  const a = new D(lam).div(mu);
  const rho = a.div(c);
  const w: Decimal[] = [new D(1)];
  for (let n = 1; n <= K; n++) w.push(n <= c ? w[n - 1].times(a).div(n) : w[n - 1].times(rho));
  const total = w.reduce((s, x) => s.plus(x), new D(0));
  const p = w.map((x) => x.div(total));
  let L = new D(0);
  let Lq = new D(0);
  p.forEach((pn, n) => {
    L = L.plus(pn.times(n));
    if (n > c) Lq = Lq.plus(pn.times(n - c));
  });
  const lamEff = new D(lam).times(new D(1).minus(p[K]));
  return { p: p.map((x) => x.toNumber()), L: L.toNumber(), Lq: Lq.toNumber(), probBlock: p[K].toNumber(), W: L.div(lamEff).toNumber() };
}

/** Erlang B by its definition (a^c/c!)/Σ a^n/n! in 50-digit arithmetic. */
export function exactErlangB(c: number, a: number): number {
  let term = new D(1);
  let sum = new D(1);
  const A = new D(a);
  for (let n = 1; n <= c; n++) {
    term = term.times(A).div(n);
    sum = sum.plus(term);
  }
  return term.div(sum).toNumber();
}
