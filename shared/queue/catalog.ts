/**
 * Form metadata for the editor: per model, its input fields and its output measures, with a kind
 * that decides the unit shown (rate: per time unit; duration: time unit; count; probability).
 */
import type { ModelName } from './spec';

export type FieldKind = 'rate' | 'duration' | 'count' | 'probability' | 'scv' | 'cost' | 'rates' | 'counts' | 'matrix' | 'choice' | 'number' | 'spec' | 'text';

export interface InputField {
  name: string;
  label: string;
  kind: FieldKind;
  required: boolean;
  /** For kind 'choice'. */
  options?: readonly string[];
}

export interface MeasureField {
  name: string;
  label: string;
  kind: 'rate' | 'duration' | 'count' | 'probability' | 'erlangs' | 'ratio' | 'distribution' | 'cost';
}

export interface ModelCatalogEntry {
  model: ModelName;
  label: string;
  inputs: InputField[];
  measures: MeasureField[];
}

const f = (name: string, label: string, kind: FieldKind, required = true): InputField => ({ name, label, kind, required });
const m = (name: string, label: string, kind: MeasureField['kind']): MeasureField => ({ name, label, kind });

const lam = f('arrivalRate', 'Arrival rate λ', 'rate');
const mu = f('serviceRate', 'Service rate μ per server', 'rate');
const c = f('servers', 'Servers c', 'count');
const n = f('n', 'State n for P(N = n)', 'count', false);
const t = f('t', 'Waiting-time threshold t', 'duration', false);
const pct = f('percentile', 'Waiting-time percentile p', 'probability', false);

const M = {
  rho: m('rho', 'Utilisation ρ', 'ratio'),
  offeredLoad: m('offeredLoad', 'Offered load (erlangs)', 'erlangs'),
  p0: m('p0', 'P(system empty)', 'probability'),
  probN: m('probN', 'P(N = n)', 'probability'),
  L: m('L', 'Mean number in system L', 'count'),
  Lq: m('Lq', 'Mean queue length Lq', 'count'),
  W: m('W', 'Mean time in system W', 'duration'),
  Wq: m('Wq', 'Mean wait in queue Wq', 'duration'),
  probWait: m('probWait', 'Probability of waiting', 'probability'),
  probWqGreaterT: m('probWqGreaterT', 'P(wait > t)', 'probability'),
  serviceLevel: m('serviceLevel', 'Service level P(wait ≤ t)', 'probability'),
  wqPercentile: m('wqPercentile', 'Waiting-time percentile', 'duration'),
  probBlock: m('probBlock', 'Blocking probability', 'probability'),
  effectiveArrivalRate: m('effectiveArrivalRate', 'Throughput (admitted rate)', 'rate'),
  serverUtilization: m('serverUtilization', 'Carried load per server', 'ratio'),
  erlangC: m('erlangC', 'Erlang C (M/M/c waiting probability)', 'probability'),
  probAbandon: m('probAbandon', 'Abandonment probability', 'probability'),
};
const waitingMeasures = [M.rho, M.offeredLoad, M.p0, M.probN, M.L, M.Lq, M.W, M.Wq, M.probWait, M.probWqGreaterT, M.serviceLevel, M.wqPercentile, M.effectiveArrivalRate, M.serverUtilization];

const staffingInputs = [
  mu,
  { name: 'criterion', label: 'Criterion', kind: 'choice', required: true, options: ['serviceLevel', 'meanWait', 'blocking', 'utilization', 'abandonment'] } as InputField,
  f('target', 'Target', 'number'),
  f('t', 'Waiting-time threshold t (service level)', 'duration', false),
  f('patienceRate', 'Patience rate θ (abandonment)', 'rate', false),
];

