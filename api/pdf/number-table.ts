/**
 * A table whose number columns line up on the decimal point. pdfmake cannot align on a character,
 * so each number column is two physical columns: the integer part right-aligned against the
 * fraction part left-aligned, with no padding between them. Digits are tabular (same width), so
 * the points fall on one vertical line. The header row repeats when the table breaks a page.
 */
import type { Content, TableCell } from 'pdfmake/interfaces';
import { sans, txt } from './inline-text';
import { splitDecimal } from './measure-format';
import { COLOURS, NUMBER_FEATURES } from './pdf-theme';

export interface Column {
  header: string;
  kind: 'text' | 'number';
  /** pdfmake width of a text column; number columns size to their content. */
  width?: string | number;
}

/**
 * A cell: text (or prepared content) for text columns, a formatted number (or null, shown as a
 * dash) for number columns.
 */
export type Cell = string | null | { content: Content };

const CELL = { fontSize: 9 };

export function numberTable(columns: Column[], rows: Cell[][], opts: { fontSize?: number } = {}): Content {
  const size = opts.fontSize ?? CELL.fontSize;
  const widths: (string | number)[] = [];
  const physical: ('text' | 'int' | 'frac')[] = [];
  const head: TableCell[] = [];
  for (const c of columns) {
    if (c.kind === 'text') {
      widths.push(c.width ?? '*');
      physical.push('text');
      head.push(sans(c.header, { bold: true, fontSize: 8, color: COLOURS.ink }) as TableCell);
    } else {
      widths.push('auto', 'auto');
      physical.push('int', 'frac');
      head.push(sans(c.header, { bold: true, fontSize: 8, color: COLOURS.ink, alignment: 'right', colSpan: 2 }) as TableCell, {});
    }
  }
  const body: TableCell[][] = [head];
  for (const row of rows) {
    const cells: TableCell[] = [];
    columns.forEach((c, i) => {
      const v = row[i] ?? null;
      if (v !== null && typeof v === 'object') {
        cells.push(v.content as TableCell);
        if (c.kind === 'number') cells.push({ text: '' });
        return;
      }
      if (c.kind === 'text') {
        cells.push(txt(v ?? '', { fontSize: size }) as TableCell);
        return;
      }
      if (v === null) {
        cells.push(txt('—', { fontSize: size, alignment: 'right', color: COLOURS.muted }) as TableCell, { text: '' });
        return;
      }
      const [int, frac] = splitDecimal(v);
      cells.push(
        { text: int, fontSize: size, alignment: 'right', fontFeatures: NUMBER_FEATURES } as TableCell,
        { text: frac, fontSize: size, alignment: 'left', fontFeatures: NUMBER_FEATURES } as TableCell,
      );
    });
    body.push(cells);
  }
  return {
    table: { headerRows: 1, dontBreakRows: true, widths, body },
    layout: {
      hLineWidth: (i: number, node: { table: { body: unknown[] } }) => (i === 0 || i === 1 || i === node.table.body.length ? 0.6 : 0.25),
      hLineColor: (i: number) => (i <= 1 ? COLOURS.accent : COLOURS.rule),
      vLineWidth: () => 0,
      paddingLeft: (i: number) => (physical[i] === 'frac' ? 0 : i === 0 ? 2 : 10),
      paddingRight: (i: number) => (physical[i] === 'int' ? 0 : 4),
      paddingTop: () => 3,
      paddingBottom: () => 3,
      fillColor: (row: number) => (row === 0 ? COLOURS.shade : null),
    },
    margin: [0, 4, 0, 6],
  } as Content;
}
