import { ScrollRegion } from '../components/ui/scroll-region';
import type { ResultRow } from './result-rows';

interface ResultsTableProps {
  caption: string;
  /** Column headings: one per result (the block, or each option side by side). */
  columns: readonly string[];
  rows: readonly ResultRow[];
}

/**
 * A block's results as the report prints them: the measure, its unit, then one right-aligned
 * column per result whose numbers line up on the decimal point (cells are pre-padded, see
 * alignDecimals; tabular figures make every digit the same width).
 */
export function ResultsTable({ caption, columns, rows }: ResultsTableProps) {
  return (
    <ScrollRegion label={caption} className="overflow-x-auto">
      <table className="results-table w-full border-collapse font-sans text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead>
          <tr className="border-b border-rule-strong text-xs text-ink-soft">
            <th scope="col" className="py-2 pr-4 text-left font-semibold">
              Measure
            </th>
            <th scope="col" className="py-2 pr-4 text-left font-semibold">
              Unit
            </th>
            {columns.map((c) => (
              <th key={c} scope="col" className="num py-2 pl-4 font-semibold">
                {c}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.name} className="border-b border-rule last:border-b-0">
              <th scope="row" className="py-1.5 pr-4 text-left font-normal text-ink">
                {r.label}
              </th>
              <td className="py-1.5 pr-4 text-ink-soft">{r.unit}</td>
              {r.cells.map((cell, i) => (
                <td key={columns[i]} className={r.list ? 'py-1.5 pl-4 text-right text-ink' : 'num py-1.5 pl-4 whitespace-pre text-ink'}>
                  {cell}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollRegion>
  );
}
