/**
 * API under load: autocannon against the running app (SOJOURN_URL, seeded through DATABASE_URL),
 * 50 connections, each a signed-in consultant cycling through what the editor does: read a study
 * (GET /api/studies/:id with its document and stored results, GET the engagement's assumption
 * register) and compute (POST /api/compute of an M/M/c spec and of a staffing solve). Every request
 * carries the session cookie and state-changing ones the CSRF header, as the web client sends them.
 * Targets: >= 1,000 requests/s, p99 < 100 ms, no errors or non-2xx answers.
 */
import autocannon from 'autocannon';
import { CSRF_HEADER, CSRF_HEADER_VALUE } from '../../shared/api-error';
import { cpus } from 'node:os';
import { createLoadFixture, STUDY_BLOCKS } from './api-load-fixture';
import { ownCpuMs, processCpuMs } from './process-cpu';
import type { BenchRow, BenchSuite } from './types';

export const CONNECTIONS = 50;
const WARM_UP_S = 5;
const DURATION_S = Number(process.env.BENCH_API_SECONDS ?? 20);

const RATE_TARGET = 1000;
const P99_TARGET_MS = 100;

/** A help line at its busiest hour (per hour): 180 calls, 4.5-minute handling. */
const MMC = { model: 'M/M/c', arrivalRate: 180, serviceRate: 13.33, servers: 16, t: 1 / 3, percentile: 0.9 };
const STAFFING = { model: 'staffing', arrivalRate: 180, serviceRate: 13.33, criterion: 'serviceLevel', target: 0.8, t: 1 / 3 };

function requests(studyId: number, engagementId: number, cookies: string[]): autocannon.Request[] {
  let next = 0;
  // Each request takes the next session, so the 50 connections spread over every signed-in person.
  const withSession = (req: autocannon.Request): autocannon.Request => ({ ...req, headers: { ...req.headers, cookie: cookies[next++ % cookies.length] } });
  const post = (body: object): autocannon.Request => ({
    method: 'POST',
    path: '/api/compute',
    headers: { 'content-type': 'application/json', [CSRF_HEADER]: CSRF_HEADER_VALUE },
    body: JSON.stringify(body),
    setupRequest: withSession,
  });
  const kinds: Record<string, autocannon.Request[]> = {
    study: [{ method: 'GET', path: `/api/studies/${studyId}`, setupRequest: withSession }],
    register: [{ method: 'GET', path: `/api/engagements/${engagementId}/assumptions`, setupRequest: withSession }],
    compute: [post(MMC), post(STAFFING)],
    session: [{ method: 'GET', path: '/api/auth/me', setupRequest: withSession }],
  };
  // BENCH_API_ONLY=study|register|compute|session measures one kind alone (for profiling).
  const only = process.env.BENCH_API_ONLY;
  if (only) {
    if (!kinds[only]) throw new Error(`BENCH_API_ONLY must be one of ${Object.keys(kinds).join(', ')}`);
    return kinds[only];
  }
  return [...kinds.study!, ...kinds.register!, ...kinds.compute!];
}

/**
 * What the cores would serve with nothing else running: their CPU time divided by the CPU time one
 * request costs the app, MariaDB and the load generator together. Only when this bench started
 * the app and the database (their pids are known); contention inflates CPU time too, so it errs low.
 */
function cpuRow(before: (number | null)[], after: (number | null)[], requests: number): BenchRow[] {
  if (before.some((v) => v === null) || after.some((v) => v === null) || requests === 0) return [];
  const [app, db, gen] = after.map((v, i) => (v! - before[i]!) / requests);
  const rate = (cpus().length * 1000) / (app + db + gen);
  const what = `requests/s the ${cpus().length} cores would serve alone, from CPU per request (app ${app.toFixed(2)}, MariaDB ${db.toFixed(2)}, autocannon ${gen.toFixed(2)} ms)`;
  return [{ area: 'api', what, measured: rate, unit: 'req/s', target: `>= ${RATE_TARGET}`, ok: rate >= RATE_TARGET }];
}

