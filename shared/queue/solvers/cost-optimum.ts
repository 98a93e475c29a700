/**
 * Cost-optimal number of servers for M/M/c: minimise serverCost·c + waitingCost·Lq (or ·L).
 * Lq is convex and decreasing in c (Dyer & Proll 1977), so the cost is convex and the first
 * local minimum met scanning upward from the smallest stable c is the global one.
 * Reference: M. E. Dyer & L. G. Proll (1977), "On the validity of marginal analysis for allocating
 * servers in M/M/c queues", Management Science 23(9); Hillier & Lieberman, queueing decision models.
 */
import { invalidInput } from '../errors';
import { MAX_SERVERS } from '../limits';
import { MMC_METHOD, mmc } from '../models/mmc';
import { erlangB, erlangBNext, erlangCFromB } from '../numeric/erlang-b';
import type { CostOption, CostOptimumResult } from '../result';
import type { CostOptimumSpec } from '../spec';
import { utilisationWarnings } from '../warnings';

/** Cost optimum over c for M/M/c. */
export function costOptimum(spec: Omit<CostOptimumSpec, 'model'>): CostOptimumResult {
  const { arrivalRate: lam, serviceRate: mu, serverCost, waitingCost } = spec;
  const basis = spec.costBasis ?? 'Lq';
  const a = lam / mu;
  const cMin = Math.floor(a) + 1;
  if (cMin > MAX_SERVERS) throw invalidInput('arrivalRate', `needs more than ${MAX_SERVERS} servers to be stable`);
  let b = erlangB(cMin - 1, a);
  const options: CostOption[] = [];
  let best = -1;
  for (let c = cMin; c <= MAX_SERVERS; c++) {
    b = erlangBNext(b, c, a);
    const Lq = (erlangCFromB(b, c, a) * lam) / (c * mu - lam);
    const waiting = waitingCost * (basis === 'L' ? Lq + a : Lq);
    const option = { servers: c, serverCost: serverCost * c, waitingCost: waiting, totalCost: serverCost * c + waiting };
    options.push(option);
    if (best < 0 || option.totalCost < options[best].totalCost) best = options.length - 1;
    if (options.length - 1 >= best + 2) break;
  }
  const chosen = options[best];
  const measures = mmc({ arrivalRate: lam, serviceRate: mu, servers: chosen.servers });
  const { model: _m, method: _me, warnings, ...rest } = measures;
  return {
    model: 'cost-optimum',
    method: {
      name: `Cost optimum over c (server cost × c + waiting cost × ${basis}, ${MMC_METHOD.name})`,
      exact: true,
      reference: `${MMC_METHOD.reference}; M. E. Dyer & L. G. Proll (1977), Management Science 23(9)`,
    },
    warnings: warnings.length ? warnings : utilisationWarnings(rest.rho as number),
    servers: chosen.servers,
    totalCost: chosen.totalCost,
    serverCost: chosen.serverCost,
    waitingCost: chosen.waitingCost,
    rho: rest.rho as number,
    options: options.slice(Math.max(0, best - 10)),
    measures: rest,
  };
}
