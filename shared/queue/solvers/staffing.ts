/**
 * Staffing solver: the fewest servers meeting a criterion. Each criterion is monotone in c, so
 * the answer is the first count that meets it:
 * - serviceLevel P(Wq ≤ t) ≥ target and meanWait Wq ≤ target on Erlang C (M/M/c), by one pass of
 *   Jagerman's recursion over c (O(c) in total), or on Erlang-A (M/M/c+M) when a patience rate is
 *   given, by bisection over c;
 * - blocking: Erlang B ≤ target (M/M/c/c), one pass of the recursion;
 * - utilization: λ/(cμ) ≤ target, closed form;
 * - abandonment: P(abandon) ≤ target on Erlang-A, by bisection over c.
 */
import { invalidInput } from '../errors';
import { MAX_SERVERS } from '../limits';
import { erlangBNext, erlangCFromB } from '../numeric/erlang-b';
import { erlangA, ERLANG_A_METHOD } from '../models/erlang-a';
import { MMC_METHOD, mmc } from '../models/mmc';
import { MMCC_METHOD, mmcc } from '../models/mmcc';
import type { Method, QueueMeasures, QueueWarning, StaffingOption, StaffingResult } from '../result';
import type { StaffingCriterion } from '../spec';
import { utilisationWarnings } from '../warnings';

/** What the staffing solvers need (shared by staffing and interval staffing). */
export interface StaffingProblem {
  arrivalRate: number;
  serviceRate: number;
  criterion: StaffingCriterion;
  target: number;
  t?: number;
  patienceRate?: number;
}

/** True when the criterion is judged on M/M/c+M (a patience rate was given, or it is abandonment). */
const usesErlangA = (p: StaffingProblem): boolean => p.patienceRate !== undefined && p.criterion !== 'blocking' && p.criterion !== 'utilization';

/** Value of the criterion with c servers; null when M/M/c is unstable there. */
export function criterionValue(p: StaffingProblem, c: number): number | null {
  const { arrivalRate: lam, serviceRate: mu } = p;
  if (p.criterion === 'utilization') return lam / (c * mu);
  if (p.criterion === 'blocking') return mmcc({ arrivalRate: lam, serviceRate: mu, servers: c }).probBlock as number;
  if (usesErlangA(p)) {
    const r = erlangA({ arrivalRate: lam, serviceRate: mu, servers: c, patienceRate: p.patienceRate as number, t: p.t });
    return (p.criterion === 'serviceLevel' ? r.serviceLevel : p.criterion === 'meanWait' ? r.Wq : r.probAbandon) as number;
  }
  if (lam >= c * mu) return null;
  const r = mmc({ arrivalRate: lam, serviceRate: mu, servers: c, t: p.t });
  return (p.criterion === 'serviceLevel' ? r.serviceLevel : r.Wq) as number;
}

/** Whether a criterion value meets the target (service level is "at least", the others "at most"). */
export function meetsTarget(p: StaffingProblem, value: number | null): boolean {
  if (value === null) return false;
  return p.criterion === 'serviceLevel' ? value >= p.target : value <= p.target;
}

const unreachable = (): Error => invalidInput('target', `cannot be met with at most ${MAX_SERVERS} servers`);

/** One pass of Jagerman's recursion: the first c whose Erlang B / C criterion meets the target. */
function scanErlang(p: StaffingProblem): number {
  const { arrivalRate: lam, serviceRate: mu, target } = p;
  const a = lam / mu;
  let b = 1;
  for (let c = 1; c <= MAX_SERVERS; c++) {
    b = erlangBNext(b, c, a);
    if (p.criterion === 'blocking') {
      if (b <= target) return c;
      continue;
    }
    if (lam >= c * mu) continue;
    const C = erlangCFromB(b, c, a);
    const gap = c * mu - lam;
    if (p.criterion === 'meanWait') {
      if (C / gap <= target) return c;
    } else {
      const oneMinusC = ((c - a) * (1 - b)) / (c - a + a * b);
      if (oneMinusC - C * Math.expm1(-gap * (p.t as number)) >= target) return c;
    }
  }
  throw unreachable();
}