interface Window {
  /** The whole run's totals (warm-up included) for errors, timeouts and non-2xx answers. */
  result: autocannon.Result;
  /** Latency (ms) of each answer that arrived in the measured window. */
  latencies: number[];
  cpuStart: (number | null)[];
  cpuEnd: (number | null)[];
}

/**
 * One continuous run: WARM_UP_S of warm-up (JIT, the pool's connections, MariaDB's buffer pool),
 * then DURATION_S measured on the same 50 open connections. A second run would open 50 new
 * connections at once, and the first answers on them (queued behind the connects) would be counted
 * as steady-state latency.
 */
function steadyWindow(opts: autocannon.Options, cpuNow: () => (number | null)[]): Promise<Window> {
  const latencies: number[] = [];
  let measuring = false;
  let cpuStart: (number | null)[] = [];
  return new Promise((resolve, reject) => {
    const run = autocannon({ ...opts, duration: WARM_UP_S + DURATION_S }, (err, result) => {
      if (err) reject(err);
      else resolve({ result, latencies, cpuStart, cpuEnd: cpuNow() });
    });
    run.on('response', (_client, _status, _bytes, ms) => {
      if (measuring) latencies.push(ms);
    });
    setTimeout(() => {
      measuring = true;
      cpuStart = cpuNow();
    }, WARM_UP_S * 1000);
  });
}

/** The q-quantile (0..1) of the values, rounded to 0.1 ms; sorts in place. */
function percentile(values: number[], q: number): number {
  if (values.length === 0) return NaN;
  values.sort((a, b) => a - b);
  return Math.round(values[Math.min(values.length - 1, Math.ceil(q * values.length) - 1)]! * 10) / 10;
}

const suite: BenchSuite = async () => {
  const appUrl = process.env.SOJOURN_URL;
  const databaseUrl = process.env.DATABASE_URL;
  if (!appUrl || !databaseUrl) {
    return [{ area: 'api', what: 'API load: skipped, needs SOJOURN_URL and DATABASE_URL of a running stack (or neither, for a throwaway one)', measured: NaN, unit: '', target: `>= ${RATE_TARGET} req/s`, ok: true }];
  }
  const fixture = await createLoadFixture(appUrl, databaseUrl, CONNECTIONS);
  try {
    const opts = { url: appUrl, connections: CONNECTIONS, timeout: 10, requests: requests(fixture.studyId, fixture.engagementId, fixture.cookies) };
    const pids = [Number(process.env.BENCH_APP_PID), Number(process.env.BENCH_DB_PID)];
    const cpuNow = () => [...pids.map((pid) => (pid ? processCpuMs(pid) : null)), ownCpuMs()];
    const w = await steadyWindow(opts, cpuNow);
    const r = w.result;
    const failed = r.errors + r.timeouts + r.non2xx;
    const rate = w.latencies.length / DURATION_S;
    const p = (q: number) => percentile(w.latencies, q);
    const setup = `${CONNECTIONS} connections, ${DURATION_S} s, ${fixture.cookies.length} sessions`;
    const mix = process.env.BENCH_API_ONLY ? `${process.env.BENCH_API_ONLY} requests only` : `study GET (${STUDY_BLOCKS} blocks) + register GET + 2 compute POSTs`;
    return [
      { area: 'api', what: `requests/s, ${mix}, ${setup}`, measured: rate, unit: 'req/s', target: `>= ${RATE_TARGET}`, ok: rate >= RATE_TARGET },
      { area: 'api', what: `p99 latency (p50 ${p(0.5)} ms, p97.5 ${p(0.975)} ms, max ${p(1)} ms), ${setup}`, measured: p(0.99), unit: 'ms', target: `< ${P99_TARGET_MS} ms`, ok: p(0.99) < P99_TARGET_MS },
      ...cpuRow(w.cpuStart, w.cpuEnd, w.latencies.length),
      { area: 'api', what: `errors + timeouts + non-2xx of ${r.requests.total} requests, warm-up included (${r.errors} + ${r.timeouts} + ${r.non2xx})`, measured: failed, unit: '', target: '0', ok: failed === 0 },
    ];
  } finally {
    await fixture.cleanup();
  }
};

export default suite;
