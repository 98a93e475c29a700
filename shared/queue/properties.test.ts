import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { compute } from './compute';
import { QueueError } from './errors';
import { erlangA } from './models/erlang-a';
import { finiteSource } from './models/finite-source';
import { mg1 } from './models/mg1';
import { mm1 } from './models/mm1';
import { mmc } from './models/mmc';
import { mmck } from './models/mmck';

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);
const runs = { numRuns: 60 };

/** A stable M/M/c: c servers, utilisation ρ in (0.01, 0.999), μ between 0.01 and 100. */
const stableMmc = fc.record({
  servers: fc.integer({ min: 1, max: 300 }),
  rho: fc.double({ min: 0.01, max: 0.999, noNaN: true }),
  serviceRate: fc.double({ min: 0.01, max: 100, noNaN: true }),
});

describe('queueing identities (property tests)', () => {
  it('Little’s law holds for M/M/c, M/M/c/K, M/M/c//N and M/M/c+M', () => {
    fc.assert(
      fc.property(stableMmc, fc.integer({ min: 0, max: 50 }), ({ servers: c, rho, serviceRate: mu }, extra) => {
        const lam = rho * c * mu;
        for (const r of [
          mmc({ arrivalRate: lam, serviceRate: mu, servers: c }),
          mmck({ arrivalRate: lam * 1.5, serviceRate: mu, servers: c, capacity: c + extra }),
          finiteSource({ arrivalRate: lam / 50, serviceRate: mu, servers: c, population: c + extra + 1 }),
          erlangA({ arrivalRate: lam * 1.5, serviceRate: mu, servers: c, patienceRate: mu / 3 }),
        ]) {
          const lamEff = r.model === 'M/M/c+M' ? lam * 1.5 : (r.effectiveArrivalRate as number);
          expect(rel(r.L as number, lamEff * (r.W as number))).toBeLessThan(1e-12);
          if ((r.Lq as number) > 1e-300) expect(rel(r.Lq as number, lamEff * (r.Wq as number))).toBeLessThan(1e-12);
        }
      }),
      runs,
    );
  });

  it('more servers never wait longer or answer fewer within t (M/M/c)', () => {
    fc.assert(
      fc.property(stableMmc, fc.double({ min: 0, max: 10, noNaN: true }), ({ servers: c, rho, serviceRate: mu }, tMu) => {
        const lam = rho * c * mu;
        const t = tMu / mu;
        const a = mmc({ arrivalRate: lam, serviceRate: mu, servers: c, t });
        const b = mmc({ arrivalRate: lam, serviceRate: mu, servers: c + 1, t });
        expect(b.Wq as number).toBeLessThanOrEqual(a.Wq as number);
        expect(b.probWait as number).toBeLessThanOrEqual(a.probWait as number);
        expect(b.serviceLevel as number).toBeGreaterThanOrEqual((a.serviceLevel as number) - 1e-15);
      }),
      runs,
    );
  });

  it('M/M/c/K tends to M/M/c as K grows', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 50 }), fc.double({ min: 0.05, max: 0.9, noNaN: true }), (c, rho) => {
        const lam = rho * c;
        const inf = mmc({ arrivalRate: lam, serviceRate: 1, servers: c });
        const K = c + Math.ceil(60 / -Math.log(rho));
        const fin = mmck({ arrivalRate: lam, serviceRate: 1, servers: c, capacity: K });
        expect(rel(fin.L as number, inf.L as number)).toBeLessThan(1e-9);
        expect(rel(fin.probWait as number, inf.probWait as number)).toBeLessThan(1e-9);
      }),
      { numRuns: 40 },
    );
  });

  it('M/M/c+M tends to M/M/c as the patience rate goes to 0', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 30 }), fc.double({ min: 0.05, max: 0.9, noNaN: true }), (c, rho) => {
        const lam = rho * c;
        const inf = mmc({ arrivalRate: lam, serviceRate: 1, servers: c });
        const a = erlangA({ arrivalRate: lam, serviceRate: 1, servers: c, patienceRate: 1e-10 });
        expect(rel(a.Lq as number, inf.Lq as number)).toBeLessThan(1e-6);
        expect(rel(a.probWait as number, inf.probWait as number)).toBeLessThan(1e-6);
      }),
      { numRuns: 40 },
    );
  });

  it('M/G/1 with service SCV 1 is M/M/1', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.001, max: 0.999, noNaN: true }), fc.double({ min: 0.01, max: 100, noNaN: true }), (rho, mu) => {
        const a = mg1({ arrivalRate: rho * mu, serviceRate: mu, serviceScv: 1 });
        const b = mm1({ arrivalRate: rho * mu, serviceRate: mu });
        expect(rel(a.Lq as number, b.Lq as number)).toBeLessThan(1e-12);
        expect(rel(a.W as number, b.W as number)).toBeLessThan(1e-12);
      }),
      runs,
    );
  });

  it('never returns NaN or Infinity: any spec gives finite numbers or a QueueError', () => {
    const num = fc.oneof(fc.double({ noNaN: false }), fc.integer({ min: -5, max: 2000 }), fc.constant(0), fc.double({ min: 0, max: 1 }));
    const spec = fc.record({
      model: fc.constantFrom('M/M/1', 'M/M/c', 'M/M/c/K', 'M/M/c/c', 'M/M/inf', 'M/G/1', 'M/D/1', 'G/G/c', 'M/M/c//N', 'M/M/c+M'),
      arrivalRate: num,
      serviceRate: num,
      servers: num,
      capacity: num,
      population: num,
      patienceRate: num,
      serviceScv: num,
      arrivalScv: num,
      t: num,
      percentile: num,
      n: num,
    });
    fc.assert(
      fc.property(spec, (s) => {
        let result: unknown;
        try {
          result = compute(s);
        } catch (err) {
          expect(err).toBeInstanceOf(QueueError);
          return;
        }
        const check = (v: unknown): void => {
          if (typeof v === 'number') expect(Number.isFinite(v)).toBe(true);
          else if (Array.isArray(v)) v.forEach(check);
          else if (v && typeof v === 'object') Object.values(v).forEach(check);
        };
        check(result);
      }),
      { numRuns: 300 },
    );
  });
});
