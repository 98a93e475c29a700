/**
 * Simulation checks in flight and recently finished, held in this process's memory.
 *
 * Scale: a job lives only in the API process that started it. With several API processes behind
 * a load balancer, GET and DELETE must reach that same process — sticky routing on the session
 * cookie, or a job table in MariaDB that workers drain (design.md "Scale"). Left for later; one
 * process is what we run today.
 */
import { randomUUID } from 'node:crypto';
import type { QueueMeasures } from '../../../shared/queue/result';
import { compareWithAnalytic, type SimulationComparison } from '../../../shared/queue/sim/from-spec-comparison';
import type { SimulationJob, SimulationJobStatus } from '../../../shared/queue/sim/from-spec-job';
import type { SimulationInput, SimulationResult } from '../../../shared/queue/sim/index';
import { notFound } from '../../http-error';
import { createSimulationPool, type RunEvent, type RunHandle } from './simulation-pool';

export interface SimulationJobsOptions {
  /** Simulation threads at once in this process; each takes one core for 1–3 s. */
  maxRunning?: number;
  /** How long a finished job can still be read. */
  ttlMs?: number;
  /** After a cancel, how long a thread may take to notice the flag before it is terminated. */
  graceMs?: number;
}

interface JobRecord {
  id: string;
  ownerId: number;
  status: SimulationJobStatus;
  progress: number;
  startedAt: Date;
  finishedAt?: number;
  result?: SimulationResult;
  comparison?: SimulationComparison;
  error?: { code: string; message: string };
  handle?: RunHandle;
}

type Analytic = QueueMeasures & { method?: { exact: boolean } };

export type SimulationJobs = ReturnType<typeof createSimulationJobs>;

/** The job store over a small thread pool; `start` returns null when the pool is full (the router answers 429). */
export function createSimulationJobs({ maxRunning = 2, ttlMs = 10 * 60_000, graceMs = 2_000 }: SimulationJobsOptions = {}) {
  const jobs = new Map<string, JobRecord>();
  const pool = createSimulationPool({ size: maxRunning, graceMs });

  // Lazy expiry on every call: no timer to leak, and nothing to expire while nobody asks.
  const sweep = (): void => {
    const now = Date.now();
    for (const [id, job] of jobs) if (job.finishedAt !== undefined && now - job.finishedAt > ttlMs) jobs.delete(id);
  };

  const finish = (job: JobRecord, status: SimulationJobStatus, extra: Partial<JobRecord> = {}): void => {
    if (job.status !== 'running') return; // a cancel already settled it
    Object.assign(job, { status, finishedAt: Date.now(), ...extra });
  };

  const onEvent = (job: JobRecord, analytic: Analytic) => (e: RunEvent): void => {
    if (e.type === 'progress') {
      if (job.status === 'running') job.progress = Math.min(1, Math.max(0, e.fraction));
    } else if (e.type === 'done') {
      finish(job, 'done', { progress: 1, result: e.result, comparison: compareWithAnalytic(analytic, e.result) });
    } else if (e.type === 'failed') {
      finish(job, 'failed', { error: { code: e.code, message: e.message } });
    } else if (e.type === 'crashed') {
      finish(job, 'failed', { error: { code: 'internal', message: 'The simulation stopped with an error on the server. It has been logged.' } });
    }
  };

  const view = (job: JobRecord): SimulationJob => ({
    id: job.id,
    status: job.status,
    progress: job.progress,
    startedAt: job.startedAt.toISOString(),
    ...(job.result ? { result: job.result } : {}),
    ...(job.comparison ? { comparison: job.comparison } : {}),
    ...(job.error ? { error: job.error } : {}),
  });

  const owned = (ownerId: number, id: string): JobRecord => {
    sweep();
    const job = jobs.get(id);
    // Someone else's job is "not found", so ids reveal nothing.
    if (!job || job.ownerId !== ownerId) throw notFound('That simulation');
    return job;
  };

  return {
    maxRunning,

    /** Starts `input`; its result is compared with `analytic` when it finishes. Null when every thread is busy. */
    start(ownerId: number, input: SimulationInput, analytic: Analytic): SimulationJob | null {
      sweep();
      const job: JobRecord = { id: randomUUID(), ownerId, status: 'running', progress: 0, startedAt: new Date() };
      const handle = pool.tryRun(input, onEvent(job, analytic));
      if (!handle) return null;
      job.handle = handle;
      jobs.set(job.id, job);
      return view(job);
    },

    get: (ownerId: number, id: string): SimulationJob => view(owned(ownerId, id)),

    /** Stops a running job at once (its thread follows within milliseconds); a finished job is returned unchanged. */
    cancel(ownerId: number, id: string): SimulationJob {
      const job = owned(ownerId, id);
      if (job.status === 'running') {
        job.handle?.cancel();
        finish(job, 'cancelled');
      }
      return view(job);
    },

    /** Stops every thread (process shutdown, tests). */
    close: (): Promise<void> => pool.close(),
  };
}
