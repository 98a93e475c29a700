import { useEffect, useId, useRef } from 'react';
import { inputKind, MODEL_CATALOG, type ModelName } from '#shared/queue/index';
import { BLOCK_TITLE_MAX, type BlockConfig } from '#shared/schemas/model-block';
import { TIME_UNITS, type TimeUnit } from '#shared/units/units';
import { inputClass } from '../components/ui/field';
import { Button } from '../components/ui/button';
import { blockForModel } from './block-defaults';
import { BlockInputField } from './block-input-field';
import { changeBlockTimeUnit } from './block-time-unit';
import { ChartSettings } from './chart-settings';
import { ScenariosEditor } from './scenarios-editor';
import { ShownMeasures } from './shown-measures';

const QUEUES = MODEL_CATALOG.filter((m) => !['staffing', 'cost-optimum', 'interval-staffing', 'sweep'].includes(m.model));
const SOLVERS = MODEL_CATALOG.filter((m) => ['staffing', 'cost-optimum', 'interval-staffing'].includes(m.model));

interface BlockEditPanelProps {
  config: BlockConfig;
  /** Problems per input name (from the preview or a refused save). */
  fieldErrors: Record<string, string>;
  onChange: (config: BlockConfig) => void;
  onClose: () => void;
}

/**
 * The block's settings: what it calculates, in which time unit, its inputs (numbers with units or
 * links to assumptions), options to compare, the chart and the measures shown. Escape closes it.
 */
export function BlockEditPanel({ config, fieldErrors, onChange, onClose }: BlockEditPanelProps) {
  const id = useId();
  const titleInput = useRef<HTMLInputElement>(null);
  // The editor takes focus back after inserting a block; focus the title once it has settled.
  useEffect(() => {
    const t = window.setTimeout(() => titleInput.current?.focus(), 0);
    return () => window.clearTimeout(t);
  }, []);
  const { spec } = config;
  const entry = MODEL_CATALOG.find((m) => m.model === spec.model);
  const setInput = (name: string, value: unknown) => {
    const next = { ...spec };
    if (value === undefined) delete next[name];
    else next[name] = value;
    onChange({ ...config, spec: next });
  };

  return (
    <div
      role="group"
      aria-label="Block settings"
      className="mt-4 space-y-6 border-t border-rule pt-4 font-sans"
      onKeyDown={(e) => {
        if (e.key === 'Escape') {
          e.preventDefault();
          e.stopPropagation();
          onClose();
        }
      }}
    >
      <div className="grid gap-3 sm:grid-cols-[minmax(0,2fr)_minmax(0,2fr)_minmax(0,1fr)]">
        <label className="text-sm font-medium text-ink" htmlFor={`${id}-title`}>
          Block title
          <input
            id={`${id}-title`}
            ref={titleInput}
            className={`${inputClass} mt-1.5`}
            maxLength={BLOCK_TITLE_MAX}
            value={config.title}
            placeholder="e.g. Counter staff at the midday peak"
            onChange={(e) => onChange({ ...config, title: e.target.value })}
          />
        </label>
        <label className="text-sm font-medium text-ink" htmlFor={`${id}-model`}>
          Calculation
          <select
            id={`${id}-model`}
            className={`${inputClass} mt-1.5`}
            value={spec.model}
            onChange={(e) => onChange(blockForModel(e.target.value as Exclude<ModelName, 'sweep'>, config))}
          >
            <optgroup label="Queue models">
              {QUEUES.map((m) => (
                <option key={m.model} value={m.model}>
                  {m.label}
                </option>
              ))}
            </optgroup>
            <optgroup label="Solvers">
              {SOLVERS.map((m) => (
                <option key={m.model} value={m.model}>
                  {m.label}
                </option>
              ))}
            </optgroup>
          </select>
        </label>
        <label className="text-sm font-medium text-ink" htmlFor={`${id}-unit`}>
          Rates and times per
          <select
            id={`${id}-unit`}
            className={`${inputClass} mt-1.5`}
            value={config.timeUnit}
            onChange={(e) => onChange(changeBlockTimeUnit(config, e.target.value as TimeUnit))}
          >
            {TIME_UNITS.map((u) => (
              <option key={u} value={u}>
                {u}
              </option>
            ))}
          </select>
        </label>
      </div>

      <fieldset className="space-y-3">
        <legend className="mb-1 text-sm font-semibold text-ink">Inputs</legend>
        {entry?.inputs.map((f) => (
          <BlockInputField
            key={`${spec.model}-${config.timeUnit}-${f.name}`}
            field={f}
            kind={inputKind(f, spec.criterion)}
            value={spec[f.name]}
            timeUnit={config.timeUnit}
            error={fieldErrors[f.name]}
            onChange={(v) => setInput(f.name, v)}
          />
        ))}
        {!entry && <p className="text-sm text-ink-soft">This block uses “{spec.model}”, which this editor cannot change.</p>}
      </fieldset>

      <ScenariosEditor config={config} onChange={(scenarios) => onChange({ ...config, scenarios })} />
      <ChartSettings config={config} onChange={(chart) => onChange({ ...config, chart })} />
      <ShownMeasures config={config} onChange={(shownMeasures) => onChange({ ...config, shownMeasures })} />

      <div className="flex justify-end">
        <Button variant="primary" onClick={onClose}>
          Done
        </Button>
      </div>
    </div>
  );
}
