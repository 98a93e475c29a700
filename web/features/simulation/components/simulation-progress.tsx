/** A determinate progress bar for a running check; the percentage is also written out. */
export function SimulationProgress({ fraction }: { fraction: number }) {
  const percent = Math.round(Math.min(1, Math.max(0, fraction)) * 100);
  return (
    <div className="flex min-w-48 flex-1 items-center gap-3">
      <div
        role="progressbar"
        aria-label="Simulation progress"
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={percent}
        aria-valuetext={percent === 0 ? 'Starting' : `${percent} % done`}
        className="h-2 flex-1 overflow-hidden rounded-full bg-quiet-tint"
      >
        <div className="h-full rounded-full bg-accent transition-[width] duration-300" style={{ width: `${percent}%` }} />
      </div>
      <span className="num w-20 text-right text-sm text-ink-soft">{percent === 0 ? 'Starting…' : `${percent} %`}</span>
    </div>
  );
}
