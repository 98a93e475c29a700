/**
 * A model block's chart (long-format sweep rows) → SVG text for a pdfmake `svg` node. vega-lite
 * compiles the spec, vega renders it headless (renderer 'none': no canvas; text widths are
 * estimated, so the chart uses the font the PDF embeds for it). One panel per measure, each with
 * its own y scale and unit, converted the way the block's table converts them.
 */
import * as vega from 'vega';
import { compile, type TopLevelSpec } from 'vega-lite';
import { MODEL_CATALOG } from '../../shared/queue/catalog';
import type { BlockConfig, StudyBlockResult } from '../../shared/schemas/model-block';
import { SECONDS_PER, readableDuration } from '../../shared/units/units';
import { CHART_FONT } from './pdf-fonts';
import { COLOURS } from './pdf-theme';

const PLURAL = { second: 'seconds', minute: 'minutes', hour: 'hours', day: 'days' } as const;

interface Panel {
  title: string;
  scale: number;
}

function panelFor(measure: string, model: unknown, config: BlockConfig, values: number[]): Panel {
  const entry = MODEL_CATALOG.find((e) => e.model === model) ?? MODEL_CATALOG.find((e) => e.model === 'M/M/c');
  const field = entry?.measures.find((m) => m.name === measure) ?? MODEL_CATALOG[1].measures.find((m) => m.name === measure);
  const label = field?.label ?? measure;
  const kind = measure === 'rho' || measure === 'serverUtilization' ? 'probability' : field?.kind;
  if (kind === 'probability') return { title: `${label} (%)`, scale: 100 };
  if (kind === 'duration') {
    const largest = Math.max(0, ...values.map(Math.abs));
    const unit = largest > 0 ? readableDuration(largest, config.timeUnit).unit : config.timeUnit;
    return { title: `${label} (${PLURAL[unit]})`, scale: SECONDS_PER[config.timeUnit] / SECONDS_PER[unit] };
  }
  if (kind === 'rate') return { title: `${label} (per ${config.timeUnit})`, scale: 1 };
  return { title: label, scale: 1 };
}

/** The x axis title: the varied input's label from the catalog. */
function xTitle(config: BlockConfig, model: unknown): string {
  const parameter = config.chart?.parameter ?? 'x';
  const field = MODEL_CATALOG.find((e) => e.model === model)?.inputs.find((f) => f.name === parameter);
  if (!field) return parameter;
  if (field.kind === 'rate') return `${field.label} (per ${config.timeUnit})`;
  if (field.kind === 'duration') return `${field.label} (${PLURAL[config.timeUnit]})`;
  return field.label;
}

/**
 * Compiling vega-lite and parsing the vega spec cost most of a chart's time, and every block chart
 * has the same shape: the runtime is cached per (panels, x title, axis kind, width) and each chart
 * only feeds its rows into a fresh View.
 */
const runtimes = new Map<string, vega.Runtime>();

function runtimeFor(panels: number, title: string, countAxis: boolean, width: number): vega.Runtime {
  const key = JSON.stringify([panels, title, countAxis, width]);
  const cached = runtimes.get(key);
  if (cached) return cached;
  const spec: TopLevelSpec = {
    data: { name: 'rows' },
    facet: {
      row: {
        field: 'panel',
        type: 'nominal',
        title: null,
        sort: { field: 'order', op: 'min' },
        header: { labelAngle: 0, labelAlign: 'left', labelAnchor: 'start', labelOrient: 'top', labelFontSize: 9, labelColor: COLOURS.ink },
      },
    },
    spec: {
      width: width - 70,
      height: panels > 1 ? 110 : 170,
      mark: { type: 'line', point: { size: 14, filled: true }, color: COLOURS.accent, strokeWidth: 1.5 },
      encoding: {
        x: { field: 'x', type: 'quantitative', title, scale: { zero: false }, axis: countAxis ? { tickMinStep: 1, format: 'd' } : {} },
        y: { field: 'value', type: 'quantitative', title: null },
      },
    },
    resolve: { scale: { y: 'independent' } },
    config: {
      font: CHART_FONT,
      view: { stroke: null },
      axis: { labelFontSize: 8, titleFontSize: 8, labelColor: COLOURS.muted, titleColor: COLOURS.muted, gridColor: '#e6e8ee', domainColor: COLOURS.rule, tickColor: COLOURS.rule, titleFontWeight: 'normal' },
    },
  };
  const runtime = vega.parse(compile(spec).spec);
  runtimes.set(key, runtime);
  return runtime;
}

/** SVG of the block's chart, or null when it has no rows. Width in PDF points. */
export async function chartSvg(config: BlockConfig, block: StudyBlockResult, width = 440): Promise<string | null> {
  const rows = block.chart;
  if (!rows || rows.length === 0) return null;
  const model = block.resolvedSpec?.model ?? config.spec.model;
  const measures = [...new Set(rows.map((r) => r.measure))];
  const panels = new Map(measures.map((m) => [m, panelFor(m, model, config, rows.filter((r) => r.measure === m && r.value !== null).map((r) => r.value as number))]));
  const data = rows.map((r) => {
    const p = panels.get(r.measure) as Panel;
    return { x: r.x, panel: p.title, order: measures.indexOf(r.measure), value: r.value === null ? null : r.value * p.scale };
  });
  // Server counts and other whole numbers get whole-number ticks.
  const countAxis = MODEL_CATALOG.find((e) => e.model === model)?.inputs.find((f) => f.name === config.chart?.parameter)?.kind === 'count';
  const view = new vega.View(runtimeFor(measures.length, xTitle(config, model), countAxis, width), { renderer: 'none' });
  try {
    view.data('rows', data);
    return await view.toSVG();
  } finally {
    view.finalize();
  }
}