/** Bisection over c for a criterion that is monotone in c and costly to evaluate. */
function bisect(p: StaffingProblem): number {
  let lo = 0; // does not meet (0 servers never does)
  let hi = Math.max(1, Math.ceil(p.arrivalRate / p.serviceRate));
  while (!meetsTarget(p, criterionValue(p, hi))) {
    lo = hi;
    if (hi >= MAX_SERVERS) throw unreachable();
    hi = Math.min(MAX_SERVERS, hi * 2);
  }
  while (hi - lo > 1) {
    const mid = Math.floor((lo + hi) / 2);
    if (meetsTarget(p, criterionValue(p, mid))) hi = mid;
    else lo = mid;
  }
  return hi;
}

/** The fewest servers meeting the problem's criterion (0 when there is no demand). */
export function minimumServers(p: StaffingProblem): number {
  if (p.arrivalRate === 0) return 0;
  if (p.criterion === 'utilization') {
    let c = Math.max(1, Math.ceil(p.arrivalRate / (p.serviceRate * p.target)));
    while (c > 1 && p.arrivalRate / ((c - 1) * p.serviceRate) <= p.target) c--;
    while (p.arrivalRate / (c * p.serviceRate) > p.target) c++;
    if (c > MAX_SERVERS) throw unreachable();
    return c;
  }
  return usesErlangA(p) ? bisect(p) : scanErlang(p);
}

/** The method a staffing answer rests on. */
export function staffingMethod(p: StaffingProblem): Method {
  const base = p.criterion === 'blocking' ? MMCC_METHOD : usesErlangA(p) ? ERLANG_A_METHOD : MMC_METHOD;
  const how = p.criterion === 'utilization' ? 'closed form' : 'exhaustive search over c of';
  return { name: `Fewest servers for ${p.criterion} (${how} ${base.name})`, exact: base.exact, reference: base.reference };
}

function measuresAt(p: StaffingProblem, c: number): QueueMeasures {
  const common = { arrivalRate: p.arrivalRate, serviceRate: p.serviceRate, servers: c };
  if (p.criterion === 'blocking') return strip(mmcc(common));
  if (usesErlangA(p)) return strip(erlangA({ ...common, patienceRate: p.patienceRate as number, t: p.t }));
  if (p.arrivalRate >= c * p.serviceRate) return { rho: p.arrivalRate / (c * p.serviceRate) };
  return strip(mmc({ ...common, t: p.t }));
}

function strip<T extends { model?: unknown; method?: unknown; warnings?: unknown }>(r: T): QueueMeasures {
  const { model: _m, method: _me, warnings: _w, ...rest } = r;
  return rest as QueueMeasures;
}

export function staffingOption(p: StaffingProblem, c: number): StaffingOption {
  const achieved = criterionValue(p, c);
  return { servers: c, achieved, rho: p.arrivalRate / (c * p.serviceRate), meetsTarget: meetsTarget(p, achieved) };
}

/** Staffing answer for one arrival rate: the count, what it achieves, and c − 1 / c + 1. */
export function staffing(p: StaffingProblem): Omit<StaffingResult, 'model'> & { model: 'staffing' } {
  if (p.criterion === 'serviceLevel' && p.t === undefined) throw invalidInput('t', 'the service-level criterion needs a waiting-time threshold t');
  if (p.criterion === 'abandonment' && p.patienceRate === undefined) throw invalidInput('patienceRate', 'the abandonment criterion needs a patience rate');
  const c = minimumServers(p);
  const a = p.arrivalRate / p.serviceRate;
  const options = [c - 1, c, c + 1].filter((k) => k >= 1 && k <= MAX_SERVERS).map((k) => staffingOption(p, k));
  const chosen = options.find((o) => o.servers === c);
  const rho = c > 0 ? p.arrivalRate / (c * p.serviceRate) : 0;
  const warnings: QueueWarning[] = utilisationWarnings(rho);
  if (!usesErlangA(p) && (p.criterion === 'serviceLevel' || p.criterion === 'meanWait')) {
    warnings.push({
      code: 'abandonment_ignored',
      message: 'Erlang C assumes nobody abandons; where callers hang up it overstates waiting and staff (give a patience rate to use M/M/c+M).',
    });
  }
  return {
    model: 'staffing',
    method: staffingMethod(p),
    warnings,
    criterion: p.criterion,
    target: p.target,
    servers: c,
    achieved: chosen?.achieved ?? zeroDemandValue(p),
    rho,
    options,
    sqrtStaffingBeta: a > 0 ? (c - a) / Math.sqrt(a) : 0,
    measures: c > 0 ? measuresAt(p, c) : {},
  };
}

/** The criterion's value when nobody arrives. */
export function zeroDemandValue(p: StaffingProblem): number {
  return p.criterion === 'serviceLevel' ? 1 : 0;
}
