import { Heap } from 'heap-js';
import { F, FIELD_COUNT } from './sample-stats';
import type { Sampler } from './samplers';
import type { Rng } from './rng';

/** One simulated run of the FCFS G/G/c/K+M queue, observed over a window split into samples. */
export interface SegmentPlan {
  servers: number;
  /** Total room K; Infinity when unlimited. */
  capacity: number;
  /** Rate of exponential patience; 0 when nobody abandons. */
  patienceRate: number;
  /** Service-level threshold; Infinity when not asked for. */
  t: number;
  interarrival: Sampler;
  service: Sampler;
  rng: Rng;
  unit: 'customers' | 'time';
  warmup: number;
  horizon: number;
  samples: number;
  /** Row offset of this segment's samples in `stats`. */
  firstSample: number;
  stats: Float64Array;
  /** Called every `checkEvery` events with the fraction of this segment done; may throw to stop. */
  tick: (fraction: number) => void;
  checkEvery: number;
}

interface Waiting {
  at: number;
  qid: number;
}

/**
 * Simulates one segment and returns the number of events processed (arrivals, departures,
 * abandonments). The system starts empty at time 0. Busy servers are a heap of completion
 * times (heap-js); FCFS waiting customers sit in a ring buffer; exponential patience
 * deadlines are a second heap with lazy deletion of customers that reached a server first.
 * A customer's wait and sojourn are known when service starts, so departures need no identity.
 */
