/**
 * Result types of the queueing engine. Every result names the formula it used (`method`) and the
 * cautions that apply (`warnings`); measures are plain numbers in the spec's time unit.
 */

/** The published formula behind a result and whether it is exact for the model as stated. */
export interface Method {
  name: string;
  exact: boolean;
  reference: string;
  /** What is exact and what is not, when that needs saying. */
  note?: string;
}

export type WarningCode =
  | 'high_utilisation'
  | 'heavy_traffic'
  | 'approximation'
  | 'overloaded'
  | 'high_blocking'
  | 'high_abandonment'
  | 'stationary_intervals'
  | 'short_interval'
  | 'unstable_point'
  | 'abandonment_ignored';

export interface QueueWarning {
  code: WarningCode;
  message: string;
}

export interface ResultBase {
  model: string;
  method: Method;
  warnings: QueueWarning[];
}

/**
 * Measures a model may report (each model reports those that apply). Rates are per time unit of
 * the inputs, times in that unit, probabilities in [0, 1].
 */
export interface QueueMeasures {
  /** Offered utilisation λ/(cμ). */
  rho?: number;
  /** Offered load λ/μ in erlangs. */
  offeredLoad?: number;
  p0?: number;
  /** P(N = n) for the requested n. */
  probN?: number;
  L?: number;
  Lq?: number;
  W?: number;
  Wq?: number;
  probWait?: number;
  /** P(Wq > t) for the requested t. */
  probWqGreaterT?: number;
  /** P(Wq ≤ t) for the requested t. */
  serviceLevel?: number;
  /** inf{x ≥ 0 : P(Wq ≤ x) ≥ percentile}, over all customers. */
  wqPercentile?: number;
  probBlock?: number;
  effectiveArrivalRate?: number;
  /** Carried load per server. */
  serverUtilization?: number;
  /** G/G/c: the M/M/c waiting probability the approximation uses. */
  erlangC?: number;
  probAbandon?: number;
  /** Finite source: P(N = n) for n = 0…N. */
  distribution?: number[];
  /** Birth–death: stationary distribution, holding rates and jump-chain facts. */
  stationary?: number[];
  holdingRates?: number[];
  probUp?: number[];
  probDown?: number[];
  jumpChainStationary?: number[];
  /** Jackson network, per node. */
  nodeArrivalRates?: number[];
  nodeRho?: number[];
  nodeL?: number[];
  nodeLq?: number[];
  nodeW?: number[];
  nodeWq?: number[];
}

export type ModelResult = ResultBase & QueueMeasures;

/** One evaluated server count of a solver. */
export interface StaffingOption {
  servers: number;
  /** The criterion's value at this count; null when the queue is unstable there. */
  achieved: number | null;
  rho: number;
  meetsTarget: boolean;
}

export interface StaffingResult extends ResultBase {
  model: 'staffing';
  criterion: string;
  target: number;
  servers: number;
  achieved: number;
  rho: number;
  /** c − 1 (when ≥ 1), c and c + 1. */
  options: StaffingOption[];
  /** Square-root staffing β = (c − a)/√a, for comparison with the rule of thumb. */
  sqrtStaffingBeta: number;
  /** Measures of the underlying model at the chosen count. */
  measures: QueueMeasures;
}

export interface CostOption {
  servers: number;
  serverCost: number;
  waitingCost: number;
  totalCost: number;
}

export interface CostOptimumResult extends ResultBase {
  model: 'cost-optimum';
  servers: number;
  totalCost: number;
  serverCost: number;
  waitingCost: number;
  rho: number;
  /** Every stable count from the smallest up to two past the optimum. */
  options: CostOption[];
  measures: QueueMeasures;
}

export interface IntervalStaffing {
  index: number;
  arrivalRate: number;
  servers: number;
  achieved: number;
  rho: number;
}

export interface IntervalStaffingResult extends ResultBase {
  model: 'interval-staffing';
  criterion: string;
  target: number;
  intervals: IntervalStaffing[];
  peakServers: number;
  /** Σ servers over intervals (server-intervals); × interval length gives server-hours. */
  totalServerIntervals: number;
}

/** One point of a sweep in long format, ready for a vega-lite chart. */
export interface SweepRow {
  x: number;
  measure: string;
  value: number;
}

export interface SweepPointError {
  x: number;
  code: string;
  message: string;
}

export interface SweepResult extends ResultBase {
  model: 'sweep';
  parameter: string;
  xs: number[];
  measures: string[];
  rows: SweepRow[];
  errors: SweepPointError[];
}

export type QueueResult = ModelResult | StaffingResult | CostOptimumResult | IntervalStaffingResult | SweepResult;
