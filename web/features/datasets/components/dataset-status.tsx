import type { Dataset } from '#shared/schemas/datasets';
import { STATUS_WORDS } from '../lib/status-words';

const TONES = {
  quiet: 'bg-quiet-tint text-quiet',
  info: 'bg-accent-tint text-accent-strong',
  ok: 'bg-ok-tint text-ok',
  danger: 'bg-danger-tint text-danger',
};

/** The dataset's state in words, with the share read while it fits. */
export function DatasetStatus({ dataset }: { dataset: Pick<Dataset, 'status' | 'progress'> }) {
  const w = STATUS_WORDS[dataset.status];
  return (
    <span className={`inline-flex items-center gap-1 rounded-full px-2.5 py-0.5 text-xs font-semibold ${TONES[w.tone]}`}>
      {w.label}
      {dataset.status === 'fitting' && <span className="tabular-nums">{Math.round(dataset.progress * 100)} %</span>}
    </span>
  );
}
