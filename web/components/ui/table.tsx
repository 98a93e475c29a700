import type { ReactNode, ThHTMLAttributes, TdHTMLAttributes } from 'react';
import { ScrollRegion } from './scroll-region';

interface TableProps {
  /** Read by screen readers; shown only when `showCaption` is set. */
  caption: string;
  showCaption?: boolean;
  children: ReactNode;
}

/** A quiet table: ruled rows, no zebra, numbers right-aligned by `Th`/`Td` with `num`. */
export function Table({ caption, showCaption = false, children }: TableProps) {
  // `relative` keeps visually hidden (absolute) header labels inside the scroll box; without
  // it they widen the whole page on narrow screens.
  return (
    <ScrollRegion label={caption} className="relative overflow-x-auto rounded-lg border border-rule bg-sheet">
      <table className="w-full border-collapse text-sm">
        <caption className={showCaption ? 'px-4 py-3 text-left font-serif text-base' : 'sr-only'}>{caption}</caption>
        {children}
      </table>
    </ScrollRegion>
  );
}

interface CellProps {
  /** Right-aligns a numeric column with tabular figures. */
  num?: boolean;
}

export function Th({ num, className = '', ...rest }: CellProps & ThHTMLAttributes<HTMLTableCellElement>) {
  return (
    <th
      scope="col"
      className={`border-b border-rule-strong px-4 py-2.5 text-xs font-semibold tracking-wide text-ink-soft uppercase ${num ? 'num text-right' : 'text-left'} ${className}`}
      {...rest}
    />
  );
}

export function Td({ num, className = '', ...rest }: CellProps & TdHTMLAttributes<HTMLTableCellElement>) {
  return <td className={`border-b border-rule px-4 py-3 align-top ${num ? 'num' : ''} ${className}`} {...rest} />;
}
