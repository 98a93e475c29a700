import { describe, expect, it } from 'vitest';
import { expectRel } from '../testing/expect-close';
import { ggc } from './ggc';
import { md1 } from './md1';
import { mg1 } from './mg1';
import { mm1 } from './mm1';
import { mmc } from './mmc';

describe('M/G/1, M/D/1 and G/G/c', () => {
  // Source: Render, Stair & Hanna, Quantitative Analysis for Management, constant-service example, from memory.
  it.each([
    ['Lq', 0.667, 0.0005],
    ['Wq', 0.0833, 0.00005],
  ] as const)('M/D/1 with λ = 8, μ = 12: %s = %f (source: Render, Stair & Hanna, from memory)', (name, printed, halfUnit) => {
    const r = md1({ arrivalRate: 8, serviceRate: 12 });
    expect(Math.abs((r[name] as number) - printed)).toBeLessThanOrEqual(halfUnit);
  });

  it('M/G/1 with cs² = 1 equals M/M/1', () => {
    const a = mg1({ arrivalRate: 2, serviceRate: 3, serviceScv: 1 });
    const b = mm1({ arrivalRate: 2, serviceRate: 3 });
    for (const k of ['L', 'Lq', 'W', 'Wq', 'p0', 'probWait'] as const) expectRel(a[k], b[k] as number, 1e-14);
  });

  it('G/G/c with both SCVs 1 equals M/M/c, and says it is approximate', () => {
    const g = ggc({ arrivalRate: 45, serviceRate: 1, servers: 50, arrivalScv: 1, serviceScv: 1 });
    const m = mmc({ arrivalRate: 45, serviceRate: 1, servers: 50 });
    expectRel(g.Wq, m.Wq as number, 1e-14);
    expectRel(g.erlangC, m.probWait as number, 1e-14);
    expect(g.method.exact).toBe(false);
    expect(g.warnings.some((w) => w.code === 'approximation')).toBe(true);
  });

  it('Kingman for one server: Wq = ρ/(1 − ρ)·(ca² + cs²)/2·1/μ', () => {
    const g = ggc({ arrivalRate: 0.9, serviceRate: 1, servers: 1, arrivalScv: 0.5, serviceScv: 2 });
    expectRel(g.Wq, (0.9 / 0.1) * 1.25, 1e-12);
    expect(g.method.name).toMatch(/Kingman/);
  });
});
