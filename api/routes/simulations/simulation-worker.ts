/**
 * A long-lived simulation thread of the pool: waits for a run request, runs it off the main thread
 * (so a 1–3 s run never blocks other requests), answers with WorkerMessage, and waits again.
 * Kept alive between checks because starting a thread that loads TypeScript costs seconds.
 * The main thread asks a run to stop by setting the shared flag, which simulate() polls.
 */
import { parentPort } from 'node:worker_threads';
import { QueueError } from '../../../shared/queue/errors';
import { simulate, SimulationStoppedError, type SimulationInput, type SimulationResult } from '../../../shared/queue/sim/index';

export interface RunRequest {
  input: SimulationInput;
  /** Int32 flag: 1 = stop as soon as possible. */
  stop: SharedArrayBuffer;
}

export type WorkerMessage =
  | { type: 'progress'; fraction: number }
  | { type: 'done'; result: SimulationResult }
  | { type: 'stopped' }
  | { type: 'failed'; code: string; message: string };

/** Progress messages at most this often; the page polls every ~300 ms anyway. */
const PROGRESS_EVERY_MS = 100;

const post = (m: WorkerMessage): void => parentPort?.postMessage(m);

function run({ input, stop }: RunRequest): void {
  const flag = new Int32Array(stop);
  let lastPost = 0;
  try {
    const result = simulate(input, {
      checkEvery: 16_384,
      shouldStop: () => Atomics.load(flag, 0) === 1,
      onProgress: (fraction) => {
        const now = performance.now();
        if (now - lastPost < PROGRESS_EVERY_MS) return;
        lastPost = now;
        post({ type: 'progress', fraction });
      },
    });
    post({ type: 'done', result });
  } catch (err) {
    if (err instanceof SimulationStoppedError) post({ type: 'stopped' });
    else if (err instanceof QueueError) post({ type: 'failed', code: err.code, message: err.message });
    else throw err; // an 'error' event in the pool, logged there; the thread is replaced
  }
}

// Requests sent before this listener existed were buffered by the port, so none is lost.
parentPort?.on('message', run);
