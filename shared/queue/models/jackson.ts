/**
 * Open Jackson network of M/M/cᵢ nodes: external Poisson arrivals γᵢ, Markov routing
 * (routing[i][j] = probability of going to j after i; the rest leaves). Traffic equations
 * λ = γ + Rᵀλ; each node then behaves as an independent M/M/cᵢ queue (product form). Exact.
 * Network totals: L = ΣLᵢ, W = L/Σγᵢ (Little's law for the whole network).
 * Reference: J. R. Jackson (1957), "Networks of waiting lines", Operations Research 5; (1963)
 * "Jobshop-like queueing systems", Management Science 10.
 */
import { QueueError } from '../errors';
import { solveLinear } from '../numeric/linear-solve';
import type { Method, ModelResult, QueueWarning } from '../result';
import type { JacksonSpec } from '../spec';
import { utilisationWarnings } from '../warnings';
import { assertStable, mmcMeasures } from './mmc';

export const JACKSON_METHOD: Method = {
  name: 'Open Jackson network (product form)',
  exact: true,
  reference: 'J. R. Jackson (1957), Operations Research 5; J. R. Jackson (1963), Management Science 10',
};

const noSolution = (detail: string): QueueError =>
  new QueueError('invalid_input', `routing: the traffic equations have no stable solution (${detail})`, [
    { path: 'routing', message: `the traffic equations have no stable solution: ${detail}` },
  ]);

/** Solves the traffic equations; throws invalid_input when customers could circulate for ever. */
export function trafficEquations(gamma: number[], routing: number[][]): number[] {
  const m = gamma.length;
  const A = Array.from({ length: m }, (_, i) => Array.from({ length: m }, (_, j) => (i === j ? 1 : 0) - routing[j][i]));
  const lam = solveLinear(A, gamma);
  if (!lam) throw noSolution('some customers can never leave the network');
  if (lam.some((x) => !Number.isFinite(x) || x < -1e-9 * Math.max(1, ...gamma))) throw noSolution('the flows would be negative or unbounded');
  return lam.map((x) => Math.max(0, x));
}

/** Open Jackson network. Throws unstable naming the node whose λᵢ ≥ cᵢμᵢ. */
export function jackson(spec: Omit<JacksonSpec, 'model'>): ModelResult {
  const lam = trafficEquations(spec.externalArrivalRates, spec.routing);
  const warnings: QueueWarning[] = [];
  const nodes = lam.map((li, i) => {
    const mu = spec.serviceRates[i];
    const c = spec.servers[i];
    try {
      assertStable(li, mu, c, `servers.${i}`);
    } catch (err) {
      const e = err as QueueError;
      throw new QueueError('unstable', `node ${i}: ${e.message}`, e.issues, { ...e.details, node: i });
    }
    const m = mmcMeasures(li, mu, c);
    warnings.push(...utilisationWarnings(m.rho as number).map((w) => ({ ...w, message: `Node ${i}: ${w.message}` })));
    return m;
  });
  const total = spec.externalArrivalRates.reduce((s, g) => s + g, 0);
  const sum = (f: (i: number) => number): number => nodes.reduce((s, _, i) => s + f(i), 0);
  const L = sum((i) => nodes[i].L as number);
  const Lq = sum((i) => nodes[i].Lq as number);
  return {
    model: 'jackson',
    method: JACKSON_METHOD,
    warnings,
    L,
    Lq,
    W: L / total,
    Wq: Lq / total,
    effectiveArrivalRate: total,
    nodeArrivalRates: lam,
    nodeRho: nodes.map((m) => m.rho as number),
    nodeL: nodes.map((m) => m.L as number),
    nodeLq: nodes.map((m) => m.Lq as number),
    nodeW: nodes.map((m) => m.W as number),
    nodeWq: nodes.map((m) => m.Wq as number),
  };
}
