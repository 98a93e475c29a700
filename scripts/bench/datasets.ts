/**
 * Fitting a 10⁶-row event log the way the fit job does it (file stream → record splitter and
 * timestamp reader → the engine's accumulators), timed and with its peak RSS measured in a child
 * process so the parent's memory (the generator, other suites) does not count. The child's CPU
 * time is reported beside the wall-clock time: on a loaded machine the two differ widely.
 * Run directly with `--child <file>`.
 */
import { spawnSync } from 'node:child_process';
import { createReadStream, createWriteStream } from 'node:fs';
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { once } from 'node:events';
import { fileURLToPath } from 'node:url';
import { eventLogLines } from '../../fakes/demo-event-log';
import { fitStream } from '../../api/routes/datasets/fit-stream';
import type { BenchRow, BenchSuite } from './types';

const ROWS = 1_000_000;
const TIME_TARGET_MS = 4000;
const RSS_TARGET_MB = 300;
const self = fileURLToPath(import.meta.url);

/** Writes about ROWS rows: 120 arrivals an hour around the clock for enough days. */
async function writeLog(file: string): Promise<number> {
  const out = createWriteStream(file);
  let rows = -1;
  const days = Math.ceil(ROWS / (120 * 24));
  for (const line of eventLogLines({ seed: 5, startDate: '2025-01-06', days, hourlyRates: Array.from({ length: 24 }, () => 120), weekendFactor: 1, serviceMeanSeconds: 200, serviceScv: 0.6, meanWaitSeconds: 30, channels: ['phone', 'chat'] })) {
    if (rows++ >= ROWS) break;
    if (!out.write(line)) await once(out, 'drain');
  }
  out.end();
  await once(out, 'finish');
  return rows;
}

async function child(file: string): Promise<void> {
  const t0 = performance.now();
  const cpu0 = process.cpuUsage();
  const fit = await fitStream(createReadStream(file, { highWaterMark: 256 * 1024 }), {
    kind: 'event_log', delimiter: 'comma', timestampFormat: 'iso8601', timeZone: 'Europe/Berlin', intervalMinutes: 15,
    timeColumn: 'arrived_at', serviceStartColumn: 'service_start', serviceEndColumn: 'service_end', channelColumn: 'channel', countColumn: null, handlingTimeColumn: null, handlingTimeUnit: 'seconds',
  }, 'bench.csv');
  const ms = performance.now() - t0;
  const cpu = process.cpuUsage(cpu0);
  // maxRSS is in kilobytes: the peak over the child's whole life.
  process.stdout.write(JSON.stringify({ ms, cpuMs: (cpu.user + cpu.system) / 1000, rows: fit.rows, rssMb: process.resourceUsage().maxRSS / 1024 }));
}

const suite: BenchSuite = async () => {
  const dir = await mkdtemp(path.join(tmpdir(), 'sojourn-bench-'));
  const file = path.join(dir, 'log.csv');
  try {
    const rows = await writeLog(file);
    const run = spawnSync(process.execPath, ['--import', 'tsx', self, '--child', file], { encoding: 'utf8', maxBuffer: 1 << 20 });
    if (run.status !== 0) throw new Error(run.stderr.slice(-500));
    const r = JSON.parse(run.stdout) as { ms: number; cpuMs: number; rows: number; rssMb: number };
    return [
      { area: 'datasets', what: `fit a ${rows.toExponential(0)}-row event log (parse + fit, 15 min, Europe/Berlin)`, measured: r.ms, unit: 'ms', target: `< ${TIME_TARGET_MS}`, ok: r.ms < TIME_TARGET_MS },
      { area: 'datasets', what: 'CPU time of that fit, user + system (informative)', measured: r.cpuMs, unit: 'ms', target: '', ok: true },
      { area: 'datasets', what: 'peak RSS of that fit (child process)', measured: r.rssMb, unit: 'MB', target: `< ${RSS_TARGET_MB}`, ok: r.rssMb < RSS_TARGET_MB },
    ] satisfies BenchRow[];
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
};

export default suite;

if (process.argv[1] === self && process.argv[2] === '--child') await child(process.argv[3]);
