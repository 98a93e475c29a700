import { inputKind } from '#shared/queue/index';
import type { BlockConfig, ChartConfig } from '#shared/schemas/model-block';
import { CheckboxField } from '../components/ui/checkbox-field';
import { inputClass } from '../components/ui/field';
import { SelectField } from '../components/ui/select-field';
import { numericInputs } from './editable-inputs';
import { fromDisplay, initialDisplayUnit, tidy, toDisplay, unitWord } from './field-units';
import { NumberInput } from './number-input';
import { measuresFor } from './result-rows';

const MAX_CHART_MEASURES = 4;

/** Starting range for a parameter: around its current value (servers: a few either side). */
function startingChart(config: BlockConfig, parameter: string, measures: string[]): ChartConfig {
  const v = config.spec[parameter];
  const base = typeof v === 'number' ? v : 1;
  const whole = parameter === 'servers' || parameter === 'capacity' || parameter === 'population';
  return whole
    ? { parameter, from: Math.max(1, base - 2), to: base + 4, steps: Math.min(200, Math.max(2, 7)), measures }
    : { parameter, from: tidy(base * 0.8), to: tidy(base * 1.2), steps: 9, measures };
}

/** Whether and how a block draws a chart: one input varied over a range, up to four measures. */
export function ChartSettings({ config, onChange }: { config: BlockConfig; onChange: (chart: ChartConfig | null) => void }) {
  const { chart, spec, timeUnit } = config;
  const inputs = numericInputs(spec.model);
  const measures = measuresFor(spec.model, spec.criterion).filter((m) => m.kind !== 'distribution');
  if (inputs.length === 0 || measures.length === 0) return null;

  const defaultMeasures = measures.slice(0, 2).map((m) => m.name);
  const param = chart ? inputs.find((f) => f.name === chart.parameter) : undefined;
  const kind = param ? inputKind(param, spec.criterion) : 'number';
  const unit = initialDisplayUnit(kind, chart?.from, timeUnit);
  const word = unitWord(kind, unit, timeUnit);
  const show = (v: number) => tidy(toDisplay(v, kind, unit, timeUnit));
  const keep = (v: number | undefined) => (v === undefined ? undefined : fromDisplay(v, kind, unit, timeUnit));

  return (
    <fieldset className="space-y-3">
      <legend className="text-sm font-semibold text-ink">Chart</legend>
      <CheckboxField
        label="Draw a chart over one input"
        hint="For example service level and mean wait against servers, or wait against demand."
        checked={chart !== null}
        onCheckedChange={(on) => onChange(on ? startingChart(config, inputs.some((f) => f.name === 'servers') ? 'servers' : inputs[0].name, defaultMeasures) : null)}
      />
      {chart && (
        <div className="grid gap-3 sm:grid-cols-2">
          <SelectField
            label="Input to vary"
            value={chart.parameter}
            options={inputs.map((f) => ({ value: f.name, label: f.label }))}
            onValueChange={(p) => onChange(startingChart(config, p, chart.measures))}
          />
          <div className="grid grid-cols-3 gap-2">
            {(['from', 'to'] as const).map((end) => (
              <label key={end} className="text-sm font-medium text-ink">
                {end === 'from' ? 'From' : 'To'} {word && <span className="font-normal text-ink-faint">({word})</span>}
                <NumberInput className="mt-1.5" value={show(chart[end])} onValueChange={(v) => v !== undefined && onChange({ ...chart, [end]: keep(v) as number })} />
              </label>
            ))}
            <label className="text-sm font-medium text-ink">
              Points
              <input
                type="number"
                min={2}
                max={200}
                className={`${inputClass} mt-1.5`}
                value={chart.steps}
                onChange={(e) => onChange({ ...chart, steps: Math.min(200, Math.max(2, Math.round(Number(e.target.value) || 2))) })}
              />
            </label>
          </div>
          <fieldset className="sm:col-span-2">
            <legend className="mb-1.5 text-sm font-medium text-ink">Lines (up to {MAX_CHART_MEASURES})</legend>
            <div className="grid gap-1.5 sm:grid-cols-2">
              {measures.map((m) => {
                const on = chart.measures.includes(m.name);
                return (
                  <CheckboxField
                    key={m.name}
                    label={m.label}
                    checked={on}
                    onCheckedChange={(next) => {
                      const list = next ? [...chart.measures, m.name].slice(-MAX_CHART_MEASURES) : chart.measures.filter((x) => x !== m.name);
                      if (list.length > 0) onChange({ ...chart, measures: list });
                    }}
                  />
                );
              })}
            </div>
          </fieldset>
        </div>
      )}
    </fieldset>
  );
}
