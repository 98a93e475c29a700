import { useEffect, useRef, useState } from 'react';
import type { TimeUnit } from '#shared/units/units';
import { ScrollRegion } from '../components/ui/scroll-region';
import { accessibleChart } from '../lib/accessible-chart';
import { chartSpec, type ChartRow } from './chart-spec';

interface BlockChartProps {
  rows: readonly ChartRow[];
  model: string;
  parameter: string;
  parameterLabel: string;
  timeUnit: TimeUnit;
  criterion?: unknown;
  /** Read by screen readers instead of the drawing. */
  description: string;
}

/**
 * A block's chart. vega-embed is imported only when a chart is on screen, so vega stays out of
 * every other chunk. The expression interpreter (`ast: true`) keeps vega from compiling code
 * with `new Function`, which the app's content security policy forbids.
 */
export function BlockChart({ rows, model, parameter, parameterLabel, timeUnit, criterion, description }: BlockChartProps) {
  const box = useRef<HTMLDivElement>(null);
  const [failure, setFailure] = useState<string | null>(null);

  // Redraw only when what is drawn changes (callers may pass a new but equal array each render).
  const specText = JSON.stringify(accessibleChart(chartSpec(rows, { model, parameter, parameterLabel, timeUnit, criterion, width: 520 }), description));

  useEffect(() => {
    const el = box.current;
    if (!el) return;
    let cancelled = false;
    let finalize: (() => void) | undefined;
    const spec = JSON.parse(specText) as ReturnType<typeof chartSpec>;
    import('vega-embed')
      .then(({ default: embed }) => embed(el, spec, { ast: true, actions: false, renderer: 'svg', tooltip: false }))
      .then((result) => {
        if (cancelled) result.finalize();
        else finalize = () => result.finalize();
        setFailure(null);
      })
      .catch((err: unknown) => {
        if (!cancelled) setFailure(err instanceof Error ? err.message : 'The chart could not be drawn.');
      });
    return () => {
      cancelled = true;
      finalize?.();
    };
  }, [specText]);

  return (
    <figure className="mt-4">
      <ScrollRegion label="Chart (scrolls sideways)" className="overflow-x-auto">
        <div ref={box} role="img" aria-label={description} className="min-h-24" />
      </ScrollRegion>
      {failure && <p className="text-sm text-danger">The chart could not be drawn: {failure}</p>}
    </figure>
  );
}
