/**
 * Throughput of the simulator (events per second, one thread) and time to fit 10⁶ service times
 * and 10⁶ arrival timestamps. Figures are printed by scripts/bench.ts, never asserted in tests.
 */
import { createArrivalAccumulator, createServiceAccumulator } from '../../shared/queue/fit/index';
import { createRng } from '../../shared/queue/sim/rng';
import { simulate } from '../../shared/queue/sim/index';
import type { BenchRow, BenchSuite } from './types';

const EVENTS_TARGET = 5e6;
const FIT_TARGET_MS = 4000;

function eventsPerSecond(servers: number, extra: Record<string, unknown> = {}): number {
  const input = { arrivalRate: 0.9 * servers, serviceRate: 1, servers, horizon: 1_000_000, replications: 4, ...extra };
  simulate({ ...input, horizon: 100_000 }); // let the JIT settle
  const t0 = performance.now();
  const r = simulate(input);
  return r.events / ((performance.now() - t0) / 1000);
}

function fitServiceMs(): number {
  const rng = createRng(17);
  const values = new Float64Array(1_000_000);
  for (let i = 0; i < values.length; i++) values[i] = -Math.log(rng.next()) * 240;
  const t0 = performance.now();
  const acc = createServiceAccumulator();
  for (let i = 0; i < values.length; i++) acc.add(values[i]);
  acc.result();
  return performance.now() - t0;
}

function fitArrivalsMs(): number {
  const rng = createRng(18);
  const stamps = new Float64Array(1_000_000);
  let t = Date.UTC(2024, 0, 1);
  for (let i = 0; i < stamps.length; i++) stamps[i] = t += -Math.log(rng.next()) * 20_000; // ~180 per hour over ~7 months
  const t0 = performance.now();
  const acc = createArrivalAccumulator({ intervalMinutes: 15, timeZone: 'Europe/Berlin' });
  for (let i = 0; i < stamps.length; i++) acc.add(stamps[i]);
  acc.result();
  return performance.now() - t0;
}

const suite: BenchSuite = async () => {
  const rows: BenchRow[] = [];
  const sim = (what: string, v: number): BenchRow => ({ area: 'simulation', what, measured: v, unit: 'events/s', target: `>= ${EVENTS_TARGET.toExponential(0)}`, ok: v >= EVENTS_TARGET });
  rows.push(sim('M/M/1, ρ 0.9', eventsPerSecond(1)));
  rows.push(sim('M/M/10, ρ 0.9', eventsPerSecond(10)));
  rows.push(sim('M/M/100, ρ 0.9', eventsPerSecond(100)));
  rows.push({ ...sim('M/M/10+M, ρ 0.9 (informative)', eventsPerSecond(10, { patienceRate: 0.5 })), target: 'n/a', ok: true });
  rows.push({ ...sim('G/G/10 lognormal SCV 2 (informative)', eventsPerSecond(10, { service: { kind: 'lognormal', scv: 2 } })), target: 'n/a', ok: true });
  const svc = fitServiceMs();
  rows.push({ area: 'fitting', what: '10^6 service times (exact percentiles, KS on 5000)', measured: svc, unit: 'ms', target: `< ${FIT_TARGET_MS}`, ok: svc < FIT_TARGET_MS });
  const arr = fitArrivalsMs();
  rows.push({ area: 'fitting', what: '10^6 arrival timestamps, 15 min, Europe/Berlin (informative)', measured: arr, unit: 'ms', target: 'n/a', ok: true });
  return rows;
};

export default suite;
