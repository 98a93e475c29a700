import { describe, expect, it } from 'vitest';
import { expectRel } from '../testing/expect-close';
import { birthDeath } from './birth-death';
import { mmck } from './mmck';

describe('birth–death chain', () => {
  const lam = 2;
  const mu = 3;
  const N = 6;
  // Two identical servers: μn = min(n, 2)·μ.
  const r = birthDeath({ birthRates: Array(N).fill(lam), deathRates: Array.from({ length: N }, (_, i) => Math.min(i + 1, 2) * mu) });

  it('leaves state n at rate vn = λn + μn, with v0 = λ0 (common practice)', () => {
    expect(r.holdingRates?.[0]).toBe(lam);
    expect(r.holdingRates?.[1]).toBe(lam + mu); // v1 = λ + μ with two servers
    for (let n = 2; n < N; n++) expect(r.holdingRates?.[n]).toBe(lam + 2 * mu); // vn = λ + 2μ for n ≥ 2
    expect(r.holdingRates?.[N]).toBe(2 * mu);
  });

  it('jumps up with λn/vn and down with μn/vn; from the empty state always up (common practice)', () => {
    expect(r.probUp?.[0]).toBe(1);
    expect(r.probDown?.[0]).toBe(0);
    expectRel(r.probUp?.[1], lam / (lam + mu), 1e-15);
    expectRel(r.probDown?.[3], (2 * mu) / (lam + 2 * mu), 1e-15);
    expect(r.probUp?.[N]).toBe(0);
    r.probUp?.forEach((p, n) => expectRel(p + (r.probDown?.[n] as number), 1, 1e-15));
  });

  it('has the M/M/c/K stationary law for M/M/c/K rates, and a jump chain ∝ pn·vn', () => {
    const k = mmck({ arrivalRate: lam, serviceRate: mu, servers: 2, capacity: N, n: 3 });
    expectRel(r.p0, k.p0 as number, 1e-14);
    expectRel(r.stationary?.[3], k.probN as number, 1e-14);
    expectRel(r.L, k.L as number, 1e-14);
    const weights = (r.stationary as number[]).map((p, n) => p * (r.holdingRates as number[])[n]);
    const total = weights.reduce((s, w) => s + w, 0);
    weights.forEach((w, n) => expectRel(r.jumpChainStationary?.[n], w / total, 1e-14));
  });

  it('does not overflow on long chains with large ratios', () => {
    const big = birthDeath({ birthRates: Array(5000).fill(1000), deathRates: Array(5000).fill(1) });
    expect(big.stationary?.every(Number.isFinite)).toBe(true);
    expectRel(big.stationary?.[5000], 0.999, 1e-12);
  });
});
