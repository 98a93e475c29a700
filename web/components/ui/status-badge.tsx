export type StatusTone = 'ok' | 'warn' | 'danger' | 'quiet' | 'accent';

const tones: Record<StatusTone, string> = {
  ok: 'bg-ok-tint text-ok',
  warn: 'bg-warn-tint text-warn',
  danger: 'bg-danger-tint text-danger',
  quiet: 'bg-quiet-tint text-quiet',
  accent: 'bg-accent-tint text-accent-strong',
};

/** A word in a tinted pill; the word carries the meaning, the colour only helps. */
export function StatusBadge({ tone, children }: { tone: StatusTone; children: string }) {
  return <span className={`inline-block rounded-full px-2.5 py-0.5 text-xs font-semibold whitespace-nowrap ${tones[tone]}`}>{children}</span>;
}
