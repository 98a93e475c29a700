/**
 * Limits of the queueing engine, shared by the forms (web), the API and the engine itself so the
 * three agree on what is accepted.
 */

/** Largest number of servers in any model or solver answer. */
export const MAX_SERVERS = 100_000;
/** Largest total room K (M/M/c/K) and largest population N (M/M/c//N). */
export const MAX_CAPACITY = 1_000_000;
/** Largest number of states a birth–death chain may have (given or truncated). */
export const MAX_STATES = 2_000_000;
/** Largest number of nodes in a Jackson network. */
export const MAX_NODES = 200;
/** Largest number of points in a sweep. */
export const MAX_SWEEP_POINTS = 10_000;
/** Largest number of intervals in a demand profile. */
export const MAX_INTERVALS = 10_000;
/** Smallest and largest rate accepted (per time unit of the spec); keeps every product and quotient finite. */
export const MIN_RATE = 1e-12;
export const MAX_RATE = 1e12;
/** Largest waiting-time threshold t (in the time unit of the spec). */
export const MAX_TIME = 1e12;
/** Largest squared coefficient of variation. */
export const MAX_SCV = 1e6;
/** Largest cost per time unit. */
export const MAX_COST = 1e15;
/** Utilisation above which results carry a `high_utilisation` warning (common practice: 85 %). */
export const HIGH_UTILISATION = 0.85;
/** Utilisation above which results carry a `heavy_traffic` warning. */
export const HEAVY_TRAFFIC = 0.95;
/** Tolerance on routing-matrix row sums (probabilities may not add to more than 1 + this). */
export const ROUTING_TOLERANCE = 1e-9;
