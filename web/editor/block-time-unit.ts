import { MODEL_CATALOG } from '#shared/queue/index';
import { isAssumptionLink, type BlockConfig } from '#shared/schemas/model-block';
import { convertDuration, convertRate, type TimeUnit } from '#shared/units/units';

/** How a value changes when the block's time unit changes: rates and costs scale one way, durations the other. */
type Scaling = 'rate' | 'duration';

/** The scaling of each input of a model (and of `meanWait` targets, which are durations). */
export function inputScalings(model: string, criterion?: unknown): Record<string, Scaling> {
  const entry = MODEL_CATALOG.find((m) => m.model === model);
  const out: Record<string, Scaling> = {};
  for (const f of entry?.inputs ?? []) {
    // Costs are "per time unit", so they scale like rates; lists of rates scale element by element.
    if (f.kind === 'rate' || f.kind === 'rates' || f.kind === 'cost') out[f.name] = 'rate';
    else if (f.kind === 'duration') out[f.name] = 'duration';
  }
  if (criterion === 'meanWait') out.target = 'duration';
  return out;
}

function convertValue(value: unknown, scaling: Scaling, from: TimeUnit, to: TimeUnit): unknown {
  const one = (v: unknown): unknown => {
    if (typeof v !== 'number') return v;
    return scaling === 'rate' ? convertRate(v, from, to) : convertDuration(v, from, to);
  };
  // Links keep their meaning on their own: the server converts the assumption into the block's unit.
  if (isAssumptionLink(value)) return value;
  return Array.isArray(value) ? value.map(one) : one(value);
}

function convertInputs(inputs: Record<string, unknown>, scalings: Record<string, Scaling>, from: TimeUnit, to: TimeUnit): Record<string, unknown> {
  const out: Record<string, unknown> = { ...inputs };
  for (const [name, scaling] of Object.entries(scalings)) {
    if (name in out) out[name] = convertValue(out[name], scaling, from, to);
  }
  return out;
}

/**
 * The same block expressed in another time unit: every literal rate, cost and duration (in the
 * spec, in each scenario's overrides and in the chart's range) is converted, so the block's
 * meaning — and its results — do not change. Links to assumptions are left alone.
 */
export function changeBlockTimeUnit(config: BlockConfig, to: TimeUnit): BlockConfig {
  const from = config.timeUnit;
  if (from === to) return config;
  const scalings = inputScalings(config.spec.model, config.spec.criterion);
  const spec = convertInputs(config.spec, scalings, from, to) as BlockConfig['spec'];
  const scenarios = config.scenarios.map((s) => {
    const own = inputScalings(config.spec.model, s.overrides.criterion ?? config.spec.criterion);
    return { ...s, overrides: convertInputs(s.overrides, own, from, to) };
  });
  let chart = config.chart;
  const chartScaling = chart ? scalings[chart.parameter] : undefined;
  if (chart && chartScaling) {
    const c = (v: number) => convertValue(v, chartScaling, from, to) as number;
    chart = { ...chart, from: c(chart.from), to: c(chart.to) };
  }
  return { ...config, timeUnit: to, spec, scenarios, chart };
}
