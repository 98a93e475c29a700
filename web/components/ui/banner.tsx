import type { ReactNode } from 'react';

type Tone = 'danger' | 'warn' | 'ok' | 'info';

const tones: Record<Tone, string> = {
  danger: 'border-danger/40 bg-danger-tint text-danger',
  warn: 'border-warn/40 bg-warn-tint text-warn',
  ok: 'border-ok/40 bg-ok-tint text-ok',
  info: 'border-accent/30 bg-accent-tint text-accent-strong',
};

/** A message inside the page. Errors and warnings are announced at once (role alert). */
export function Banner({ tone, title, children }: { tone: Tone; title?: string; children?: ReactNode }) {
  const urgent = tone === 'danger' || tone === 'warn';
  return (
    <div role={urgent ? 'alert' : 'status'} className={`rounded-md border px-4 py-3 text-sm ${tones[tone]}`}>
      {title && <p className="font-semibold">{title}</p>}
      {children && <div className={title ? 'mt-1' : ''}>{children}</div>}
    </div>
  );
}