/** Every model and solver with its form fields and its measures, in menu order. */
export const MODEL_CATALOG: ModelCatalogEntry[] = [
  { model: 'M/M/1', label: 'M/M/1 — one server', inputs: [lam, mu, n, t, pct], measures: waitingMeasures },
  { model: 'M/M/c', label: 'M/M/c — Erlang C', inputs: [lam, mu, c, n, t, pct], measures: waitingMeasures },
  {
    model: 'M/M/c/K',
    label: 'M/M/c/K — finite room',
    inputs: [lam, mu, c, f('capacity', 'Room K (including those in service)', 'count'), n, t, pct],
    measures: [...waitingMeasures, M.probBlock],
  },
  {
    model: 'M/M/c/c',
    label: 'M/M/c/c — Erlang B loss',
    inputs: [lam, mu, c, n],
    measures: [M.rho, M.offeredLoad, M.p0, M.probN, M.L, M.W, M.probBlock, M.effectiveArrivalRate, M.serverUtilization],
  },
  { model: 'M/M/inf', label: 'M/M/∞ — infinite servers', inputs: [lam, mu, n], measures: [M.offeredLoad, M.p0, M.probN, M.L, M.W] },
  {
    model: 'M/G/1',
    label: 'M/G/1 — Pollaczek–Khinchine',
    inputs: [lam, mu, f('serviceScv', 'Service-time SCV cs²', 'scv')],
    measures: [M.rho, M.p0, M.L, M.Lq, M.W, M.Wq, M.probWait],
  },
  { model: 'M/D/1', label: 'M/D/1 — constant service', inputs: [lam, mu], measures: [M.rho, M.p0, M.L, M.Lq, M.W, M.Wq, M.probWait] },
  {
    model: 'G/G/c',
    label: 'G/G/c — Allen–Cunneen (Kingman for c = 1)',
    inputs: [lam, mu, c, f('arrivalScv', 'Inter-arrival SCV ca²', 'scv'), f('serviceScv', 'Service-time SCV cs²', 'scv')],
    measures: [M.rho, M.offeredLoad, M.L, M.Lq, M.W, M.Wq, M.erlangC],
  },
  {
    model: 'M/M/c//N',
    label: 'M/M/c//N — finite source',
    inputs: [f('arrivalRate', 'Arrival rate per idle source λ', 'rate'), mu, c, f('population', 'Population N', 'count'), n, t, pct],
    measures: [...waitingMeasures, m('distribution', 'Distribution of N', 'distribution')],
  },
  {
    model: 'M/M/c+M',
    label: 'M/M/c+M — Erlang-A with abandonment',
    inputs: [lam, mu, c, f('patienceRate', 'Patience rate θ (1 / mean patience)', 'rate'), n, t, pct],
    measures: [...waitingMeasures, M.probAbandon],
  },
  {
    model: 'birth-death',
    label: 'Birth–death process',
    inputs: [f('birthRates', 'Birth rates λ0…λN−1', 'rates'), f('deathRates', 'Death rates μ1…μN', 'rates'), n],
    measures: [
      M.p0,
      M.probN,
      M.L,
      M.W,
      M.effectiveArrivalRate,
      m('stationary', 'Stationary distribution', 'distribution'),
      m('holdingRates', 'Holding rates vn', 'distribution'),
      m('probUp', 'Jump-chain P(up)', 'distribution'),
      m('probDown', 'Jump-chain P(down)', 'distribution'),
      m('jumpChainStationary', 'Jump-chain stationary distribution', 'distribution'),
    ],
  },
  {
    model: 'jackson',
    label: 'Open Jackson network',
    inputs: [
      f('externalArrivalRates', 'External arrival rate per node', 'rates'),
      f('routing', 'Routing probabilities (row: from, column: to)', 'matrix'),
      f('serviceRates', 'Service rate per node', 'rates'),
      f('servers', 'Servers per node', 'counts'),
    ],
    measures: [
      M.L,
      M.Lq,
      M.W,
      M.Wq,
      m('nodeArrivalRates', 'Arrival rate per node', 'distribution'),
      m('nodeRho', 'Utilisation per node', 'distribution'),
      m('nodeL', 'L per node', 'distribution'),
      m('nodeLq', 'Lq per node', 'distribution'),
      m('nodeW', 'W per node', 'distribution'),
      m('nodeWq', 'Wq per node', 'distribution'),
    ],
  },
  {
    model: 'staffing',
    label: 'Staffing — fewest servers for a target',
    inputs: [lam, ...staffingInputs],
    measures: [m('servers', 'Servers', 'count'), m('achieved', 'Achieved', 'ratio'), M.rho],
  },
  {
    model: 'cost-optimum',
    label: 'Cost-optimal servers',
    inputs: [
      lam,
      mu,
      f('serverCost', 'Cost per server per time unit', 'cost'),
      f('waitingCost', 'Cost per waiting customer per time unit', 'cost'),
      { name: 'costBasis', label: 'Waiting cost on', kind: 'choice', required: false, options: ['Lq', 'L'] },
    ],
    measures: [m('servers', 'Servers', 'count'), m('totalCost', 'Total cost per time unit', 'cost'), M.rho],
  },
  {
    model: 'interval-staffing',
    label: 'Staffing per interval',
    inputs: [f('arrivalRates', 'Arrival rate per interval', 'rates'), f('intervalLength', 'Interval length', 'duration', false), ...staffingInputs],
    measures: [m('peakServers', 'Peak servers', 'count'), m('totalServerIntervals', 'Server-intervals', 'count')],
  },
  {
    model: 'sweep',
    label: 'Sweep one input',
    inputs: [
      f('base', 'Base model', 'spec'),
      f('parameter', 'Input to vary', 'text'),
      f('from', 'From', 'number', false),
      f('to', 'To', 'number', false),
      f('steps', 'Points', 'count', false),
      f('values', 'Values', 'rates', false),
    ],
    measures: [],
  },
];

/**
 * A field's kind for units and links: a solver's `target` takes its kind from the criterion (a
 * mean-wait target is a duration in the block's time unit; service level, blocking, utilisation
 * and abandonment targets are shares, so 80 % links as 0.8). Browser preview and server use this one rule.
 */
export function inputKind(field: Pick<InputField, 'name' | 'kind'>, criterion: unknown): FieldKind {
  if (field.name !== 'target') return field.kind;
  return criterion === 'meanWait' ? 'duration' : 'probability';
}
