import type { Assumption } from '#shared/schemas/assumptions';
import { UNIT_INFO } from '#shared/units/units';
import { SOURCE_LABELS } from './source-labels';

export type SortKey = 'name' | 'value' | 'unit' | 'source' | 'owner' | 'usage' | 'updated';
export interface SortOrder {
  key: SortKey;
  direction: 'asc' | 'desc';
}
export interface RegisterFilter {
  /** Matched against name, source detail, owner and notes, ignoring case. */
  text: string;
  source: string;
  usage: '' | 'used' | 'unused';
}

export const NO_FILTER: RegisterFilter = { text: '', source: '', usage: '' };

const collator = new Intl.Collator('en-GB', { sensitivity: 'base', numeric: true });

const compare: Record<SortKey, (a: Assumption, b: Assumption) => number> = {
  name: (a, b) => collator.compare(a.name, b.name),
  value: (a, b) => a.value - b.value,
  unit: (a, b) => collator.compare(UNIT_INFO[a.unit].label, UNIT_INFO[b.unit].label),
  source: (a, b) => collator.compare(SOURCE_LABELS[a.sourceKind], SOURCE_LABELS[b.sourceKind]),
  // Unowned rows sort last either way round would surprise; they sort as the empty name.
  owner: (a, b) => collator.compare(a.ownerName ?? '', b.ownerName ?? ''),
  usage: (a, b) => a.usageCount - b.usageCount,
  updated: (a, b) => a.updatedAt.localeCompare(b.updatedAt),
};

/** The rows the register shows: filtered, then sorted, ties broken by name so the order is stable. */
export function registerView(rows: readonly Assumption[], filter: RegisterFilter, order: SortOrder): Assumption[] {
  const needle = filter.text.trim().toLowerCase();
  const kept = rows.filter((a) => {
    if (filter.source && a.sourceKind !== filter.source) return false;
    if (filter.usage === 'used' && a.usageCount === 0) return false;
    if (filter.usage === 'unused' && a.usageCount > 0) return false;
    if (!needle) return true;
    return [a.name, a.sourceDetail, a.ownerName ?? '', a.notes].some((t) => t.toLowerCase().includes(needle));
  });
  const sign = order.direction === 'asc' ? 1 : -1;
  return kept.sort((a, b) => sign * compare[order.key](a, b) || compare.name(a, b));
}
