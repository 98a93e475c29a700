import { useEffect, useRef, useState } from 'react';
import { ScrollRegion } from '../../../components/ui/scroll-region';
import { accessibleChart } from '../../../lib/accessible-chart';

/**
 * Draws a vega-lite spec. vega-embed is imported only when a chart is on screen; the expression
 * interpreter (`ast: true`) keeps vega from using `new Function`, which the CSP forbids.
 */
export function VegaFigure({ spec, description, caption }: { spec: object; description: string; caption?: string }) {
  const box = useRef<HTMLDivElement>(null);
  const [failure, setFailure] = useState<string | null>(null);
  const specText = JSON.stringify(accessibleChart(spec, description));
  useEffect(() => {
    const el = box.current;
    if (!el) return;
    let cancelled = false;
    let finalize: (() => void) | undefined;
    import('vega-embed')
      .then(({ default: embed }) => embed(el, JSON.parse(specText) as Parameters<typeof embed>[1], { ast: true, actions: false, renderer: 'svg', tooltip: false }))
      .then((result) => {
        if (cancelled) result.finalize();
        else finalize = () => result.finalize();
      })
      .catch((err: unknown) => !cancelled && setFailure(err instanceof Error ? err.message : 'The chart could not be drawn.'));
    return () => {
      cancelled = true;
      finalize?.();
    };
  }, [specText]);
  return (
    <figure>
      <ScrollRegion label="Chart (scrolls sideways)" className="overflow-x-auto">
        <div ref={box} role="img" aria-label={description} className="min-h-24" />
      </ScrollRegion>
      {caption && <figcaption className="mt-1 text-xs text-ink-faint">{caption}</figcaption>}
      {failure && <p className="text-sm text-danger">The chart could not be drawn: {failure}</p>}
    </figure>
  );
}
