import type { MovedNumber } from '#shared/schemas/assumptions';
import type { TimeUnit } from '#shared/units/units';
import { formatMoved } from '../lib/format-moved';
import { measureInfo } from '../lib/measure-info';
import { MovedBlockTable } from './moved-block-table';

// The measure a reader looks at first, in this order, to sum a block up in one line.
const HEADLINE = ['serviceLevel', 'servers', 'peakServers', 'Wq', 'probBlock', 'probAbandon', 'rho', 'totalCost'];

function headline(rows: MovedNumber[]): MovedNumber {
  const main = rows.filter((r) => measureInfo(r.measure).scenario === null);
  for (const name of HEADLINE) {
    const hit = main.find((r) => r.measure === name);
    if (hit) return hit;
  }
  return main[0] ?? rows[0];
}

interface MovedBlockProps {
  title: string;
  rows: MovedNumber[];
  timeUnit: TimeUnit | null;
  open: boolean;
}

/**
 * One block's moved numbers behind a one-line summary (its headline measure, before → after), so
 * an edit that moves a dozen blocks stays a readable list; the full table opens on demand.
 */
export function MovedBlock({ title, rows, timeUnit, open }: MovedBlockProps) {
  const top = formatMoved(headline(rows), timeUnit);
  return (
    <details open={open} className="group rounded-md border border-rule bg-sheet">
      <summary className="flex cursor-pointer flex-wrap items-baseline gap-x-3 gap-y-1 px-4 py-2.5 text-sm marker:text-ink-faint">
        <span className="font-medium text-ink">{title}</span>
        <span className="text-ink-faint">
          {rows.length} number{rows.length === 1 ? '' : 's'}
        </span>
        <span className="ml-auto text-ink-soft tabular-nums">
          {top.scenario && `${top.scenario} · `}
          {top.label}: {top.direction === 'appeared' ? 'no result' : top.before} →{' '}
          {top.direction === 'vanished' ? (
            <strong className="font-semibold text-warn">no result now, open the study to see why</strong>
          ) : (
            <>
              <strong className="font-semibold text-ink">{top.after}</strong> {top.unit}
            </>
          )}
        </span>
      </summary>
      <div className="px-2 pb-2">
        <MovedBlockTable title={title} rows={rows} timeUnit={timeUnit} />
      </div>
    </details>
  );
}
