/** A labelled progress bar (the native element, so assistive technology reads the value). */
export function ProgressBar({ value, label }: { value: number; label: string }) {
  return (
    <div className="flex items-center gap-3">
      <progress value={value} max={1} aria-label={label} className="h-2 w-full overflow-hidden rounded-full accent-accent [&::-webkit-progress-bar]:bg-quiet-tint [&::-webkit-progress-value]:bg-accent" />
      <span className="w-12 text-right text-sm tabular-nums text-ink-soft">{Math.round(value * 100)} %</span>
    </div>
  );
}
