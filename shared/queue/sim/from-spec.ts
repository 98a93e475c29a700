import { invalidInput } from '../errors';
import type { QueueSpec } from '../spec';
import { parseSpec } from '../validate';
import { MAX_SCV, type DistributionSpec } from './distribution-schema';
import { SIMULATION_LIMITS, type SimulationInput } from './simulation-schema';

/**
 * Customers simulated by one cross-check, warm-up included, over all replications. The simulator
 * processes 2–5 million events a second on one core (scripts/bench), two events per customer, so
 * this budget runs in roughly 0.5–3 s whatever the model — long enough for intervals of a few per
 * cent on moderate loads, short enough to wait for.
 */
export const CHECK_CUSTOMERS = 1_500_000;
/** Independent replications; 10 gives a Student-t interval with 9 degrees of freedom. */
export const CHECK_REPLICATIONS = 10;
/** Above this utilisation an unbounded queue settles slowly, so a larger share goes to warm-up. */
const HEAVY_RHO = 0.9;

export interface FromSpecOptions {
  /** Seed of the random streams; the same spec and seed give the same figures (default 1). */
  seed?: number;
  /** Overrides CHECK_CUSTOMERS (tests use a smaller budget). */
  customers?: number;
}

/** Times with a given squared coefficient of variation: 0 → deterministic (D), 1 → exponential (M), else gamma. */
function timesWithScv(scv: number, path: string): DistributionSpec {
  if (scv === 0) return { kind: 'deterministic' };
  if (scv === 1) return { kind: 'exponential' };
  if (scv > MAX_SCV) throw invalidInput(path, `the simulation check takes a squared coefficient of variation of at most ${MAX_SCV}`);
  return { kind: 'gamma', scv };
}

type Shape = Pick<SimulationInput, 'arrivalRate' | 'serviceRate' | 'servers' | 'capacity' | 'patienceRate' | 't' | 'arrival' | 'service'>;

function shapeOf(spec: QueueSpec): Shape {
  const t = (s: { t?: number }): Pick<Shape, 't'> => (s.t === undefined ? {} : { t: s.t });
  switch (spec.model) {
    case 'M/M/1':
      return { arrivalRate: spec.arrivalRate, serviceRate: spec.serviceRate, servers: 1, ...t(spec) };
    case 'M/M/c':
      return { arrivalRate: spec.arrivalRate, serviceRate: spec.serviceRate, servers: spec.servers, ...t(spec) };
    case 'M/M/c/K':
      return { arrivalRate: spec.arrivalRate, serviceRate: spec.serviceRate, servers: spec.servers, capacity: spec.capacity, ...t(spec) };
    case 'M/M/c/c':
      return { arrivalRate: spec.arrivalRate, serviceRate: spec.serviceRate, servers: spec.servers, capacity: spec.servers };
    case 'M/M/c+M':
      return { arrivalRate: spec.arrivalRate, serviceRate: spec.serviceRate, servers: spec.servers, patienceRate: spec.patienceRate, ...t(spec) };
    case 'M/G/1':
      return { arrivalRate: spec.arrivalRate, serviceRate: spec.serviceRate, servers: 1, service: timesWithScv(spec.serviceScv, 'serviceScv') };
    case 'M/D/1':
      return { arrivalRate: spec.arrivalRate, serviceRate: spec.serviceRate, servers: 1, service: { kind: 'deterministic' } };
    case 'G/G/c':
      return {
        arrivalRate: spec.arrivalRate,
        serviceRate: spec.serviceRate,
        servers: spec.servers,
        arrival: timesWithScv(spec.arrivalScv, 'arrivalScv'),
        service: timesWithScv(spec.serviceScv, 'serviceScv'),
      };
    default:
      // Finite source, networks, birth–death chains and the solvers have no single FCFS queue to simulate.
      throw invalidInput('model', `no simulation for model ${spec.model}`);
  }
}

/**
 * Maps an analytic engine spec to the input of `simulate` for a cross-check: the same queue,
 * FCFS, exponential times where the spec says M, deterministic for D, gamma with the spec's
 * squared coefficient of variation for G (gamma is our choice: the formulas use only the mean and
 * SCV, so any shape with those two would do). Independent replications, warm-up 10 % of the
 * horizon (25 % for an unbounded queue at ρ ≥ 0.9). Throws QueueError 'invalid_input' for an
 * invalid spec (every issue, dotted paths) or a model without a simulation ("no simulation for
 * model X"). Stability is not checked here: compute() and simulate() both refuse ρ ≥ 1.
 */
export function simulationInputFromSpec(spec: unknown, options: FromSpecOptions = {}): SimulationInput {
  const shape = shapeOf(parseSpec(spec));
  const bounded = shape.capacity !== undefined || (shape.patienceRate ?? 0) > 0;
  const rho = shape.arrivalRate / (shape.servers * shape.serviceRate);
  const warmupShare = !bounded && rho >= HEAVY_RHO ? 0.25 : 0.1;
  const budget = options.customers ?? CHECK_CUSTOMERS;
  const horizon = Math.max(SIMULATION_LIMITS.minCustomersPerSample, Math.floor(budget / (CHECK_REPLICATIONS * (1 + warmupShare))));
  return {
    ...shape,
    seed: options.seed ?? 1,
    horizonUnit: 'customers',
    horizon,
    warmup: Math.round(horizon * warmupShare),
    method: 'replications',
    replications: CHECK_REPLICATIONS,
  };
}
