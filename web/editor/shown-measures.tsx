import type { BlockConfig } from '#shared/schemas/model-block';
import { CheckboxField } from '../components/ui/checkbox-field';
import { measuresFor } from './result-rows';

/** Which measures the block's table shows in the text (none chosen: every measure the model reports). */
export function ShownMeasures({ config, onChange }: { config: BlockConfig; onChange: (shown: string[] | undefined) => void }) {
  const all = measuresFor(config.spec.model, config.spec.criterion);
  const shown = config.shownMeasures ?? [];
  return (
    <fieldset>
      <legend className="text-sm font-semibold text-ink">Measures in the table</legend>
      <p className="mb-2 text-sm text-ink-soft">{shown.length ? `${shown.length} chosen.` : 'None chosen: the table shows every measure the model reports.'}</p>
      <div className="grid gap-1.5 sm:grid-cols-2 lg:grid-cols-3">
        {all.map((m) => (
          <CheckboxField
            key={m.name}
            label={m.label}
            checked={shown.includes(m.name)}
            onCheckedChange={(on) => {
              // Keep the catalog's order whatever order they were ticked in.
              const next = all.map((x) => x.name).filter((n) => (n === m.name ? on : shown.includes(n)));
              onChange(next.length ? next : undefined);
            }}
          />
        ))}
      </div>
    </fieldset>
  );
}
