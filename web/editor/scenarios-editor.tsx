import { inputKind } from '#shared/queue/index';
import { MAX_SCENARIOS, isAssumptionLink, type BlockConfig } from '#shared/schemas/model-block';
import { inputClass } from '../components/ui/field';
import { Button } from '../components/ui/button';
import { numericInputs } from './editable-inputs';
import { fromDisplay, initialDisplayUnit, tidy, toDisplay, unitWord } from './field-units';
import { NumberInput } from './number-input';

interface ScenariosEditorProps {
  config: BlockConfig;
  onChange: (scenarios: BlockConfig['scenarios']) => void;
}

/**
 * Options compared side by side: one column per option, one row per input. An empty cell means
 * "as in the base case"; a number overrides it. Values are typed in the block's time unit.
 */
export function ScenariosEditor({ config, onChange }: ScenariosEditorProps) {
  const { scenarios, spec, timeUnit } = config;
  const inputs = numericInputs(spec.model);
  const set = (i: number, next: BlockConfig['scenarios'][number]) => onChange(scenarios.map((s, j) => (j === i ? next : s)));

  return (
    <fieldset className="space-y-3">
      <legend className="text-sm font-semibold text-ink">Options side by side</legend>
      <p className="text-sm text-ink-soft">Each option changes some inputs of the base case; leave a cell empty to keep the base value.</p>
      {scenarios.length > 0 && (
        <div className="overflow-x-auto">
          <table className="border-collapse text-sm">
            <thead>
              <tr>
                <th scope="col" className="pr-3 pb-2 text-left font-medium text-ink-soft">
                  Input
                </th>
                {scenarios.map((s, i) => (
                  <th key={i} scope="col" className="px-1 pb-2">
                    <input
                      aria-label={`Name of option ${i + 1}`}
                      className={`${inputClass} w-36`}
                      value={s.label}
                      maxLength={80}
                      onChange={(e) => set(i, { ...s, label: e.target.value })}
                    />
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {inputs.map((f) => {
                const kind = inputKind(f, spec.criterion);
                const unit = initialDisplayUnit(kind, spec[f.name], timeUnit);
                const word = unitWord(kind, unit, timeUnit);
                return (
                  <tr key={f.name}>
                    <th scope="row" className="py-1 pr-3 text-left font-normal whitespace-nowrap text-ink">
                      {f.label}
                      {word && <span className="text-ink-faint"> ({word})</span>}
                    </th>
                    {scenarios.map((s, i) => {
                      const v = s.overrides[f.name];
                      const base = spec[f.name];
                      return (
                        <td key={i} className="px-1 py-1">
                          <NumberInput
                            aria-label={`${f.label}, ${s.label || `option ${i + 1}`}`}
                            className="w-36"
                            placeholder={typeof base === 'number' ? String(tidy(toDisplay(base, kind, unit, timeUnit))) : isAssumptionLink(base) ? 'linked' : ''}
                            value={typeof v === 'number' ? tidy(toDisplay(v, kind, unit, timeUnit)) : undefined}
                            onValueChange={(typed) => {
                              const overrides = { ...s.overrides };
                              if (typed === undefined) delete overrides[f.name];
                              else overrides[f.name] = fromDisplay(typed, kind, unit, timeUnit);
                              set(i, { ...s, overrides });
                            }}
                          />
                        </td>
                      );
                    })}
                  </tr>
                );
              })}
              <tr>
                <td />
                {scenarios.map((s, i) => (
                  <td key={i} className="px-1 pt-1">
                    <Button size="sm" variant="quiet" onClick={() => onChange(scenarios.filter((_, j) => j !== i))}>
                      Remove {s.label || `option ${i + 1}`}
                    </Button>
                  </td>
                ))}
              </tr>
            </tbody>
          </table>
        </div>
      )}
      <Button
        size="sm"
        disabled={scenarios.length >= MAX_SCENARIOS}
        onClick={() => onChange([...scenarios, { label: `Option ${String.fromCharCode(65 + scenarios.length)}`, overrides: {} }])}
      >
        Add an option
      </Button>
    </fieldset>
  );
}
