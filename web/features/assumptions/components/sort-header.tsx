import { Th } from '../../../components/ui/table';
import type { SortKey, SortOrder } from '../lib/register-view';

interface SortHeaderProps {
  label: string;
  sortKey: SortKey;
  order: SortOrder;
  onSort: (order: SortOrder) => void;
  num?: boolean;
}

/**
 * A column header that sorts: a real button (keyboard, screen readers) inside a th carrying
 * aria-sort, so the current order is announced with the column.
 */
export function SortHeader({ label, sortKey, order, onSort, num }: SortHeaderProps) {
  const active = order.key === sortKey;
  const next: SortOrder = { key: sortKey, direction: active && order.direction === 'asc' ? 'desc' : 'asc' };
  return (
    <Th num={num} aria-sort={active ? (order.direction === 'asc' ? 'ascending' : 'descending') : 'none'}>
      <button type="button" onClick={() => onSort(next)} className={`inline-flex items-center gap-1 whitespace-nowrap uppercase hover:text-ink ${active ? 'text-ink' : ''}`}>
        {label}
        <span aria-hidden="true" className={active ? '' : 'text-ink-faint'}>
          {active && order.direction === 'desc' ? '↓' : '↑'}
        </span>
      </button>
    </Th>
  );
}
