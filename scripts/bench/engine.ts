/**
 * Engine benchmarks: Erlang C plus a staffing solve at 10,000 erlangs (< 1 ms) and a 1,000-point
 * sweep (< 20 ms), both through the public compute() with validation, as the API calls them.
 * Figures are medians of repeated runs after a warm-up.
 */
import { compute } from '../../shared/queue/index';
import type { BenchRow, BenchSuite } from './types';

function medianMs(run: () => void, repeats: number): number {
  for (let i = 0; i < Math.min(20, repeats); i++) run();
  const times: number[] = [];
  for (let i = 0; i < repeats; i++) {
    const start = performance.now();
    run();
    times.push(performance.now() - start);
  }
  times.sort((a, b) => a - b);
  return times[Math.floor(times.length / 2)];
}

const row = (what: string, measured: number, limit: number): BenchRow => ({
  area: 'engine',
  what,
  measured,
  unit: 'ms',
  target: `< ${limit} ms`,
  ok: measured < limit,
});

const suite: BenchSuite = async () => {
  const erlangPlusStaffing = medianMs(() => {
    compute({ model: 'M/M/c', arrivalRate: 10_000, serviceRate: 1, servers: 10_100, t: 20 / 180 });
    compute({ model: 'staffing', arrivalRate: 10_000, serviceRate: 1, criterion: 'serviceLevel', target: 0.8, t: 20 / 180 });
  }, 200);
  const sweep = medianMs(() => {
    compute({
      model: 'sweep',
      base: { model: 'M/M/c', arrivalRate: 1, serviceRate: 1, servers: 100, t: 0.1 },
      parameter: 'arrivalRate',
      from: 1,
      to: 99.9,
      steps: 1000,
    });
  }, 30);
  const finiteRoom = medianMs(() => compute({ model: 'M/M/c/K', arrivalRate: 950, serviceRate: 1, servers: 1000, capacity: 10_000, t: 0.01 }), 50);
  const erlangA = medianMs(() => compute({ model: 'M/M/c+M', arrivalRate: 1000, serviceRate: 1, servers: 1000, patienceRate: 0.5, t: 20 / 180 }), 30);
  return [
    row('Erlang C + staffing solve, 10,000 erlangs', erlangPlusStaffing, 1),
    row('sweep, 1,000 points of M/M/c (c = 100)', sweep, 20),
    row('M/M/c/K, c = 1,000, K = 10,000, with P(Wq ≤ t)', finiteRoom, 20),
    row('M/M/c+M, c = 1,000, with P(Wq ≤ t)', erlangA, 50),
  ];
};

export default suite;