export function runSegment(p: SegmentPlan): number {
  const { servers: c, capacity: K, t: slT, interarrival, service, stats, unit, warmup: w, horizon: H, samples: B } = p;
  // Field offsets copied to locals: module-namespace property reads are slow in the hot loop under some loaders.
  const { arrivals: fArrivals, blocked: fBlocked, admitted: fAdmitted, abandoned: fAbandoned, waited: fWaited, withinT: fWithinT } = F;
  const { sumWq: fSumWq, sumW: fSumW, areaQ: fAreaQ, areaL: fAreaL, areaBusy: fAreaBusy, duration: fDuration, served: fServed } = F;
  const NF = FIELD_COUNT;
  const busy = new Heap<number>((a, b) => a - b);
  const patience = p.patienceRate > 0 ? new Heap<Waiting>((a, b) => a.at - b.at) : null;
  const meanPatience = p.patienceRate > 0 ? 1 / p.patienceRate : 0;
  let mask = 1023;
  let qArr = new Float64Array(mask + 1);
  let qSample = new Int32Array(mask + 1);
  let qState = new Uint8Array(mask + 1);
  let head = 0;
  let tail = 0;
  let nq = 0;
  let pending = 0; // customers of the window still waiting
  let tLast = 0;
  let cur = -1; // sample receiving time integrals; −1 before the window, B after it
  let nextBoundary = unit === 'time' ? w : Infinity;
  let k = 0; // arrivals so far
  let nextArrival = interarrival();
  let events = 0;
  let nb = 0; // busy servers, mirrored from the heap to save getter calls in the hot loop
  let tDep = Infinity; // earliest completion, refreshed after every heap change
  const endTime = w + H;
  const mask32 = p.checkEvery - 1;

  // Time integrals of the current sample live in locals and are written out when the sample changes.
  let areaQ = 0, areaL = 0, areaBusy = 0, duration = 0;
  const commit = (): void => {
    if (cur >= 0 && cur < B) {
      const o = (p.firstSample + cur) * NF;
      stats[o + fAreaQ] += areaQ;
      stats[o + fAreaL] += areaL;
      stats[o + fAreaBusy] += areaBusy;
      stats[o + fDuration] += duration;
    }
    areaQ = areaL = areaBusy = duration = 0;
  };
  const flush = (t: number): void => {
    const dt = t - tLast;
    areaQ += nq * dt;
    areaL += (nq + nb) * dt;
    areaBusy += nb * dt;
    duration += dt;
    tLast = t;
  };
  /** Records a customer starting service at t and returns its completion time. */
  const startService = (t: number, arrivedAt: number, s: number): number => {
    const dur = service();
    if (s < 0 || s >= B) return t + dur;
    const o = (p.firstSample + s) * NF;
    const wait = t - arrivedAt;
    stats[o + fServed] += 1;
    stats[o + fSumWq] += wait;
    stats[o + fSumW] += wait + dur;
    if (wait <= slT) stats[o + fWithinT] += 1;
    return t + dur;
  };
  const grow = (): void => {
    const size = (mask + 1) * 2;
    const a = new Float64Array(size), s = new Int32Array(size), st = new Uint8Array(size);
    for (let q = head; q < tail; q++) {
      a[q & (size - 1)] = qArr[q & mask];
      s[q & (size - 1)] = qSample[q & mask];
      st[q & (size - 1)] = qState[q & mask];
    }
    qArr = a; qSample = s; qState = st; mask = size - 1;
  };

  for (;;) {
    if (cur >= B && pending === 0) break;
    if ((++events & mask32) === 0) p.tick(unit === 'time' ? Math.min(1, tLast / endTime) : Math.min(1, k / (w + H)));
    const tAb = patience !== null && patience.length > 0 ? (patience.peek() as Waiting).at : Infinity;
    // Ties: a departure first (it frees a server for a customer arriving at that instant), then an abandonment.
    const kind = tDep <= tAb && tDep <= nextArrival ? 0 : tAb <= nextArrival ? 1 : 2;
    const t = kind === 0 ? tDep : kind === 1 ? tAb : nextArrival;
    if (t === Infinity) break;
    while (t >= nextBoundary) {
      flush(nextBoundary);
      commit();
      cur += 1;
      nextBoundary = cur >= B ? Infinity : w + ((cur + 1) * H) / B;
    }
    if (kind === 0) {
      flush(t);
      while (nq > 0 && qState[head & mask] === 0) head++;
      if (nq > 0) {
        const q = head++;
        qState[q & mask] = 0;
        nq--;
        const s = qSample[q & mask];
        if (s >= 0 && s < B) pending--;
        busy.replace(startService(t, qArr[q & mask], s)); // the freed server takes the next customer
      } else {
        busy.pop();
        nb--;
      }
      tDep = nb > 0 ? (busy.peek() as number) : Infinity;
    } else if (kind === 1 && patience !== null) {
      const e = patience.pop() as Waiting;
      if (e.qid < head || qState[e.qid & mask] === 0) continue;
      flush(t);
      qState[e.qid & mask] = 0;
      nq--;
      const s = qSample[e.qid & mask];
      if (s >= 0 && s < B) {
        pending--;
        const o = (p.firstSample + s) * NF;
        const wait = t - qArr[e.qid & mask];
        stats[o + fAbandoned] += 1;
        if (wait <= slT) stats[o + fWithinT] += 1; // P(Wq ≤ t) counts time in queue, however it ended
        stats[o + fSumWq] += wait;
        stats[o + fSumW] += wait;
      }
    } else {
      flush(t);
      const s = unit === 'time' ? cur : k < w ? -1 : k >= w + H ? B : Math.floor(((k - w) * B) / H);
      if (s !== cur) {
        commit();
        cur = s;
      }
      if (s >= B) {
        nextArrival = Infinity; // later arrivals cannot change a window customer's outcome under FCFS
        continue;
      }
      k++;
      nextArrival = t + interarrival();
      const o = (p.firstSample + s) * NF;
      const counted = s >= 0 && s < B;
      if (counted) stats[o + fArrivals] += 1;
      if (nb + nq >= K) {
        if (counted) stats[o + fBlocked] += 1;
        continue;
      }
      if (counted) stats[o + fAdmitted] += 1;
      if (nb < c) {
        busy.add(startService(t, t, s));
        nb++;
        tDep = busy.peek() as number;
        continue;
      }
      if (tail - head > mask) grow();
      const q = tail++;
      qArr[q & mask] = t;
      qSample[q & mask] = s;
      qState[q & mask] = 1;
      nq++;
      if (counted) {
        pending++;
        stats[o + fWaited] += 1;
      }
      if (patience !== null) patience.push({ at: t - Math.log(p.rng.next()) * meanPatience, qid: q });
    }
  }
  commit();
  return events;
}
