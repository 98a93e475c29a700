/**
 * A background pass (mail delivery, the release sweep) that runs at most once at a time: a call
 * while one is under way joins it. It never throws; a failed pass (the database down for a
 * moment, say) counts as 0 and the next one tries again. `start` repeats it on a timer that never
 * keeps a stopping process alive; `stop` clears the timer and waits for a pass under way.
 */
export function periodicPass(pass: () => Promise<number>) {
  let timer: NodeJS.Timeout | null = null;
  let running: Promise<number> | null = null;
  const run = (): Promise<number> => {
    running ??= pass()
      .catch(() => 0)
      .finally(() => {
        running = null;
      });
    return running;
  };
  return {
    run,
    start(intervalMs: number): void {
      timer ??= setInterval(() => void run(), intervalMs);
      timer.unref();
    },
    async stop(): Promise<void> {
      if (timer) clearInterval(timer);
      timer = null;
      await running;
    },
  };
}
