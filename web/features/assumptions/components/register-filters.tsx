import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import type { RegisterFilter } from '../lib/register-view';
import { SOURCE_OPTIONS } from '../lib/source-labels';

const USAGE_OPTIONS = [
  { value: 'used', label: 'Used by a model block' },
  { value: 'unused', label: 'Not used yet' },
];

/** Narrows the register by text, source and whether anything uses the value. */
export function RegisterFilters({ filter, onChange }: { filter: RegisterFilter; onChange: (f: RegisterFilter) => void }) {
  return (
    <div role="search" aria-label="Filter the register" className="flex flex-wrap items-end gap-3">
      <TextField label="Find" type="search" placeholder="Name, source, owner or notes" value={filter.text} onValueChange={(text) => onChange({ ...filter, text })} className="min-w-60 flex-1" />
      <SelectField label="Source" value={filter.source} onValueChange={(source) => onChange({ ...filter, source })} options={SOURCE_OPTIONS} placeholder="Any source" className="w-56" />
      <SelectField
        label="Use"
        value={filter.usage}
        onValueChange={(usage) => onChange({ ...filter, usage: usage as RegisterFilter['usage'] })}
        options={USAGE_OPTIONS}
        placeholder="Used or not"
        className="w-56"
      />
    </div>
  );
}
