import { Worker } from 'node:worker_threads';
import type { SimulationInput } from '../../../shared/queue/sim/index';
import type { RunRequest, WorkerMessage } from './simulation-worker';

const BOOT = new URL('./simulation-worker-boot.mjs', import.meta.url);
const ENTRY = new URL('./simulation-worker.ts', import.meta.url).href;

/** What a run reports back; exactly one of done/stopped/failed ends it. */
export type RunEvent = WorkerMessage | { type: 'crashed' };

export interface RunHandle {
  /** Sets the stop flag; terminates the thread if it has not stopped after the grace period. */
  cancel(): void;
}

interface Slot {
  worker: Worker;
  /** Listener of the run in progress, or null when the thread is idle. */
  current: ((e: RunEvent) => void) | null;
  stop: Int32Array | null;
}

const ENDS = new Set<RunEvent['type']>(['done', 'stopped', 'failed', 'crashed']);

/**
 * A small pool of simulation threads, created on first use and kept: starting a thread that loads
 * TypeScript takes seconds, a run takes one to three. At most `size` runs at once; `tryRun`
 * answers null when every thread is busy, and the caller decides (the API answers 429).
 * A thread that crashes or is terminated is dropped and a fresh one is started on demand.
 */
export function createSimulationPool({ size, graceMs }: { size: number; graceMs: number }) {
  const slots = new Set<Slot>();

  const spawn = (): Slot => {
    const worker = new Worker(BOOT, { workerData: { entry: ENTRY } });
    const slot: Slot = { worker, current: null, stop: null };
    const emit = (e: RunEvent): void => {
      const listener = slot.current;
      if (ENDS.has(e.type)) {
        slot.current = null;
        slot.stop = null;
      }
      listener?.(e);
    };
    worker.on('message', (m: WorkerMessage) => emit(m));
    worker.on('error', (err) => {
      console.error('[simulations] a simulation thread failed', err);
      emit({ type: 'crashed' });
    });
    worker.on('exit', () => {
      slots.delete(slot);
      emit({ type: 'crashed' });
    });
    // Idle threads must not hold the process open at shutdown (or at the end of a test file);
    // after the listeners, since attaching a 'message' listener refs the port again.
    worker.unref();
    slots.add(slot);
    return slot;
  };

  const idle = (): Slot | undefined => [...slots].find((s) => s.current === null);

  return {
    /** Starts `input` on an idle thread and reports to `listener`; null when all `size` threads are busy. */
    tryRun(input: SimulationInput, listener: (e: RunEvent) => void): RunHandle | null {
      const slot = idle() ?? (slots.size < size ? spawn() : undefined);
      if (!slot) return null;
      const buffer = new SharedArrayBuffer(4);
      slot.current = listener;
      slot.stop = new Int32Array(buffer);
      const request: RunRequest = { input, stop: buffer };
      slot.worker.postMessage(request);
      const stop = slot.stop;
      return {
        cancel(): void {
          if (slot.current !== listener) return; // already finished
          Atomics.store(stop, 0, 1);
          // simulate() polls the flag every few milliseconds; this is only for a thread that does not answer.
          setTimeout(() => {
            if (slot.current === listener) void slot.worker.terminate();
          }, graceMs).unref();
        },
      };
    },

    async close(): Promise<void> {
      await Promise.all([...slots].map((s) => s.worker.terminate()));
    },
  };
}
