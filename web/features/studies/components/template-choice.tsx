import type { TemplateSummary } from '#shared/schemas/studies';
import { plural } from '../../../lib/plural';

/** The value that stands for "start from an empty document". */
export const BLANK_CHOICE = '';

interface TemplateChoiceProps {
  templates: TemplateSummary[];
  value: string;
  onChange: (key: string) => void;
}

/**
 * Radio cards: native radios keep arrow-key movement and screen-reader grouping; the card is
 * the label, so a click anywhere on it chooses.
 */
export function TemplateChoice({ templates, value, onChange }: TemplateChoiceProps) {
  const options = [
    { key: BLANK_CHOICE, title: 'Blank study', description: 'An empty document. Add sections and model blocks yourself.', counts: null as string | null },
    ...templates.map((t) => ({
      key: t.key,
      title: t.title,
      description: t.description,
      counts: `${plural(t.sectionCount, 'section')} · ${plural(t.blockCount, 'model block')} · ${plural(t.assumptionCount, 'assumption')}`,
    })),
  ];
  return (
    <fieldset>
      <legend className="mb-2 text-sm font-medium text-ink">Start from</legend>
      <div className="grid gap-3 sm:grid-cols-2">
        {options.map((o) => (
          <label
            key={o.key || 'blank'}
            className="flex cursor-pointer gap-3 rounded-lg border border-rule-strong bg-sheet px-4 py-3 transition-colors hover:border-ink-soft has-checked:border-accent has-checked:bg-accent-tint has-focus-visible:outline-2 has-focus-visible:outline-accent"
          >
            <input type="radio" name="template" value={o.key} checked={value === o.key} onChange={() => onChange(o.key)} className="mt-1 size-4 shrink-0 accent-accent" />
            <span className="flex flex-col gap-1">
              <span className="font-serif font-semibold text-ink">{o.title}</span>
              <span className="text-sm text-ink-soft">{o.description}</span>
              {o.counts && <span className="text-xs text-ink-faint">{o.counts}</span>}
            </span>
          </label>
        ))}
      </div>
    </fieldset>
  );
}
