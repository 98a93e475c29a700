/**
 * Seeded discrete-event simulation of FCFS multi-server queues (M/M/c, M/M/c/K, M/M/c+M, G/G/c
 * with exponential, deterministic, lognormal, gamma or empirical times), used to cross-check the
 * analytic formulas and to cover cases without a closed form. Pure: no I/O, runs in a browser
 * or a worker thread.
 */
export { simulate, type SimulationControl, type SimulationResult } from './simulate';
export { simulationInputSchema, SIMULATION_LIMITS, type SimulationInput, type SimulationSpec } from './simulation-schema';
export { distributionSchema, MAX_EMPIRICAL_VALUES, MAX_SCV, type DistributionSpec } from './distribution-schema';
export { SimulationStoppedError } from './simulation-stopped-error';
export type { SimulationEstimates, SimulationWarning } from './summarise';
export type { Estimate } from './estimate';
export { createRng, type Rng } from './rng';
export { createSampler, type Sampler } from './samplers';
export { zodToQueueError } from './zod-to-queue-error';
