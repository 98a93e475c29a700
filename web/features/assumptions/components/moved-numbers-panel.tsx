import { useEffect, useRef } from 'react';
import { useQueries } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import type { MovedNumber } from '#shared/schemas/assumptions';
import { paths } from '../../../app/paths';
import { Button } from '../../../components/ui/button';
import { blockUnitsQuery } from '../api/assumption-queries';
import type { SavedChange } from './assumption-dialog';
import { MovedBlock } from './moved-block';
import { ValueWithUnit } from './value-with-unit';
import { plural } from '../../../lib/plural';

/** Moved numbers grouped by study, then by block, in the order the server listed them. */
function group(moved: MovedNumber[]) {
  const studies = new Map<number, { title: string; blocks: Map<string, { title: string; rows: MovedNumber[] }> }>();
  for (const m of moved) {
    const s = studies.get(m.studyId) ?? { title: m.studyTitle, blocks: new Map() };
    const b = s.blocks.get(m.blockId) ?? { title: m.blockTitle, rows: [] };
    b.rows.push(m);
    s.blocks.set(m.blockId, b);
    studies.set(m.studyId, s);
  }
  return [...studies].map(([id, s]) => ({ id, title: s.title, blocks: [...s.blocks].map(([blockId, b]) => ({ blockId, ...b })) }));
}

/**
 * What an edit did to the studies: every number that moved, before → after, per block. It takes
 * focus when it appears so keyboard and screen-reader users land on the consequence of their edit.
 */
export function MovedNumbersPanel({ change, onDismiss }: { change: SavedChange; onDismiss: () => void }) {
  const ref = useRef<HTMLElement>(null);
  const studies = group(change.moved);
  const units = useQueries({ queries: studies.map((s) => blockUnitsQuery(s.id)) });
  useEffect(() => ref.current?.focus(), [change]);
  const blockCount = studies.reduce((n, s) => n + s.blocks.length, 0);

  return (
    <section ref={ref} tabIndex={-1} aria-labelledby="moved-title" className="flex flex-col gap-4 rounded-lg border border-accent/30 border-l-4 border-l-accent bg-sheet px-5 py-4 focus:outline-2 focus:outline-accent">
      <div className="flex items-start justify-between gap-3">
        <div className="min-w-0 flex-1">
          <h2 id="moved-title" className="text-lg font-bold">
            {change.moved.length > 0 ? `${plural(change.moved.length, 'number')} moved` : 'No numbers moved'}
          </h2>
          <p className="mt-1 text-sm text-ink-soft">
            “{change.after.name}” went from <ValueWithUnit a={change.before} /> to <ValueWithUnit a={change.after} />.{' '}
            {change.moved.length > 0
              ? `Recomputed ${plural(blockCount, 'model block')} in ${plural(studies.length, 'draft study', 'draft studies')}.`
              : 'No model block of a draft study uses it, or its results came out the same.'}
          </p>
        </div>
        <Button size="sm" variant="quiet" onClick={onDismiss}>
          Dismiss
        </Button>
      </div>
      {studies.map((s, i) => (
        <div key={s.id} className="flex flex-col gap-2">
          <h3 className="font-serif text-base font-semibold">
            <Link to={paths.study(s.id)} className="underline-offset-4 hover:underline">
              {s.title}
            </Link>
          </h3>
          {s.blocks.map((b) => (
            <MovedBlock key={b.blockId} title={b.title} rows={b.rows} timeUnit={units[i]?.data?.[b.blockId] ?? null} open={blockCount <= 2} />
          ))}
        </div>
      ))}
    </section>
  );
}
