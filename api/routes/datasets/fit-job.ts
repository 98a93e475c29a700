import { randomBytes } from 'node:crypto';
import type { Readable } from 'node:stream';
import { GetObjectCommand } from '@aws-sdk/client-s3';
import { and, eq, lt, or } from 'drizzle-orm';
import { QueueError } from '../../../shared/queue/errors';
import type { Db } from '../../db/client';
import { datasets } from '../../db/schema/index';
import type { ObjectStorage } from '../../storage/object-storage';
import { DatasetInputError } from './dataset-problem';
import { fitStream } from './fit-stream';

/** A fitting job whose heartbeat is older than this is presumed dead (its process stopped). */
export const STALE_JOB_MS = 60_000;
// Progress is a UI nicety and a heartbeat (stale after a minute): one UPDATE a second is plenty.
const PROGRESS_EVERY_MS = 1000;

/** Thrown inside a run whose claim was taken over (remapped, reclaimed): it stops quietly. */
class LostClaim extends Error {}

export interface FitDeps {
  db: Db;
  storage: ObjectStorage;
}

/**
 * Claims a dataset's fit with one conditional UPDATE (mapped, or fitting with a dead heartbeat),
 * so only one process runs it; returns the token or null when another process has it.
 */
async function claim(db: Db, id: number): Promise<string | null> {
  const token = randomBytes(16).toString('hex');
  const now = new Date();
  const [res] = await db
    .update(datasets)
    .set({ status: 'fitting', jobToken: token, heartbeatAt: now, progress: 0, rowsRead: 0, problem: null, updatedAt: now })
    .where(and(eq(datasets.id, id), or(eq(datasets.status, 'mapped'), and(eq(datasets.status, 'fitting'), lt(datasets.heartbeatAt, new Date(now.getTime() - STALE_JOB_MS))))));
  return res.affectedRows === 1 ? token : null;
}

/** Runs one claimed fit to its end: every write checks the token, the final one sets the state. */
async function run(deps: FitDeps, id: number, token: string): Promise<void> {
  const { db, storage } = deps;
  const mine = and(eq(datasets.id, id), eq(datasets.jobToken, token));
  const [row] = await db.select().from(datasets).where(mine);
  if (!row?.mapping) return;
  let lastWrite = 0;
  try {
    const obj = await storage.client.send(new GetObjectCommand({ Bucket: storage.bucket, Key: row.objectKey }));
    const body = obj.Body as Readable;
    const fit = await fitStream(body, row.mapping, row.name, async ({ bytes, rows }) => {
      if (Date.now() - lastWrite < PROGRESS_EVERY_MS) return;
      lastWrite = Date.now();
      const [res] = await db.update(datasets).set({ progress: Math.min(0.99, bytes / Math.max(1, row.byteSize)), rowsRead: rows, heartbeatAt: new Date() }).where(mine);
      if (res.affectedRows !== 1) {
        body.destroy();
        throw new LostClaim();
      }
    });
    const now = new Date();
    await db.update(datasets).set({ status: 'fitted', fit, progress: 1, rowsRead: fit.rows, jobToken: null, fittedAt: now, updatedAt: now }).where(mine);
  } catch (err) {
    if (err instanceof LostClaim) return;
    const problem =
      err instanceof DatasetInputError
        ? err.toProblem()
        : err instanceof QueueError
          ? { message: `The data cannot be fitted: ${err.message}`, row: null, column: null }
          : { message: 'The fit stopped on a server error; try again. It has been logged.', row: null, column: null };
    if (!(err instanceof DatasetInputError || err instanceof QueueError)) console.error(`[datasets] fit of ${id} failed`, err);
    await db.update(datasets).set({ status: 'failed', problem, jobToken: null, fit: null, updatedAt: new Date() }).where(mine);
  }
}

/**
 * Starts the fit of a dataset in the background if it is waiting (or its job died) and this
 * process wins the claim. Resolves once the claim is decided, not when the fit ends; `whenDone`
 * lets callers (the demo seed, tests) wait for the end.
 */
export async function kickFit(deps: FitDeps, id: number): Promise<{ started: boolean; whenDone: Promise<void> }> {
  const token = await claim(deps.db, id);
  if (!token) return { started: false, whenDone: Promise.resolve() };
  const whenDone = run(deps, id, token).catch((err: unknown) => console.error(`[datasets] fit of ${id} could not record its end`, err));
  return { started: true, whenDone };
}

/** True when a listed dataset waits for a fit or its job died, so a read can restart it. */
export const needsKick = (d: { status: string; heartbeatAt: Date | null }): boolean =>
  d.status === 'mapped' || (d.status === 'fitting' && (d.heartbeatAt === null || Date.now() - d.heartbeatAt.getTime() > STALE_JOB_MS));
