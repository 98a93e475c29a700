import type { TopLevelSpec } from 'vega-lite';
import { readableDuration, SECONDS_PER, type TimeUnit } from '#shared/units/units';
import { DURATION_WORDS } from './format-measure';
import { measuresFor } from './result-rows';

export interface ChartRow {
  x: number;
  measure: string;
  value: number | null;
}

const WHOLE = new Set(['servers', 'capacity', 'population', 'n']);

/** Colours drawn from the app's palette: the accent first, then calm tones that print well. */
const PALETTE = ['#1e5a5f', '#b5651d', '#5b4a8a', '#6b7f2a'];

/**
 * A vega-lite line chart of long-format rows {x, measure, value}: one line per measure, each
 * measure named with its label. Measures of different kinds get their own panel (a percentage
 * and a wait do not share an axis), stacked vertically.
 */
export function chartSpec(rows: readonly ChartRow[], opts: { model: string; parameter: string; parameterLabel: string; timeUnit: TimeUnit; criterion?: unknown; width: number }): TopLevelSpec {
  const measures = measuresFor(opts.model, opts.criterion);
  const labelOf = (name: string) => measures.find((m) => m.name === name)?.label ?? name;
  const percent = (name: string) => ['probability', 'ratio'].includes(measures.find((m) => m.name === name)?.kind ?? '');
  const kindOf = (name: string) => measures.find((m) => m.name === name)?.kind;
  const present = rows.filter((r): r is ChartRow & { value: number } => r.value !== null && Number.isFinite(r.value));
  // Waits share one readable unit (seconds, minutes…) chosen from the longest one drawn.
  const longest = Math.max(0, ...present.filter((r) => kindOf(r.measure) === 'duration').map((r) => Math.abs(r.value)));
  const waitUnit = readableDuration(longest, opts.timeUnit).unit;
  const data = present.map((r) => {
    const kind = kindOf(r.measure);
    if (percent(r.measure)) return { x: r.x, value: r.value * 100, measure: labelOf(r.measure), panel: '%' };
    if (kind === 'duration') return { x: r.x, value: (r.value * SECONDS_PER[opts.timeUnit]) / SECONDS_PER[waitUnit], measure: labelOf(r.measure), panel: DURATION_WORDS[waitUnit] };
    return { x: r.x, value: r.value, measure: labelOf(r.measure), panel: unitWord(kind, opts.timeUnit) };
  });
  const panels = [...new Set(data.map((d) => d.panel))];
  const font = 'Inter, ui-sans-serif, system-ui, sans-serif';
  const layer = (panel: string) => ({
    width: opts.width,
    height: 180,
    transform: [{ filter: { field: 'panel', equal: panel } }],
    mark: { type: 'line' as const, point: true, strokeWidth: 2 },
    encoding: {
      // Server counts and other whole inputs get whole ticks only.
      x: { field: 'x', type: 'quantitative' as const, title: opts.parameterLabel, scale: { zero: false }, axis: WHOLE.has(opts.parameter) ? { tickMinStep: 1, format: 'd' } : {} },
      y: { field: 'value', type: 'quantitative' as const, title: panel },
      color: { field: 'measure', type: 'nominal' as const, title: null, scale: { range: PALETTE }, legend: { orient: 'bottom' as const } },
      tooltip: [
        { field: 'measure', type: 'nominal' as const, title: 'Measure' },
        { field: 'x', type: 'quantitative' as const, title: opts.parameterLabel, format: ',.4~g' },
        { field: 'value', type: 'quantitative' as const, title: panel, format: ',.4~g' },
      ],
    },
  });
  return {
    $schema: 'https://vega.github.io/schema/vega-lite/v6.json',
    data: { values: data },
    vconcat: panels.map(layer),
    config: {
      font,
      axis: { labelFont: font, titleFont: font, labelColor: '#55524c', titleColor: '#22211f', gridColor: '#e3e0d8', domainColor: '#c9c4b8' },
      legend: { labelFont: font, titleFont: font },
      view: { stroke: null },
    },
  } as TopLevelSpec;
}

function unitWord(kind: string | undefined, timeUnit: TimeUnit): string {
  switch (kind) {
    case 'rate':
      return `per ${timeUnit}`;
    case 'cost':
      return `currency per ${timeUnit}`;
    case 'erlangs':
      return 'erlangs';
    default:
      return 'count';
  }
}
