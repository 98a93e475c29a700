import type { Assumption } from '#shared/schemas/assumptions';
import { Table, Td, Th } from '../../../components/ui/table';
import { formatDate } from '../../../lib/format-date';
import { formatValue, splitDecimal } from '../lib/format-value';
import type { SortOrder } from '../lib/register-view';
import { SOURCE_LABELS } from '../lib/source-labels';
import { unitLabel } from '../lib/unit-options';
import { DeleteAssumptionButton } from './delete-assumption-button';
import { SortHeader } from './sort-header';

interface AssumptionTableProps {
  rows: Assumption[];
  order: SortOrder;
  onSort: (order: SortOrder) => void;
  /** Omitted for readers (administrators): no edit or delete controls. */
  onEdit?: (a: Assumption) => void;
  onDelete?: (a: Assumption) => void;
  deletingId?: number | null;
}

/** The register as a table; values line up on the decimal point, their unit beside them. */
export function AssumptionTable({ rows, order, onSort, onEdit, onDelete, deletingId }: AssumptionTableProps) {
  const texts = rows.map((a) => splitDecimal(formatValue(a.value)));
  // Width of the widest ".xxx" in figure widths (tabular digits are 1ch each).
  const fractionWidth = Math.max(0, ...texts.map((t) => t.fraction.length));
  const header = (label: string, key: SortOrder['key'], num?: boolean) => <SortHeader label={label} sortKey={key} order={order} onSort={onSort} num={num} />;

  return (
    <Table caption="Assumptions of this engagement">
      <thead>
        <tr>
          {header('Name', 'name')}
          {header('Value', 'value', true)}
          {header('Unit', 'unit')}
          {header('Source', 'source')}
          {header('Owner', 'owner')}
          {header('Used by', 'usage', true)}
          {header('Last change', 'updated')}
          {onEdit && (
            <Th>
              <span className="sr-only">Actions</span>
            </Th>
          )}
        </tr>
      </thead>
      <tbody>
        {rows.map((a, i) => (
          <tr key={a.id}>
            <Td className="min-w-48 font-medium">
              {a.name}
              {a.notes && (
                <span className="mt-0.5 line-clamp-1 text-xs font-normal text-ink-faint" title={a.notes}>
                  {a.notes}
                </span>
              )}
            </Td>
            <Td num className="whitespace-nowrap">
              {texts[i].whole}
              <span className="inline-block text-left" style={{ minWidth: `${fractionWidth}ch` }}>
                {texts[i].fraction}
              </span>
            </Td>
            <Td className="text-ink-soft">{unitLabel(a.unit)}</Td>
            <Td className="min-w-44">
              {SOURCE_LABELS[a.sourceKind]}
              {/* Long provenance stays one glance tall; the whole text is in the edit dialog and the tooltip. */}
              {a.sourceDetail && (
                <span className="mt-0.5 line-clamp-2 text-xs text-ink-faint" title={a.sourceDetail}>
                  {a.sourceDetail}
                </span>
              )}
              <FitCautions cautions={a.cautions} />
            </Td>
            <Td className="text-ink-soft">{a.ownerName ?? <span className="text-ink-faint italic">nobody</span>}</Td>
            <Td num>
              {a.usageCount}
              <span className="sr-only"> model blocks</span>
            </Td>
            <Td className="whitespace-nowrap text-ink-soft">
              <time dateTime={a.updatedAt} title={formatDate(a.updatedAt)}>
                {formatDate(a.updatedAt, false)}
              </time>
            </Td>
            {onEdit && onDelete && (
              <Td className="text-right whitespace-nowrap">
                <span className="inline-flex items-center gap-2">
                  <button type="button" onClick={() => onEdit(a)} className="rounded-md px-2.5 py-1 text-sm font-medium text-accent hover:bg-accent-tint" aria-label={`Edit ${a.name}`}>
                    Edit
                  </button>
                  <DeleteAssumptionButton assumption={a} busy={deletingId === a.id} onConfirm={() => onDelete(a)} />
                </span>
              </Td>
            )}
          </tr>
        ))}
      </tbody>
    </Table>
  );
}

/** Short names for the fit's warnings a value carries; model blocks that link it repeat them in full. */
const CAUTION_WORDS: Record<string, string> = {
  not_exponential: 'service times not exponential',
  exponential_doubtful: 'exponential service doubtful',
  variable_demand: 'demand varies by interval',
  small_sample: 'few observations',
};

function FitCautions({ cautions }: { cautions: Assumption['cautions'] }) {
  if (cautions.length === 0) return null;
  return (
    <span className="mt-0.5 block text-xs text-warn" title={cautions.map((c) => c.message).join('\n')}>
      Fit cautions: {cautions.map((c) => CAUTION_WORDS[c.code] ?? c.code).join('; ')}
    </span>
  );
}
