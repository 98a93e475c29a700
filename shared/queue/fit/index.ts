/**
 * Fitting queueing inputs from observations, streamed row by row so millions of rows fit in
 * memory: arrival rates per interval (exact Poisson intervals), index of dispersion, demand
 * profile by hour and weekday, peak interval; service-time mean, SCV, percentiles, histogram and a
 * Kolmogorov–Smirnov test of the exponential assumption. Pure: no I/O.
 */
export { createArrivalAccumulator, type ArrivalAccumulator } from './arrival-accumulator';
export { createIntervalCountAccumulator, type IntervalCountAccumulator } from './interval-count-accumulator';
export { createServiceAccumulator, serviceOptionsSchema, type ServiceAccumulator, type ServiceFit } from './service-accumulator';
export { demandOptionsSchema, INTERVAL_MINUTES, MAX_INTERVALS, type DemandOptions } from './demand-options';
export type { DemandFit, IntervalRate } from './demand-fit';
export type { DemandProfile, ProfileCell } from './demand-profile';
export { testExponential, KS_MAX_SAMPLE, type ExponentialTest } from './exponential-test';
export type { ServiceHistogram, HistogramBin } from './service-histogram';
export type { FitWarning } from './fit-warning';
export { poissonInterval } from './poisson-interval';
