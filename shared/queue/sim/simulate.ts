import { QueueError } from '../errors';
import type { DistributionSpec } from './distribution-schema';
import { createRng } from './rng';
import { runSegment } from './run-segment';
import { createSampleStats } from './sample-stats';
import { createSampler } from './samplers';
import { simulationInputSchema, type SimulationInput, type SimulationSpec } from './simulation-schema';
import { SimulationStoppedError } from './simulation-stopped-error';
import { summarise, type SimulationEstimates, type SimulationWarning } from './summarise';
import { parseOrThrow } from './zod-to-queue-error';

/** Hooks for long runs in a worker: progress reports and cooperative cancellation. */
export interface SimulationControl {
  /** Called with the fraction done (0–1), every `checkEvery` events and once at the end. */
  onProgress?: (fraction: number) => void;
  /** Polled every `checkEvery` events; returning true stops the run with SimulationStoppedError. */
  shouldStop?: () => boolean;
  /** Events between polls, rounded up to a power of two; default 65 536. */
  checkEvery?: number;
}

export interface SimulationResult {
  /** Kendall notation of what was simulated, e.g. "M/M/3", "M/D/1", "G/G/4/20+M". */
  model: string;
  method: 'replications' | 'batch-means';
  seed: number;
  horizonUnit: 'customers' | 'time';
  horizon: number;
  warmup: number;
  /** Offered load a = λ/μ in erlangs. */
  offeredLoad: number;
  /** Utilisation ρ = λ/(cμ) offered to the servers (before blocking and abandonment). */
  rho: number;
  estimates: SimulationEstimates;
  /** Customers that arrived inside the observation windows (warm-up excluded). */
  customers: number;
  /** Arrivals, departures and abandonments processed, warm-up included. */
  events: number;
  warnings: SimulationWarning[];
}

const letter = (d: DistributionSpec): string => (d.kind === 'exponential' ? 'M' : d.kind === 'deterministic' ? 'D' : 'G');

function kendall(s: SimulationSpec): string {
  const room = s.capacity !== undefined ? `/${s.capacity}` : '';
  const patience = (s.patienceRate ?? 0) > 0 ? '+M' : '';
  return `${letter(s.arrival)}/${letter(s.service)}/${s.servers}${room}${patience}`;
}

function powerOfTwo(n: number | undefined): number {
  const v = Math.min(2 ** 24, Math.max(1, Math.floor(n ?? 65_536)));
  return 2 ** Math.ceil(Math.log2(v));
}

/**
 * Discrete-event simulation of the FCFS G/G/c/K+M queue (M/M/c, M/M/c/K, M/M/c+M and G/G/c are
 * special cases), starting empty, discarding `warmup`, estimating each measure by independent
 * replications (default 10) or by batch means over one long run (default 20 batches), with 95 %
 * Student-t confidence intervals. Deterministic: the same input (seed included) gives the same
 * result. Arrivals, service and patience use separate random streams of the seed, so two
 * scenarios run with one seed share their random numbers (common random numbers).
 *
 * Validity: without capacity and without abandonment ρ = λ/(cμ) must be < 1 (QueueError
 * 'unstable'); near ρ = 1 convergence is slow and intervals widen. Intervals assume the samples
 * are independent and roughly normal — check the warnings. Invalid input: QueueError
 * 'invalid_input' with every issue and its dotted path.
 */
export function simulate(input: SimulationInput, control: SimulationControl = {}): SimulationResult {
  const spec = parseOrThrow(simulationInputSchema, input, 'simulation input');
  const { arrivalRate: lambda, serviceRate: mu, servers: c } = spec;
  const rho = lambda / (c * mu);
  const patienceRate = spec.patienceRate ?? 0;
  const bounded = spec.capacity !== undefined || patienceRate > 0;
  if (!bounded && rho >= 1) {
    throw new QueueError('unstable', `The queue is unstable: ρ = λ/(cμ) = ${rho.toPrecision(4)} ≥ 1, so waits grow without limit.`, [
      { path: 'arrivalRate', message: 'arrivalRate must be below servers × serviceRate (or give capacity or patienceRate)' },
    ]);
  }
  const batchMeans = spec.method === 'batch-means';
  const runs = batchMeans ? 1 : spec.replications;
  const perRun = batchMeans ? spec.batches : 1;
  const samples = runs * perRun;
  const warmup = spec.warmup ?? (spec.horizonUnit === 'customers' ? Math.round(spec.horizon / 10) : spec.horizon / 10);
  const stats = createSampleStats(samples);
  const checkEvery = powerOfTwo(control.checkEvery);
  let events = 0;

  for (let r = 0; r < runs; r++) {
    const tick = (fraction: number): void => {
      const done = (r + fraction) / runs;
      if (control.shouldStop?.()) throw new SimulationStoppedError(done);
      control.onProgress?.(done);
    };
    events += runSegment({
      servers: c,
      capacity: spec.capacity ?? Infinity,
      patienceRate,
      t: spec.t ?? Infinity,
      interarrival: createSampler(spec.arrival, 1 / lambda, createRng(spec.seed, 3 * r)),
      service: createSampler(spec.service, 1 / mu, createRng(spec.seed, 3 * r + 1)),
      rng: createRng(spec.seed, 3 * r + 2),
      unit: spec.horizonUnit,
      warmup,
      horizon: spec.horizon,
      samples: perRun,
      firstSample: r * perRun,
      stats,
      tick,
      checkEvery,
    });
  }
  control.onProgress?.(1);

  const summary = summarise(stats, samples, c, spec.t !== undefined, batchMeans);
  const warnings = [...summary.warnings];
  if (!bounded && rho >= 0.95) {
    warnings.push({ code: 'heavy_load', message: `Utilisation ρ = ${rho.toFixed(3)} is close to 1: the queue settles slowly, so use a long warm-up and horizon and read the intervals with care.` });
  }
  return {
    model: kendall(spec),
    method: spec.method,
    seed: spec.seed,
    horizonUnit: spec.horizonUnit,
    horizon: spec.horizon,
    warmup,
    offeredLoad: lambda / mu,
    rho,
    estimates: summary.estimates,
    customers: summary.customers,
    events,
    warnings,
  };
}
