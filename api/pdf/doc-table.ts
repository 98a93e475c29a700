/**
 * A table of the study text → pdfmake table. TipTap cells carry colspan/rowspan; pdfmake wants
 * a full grid with empty placeholders under spans, so cells are placed on an occupancy grid.
 * A first row of header cells repeats at the top of each page the table runs onto.
 */
import type { Content, TableCell } from 'pdfmake/interfaces';
import { children, type DocNode } from './doc-node';
import { COLOURS } from './pdf-theme';

const span = (v: unknown): number => (typeof v === 'number' && Number.isInteger(v) && v > 1 && v <= 50 ? v : 1);

export function docTable(node: DocNode, renderCell: (cell: DocNode, header: boolean) => Content[]): Content {
  const rows = children(node).filter((r) => r.type === 'tableRow');
  const grid: (TableCell | undefined)[][] = rows.map(() => []);
  rows.forEach((row, r) => {
    let c = 0;
    for (const cell of children(row)) {
      while (grid[r][c] !== undefined) c++;
      const header = cell.type === 'tableHeader';
      const colSpan = span(cell.attrs?.colspan);
      const rowSpan = Math.min(span(cell.attrs?.rowspan), rows.length - r);
      const content: TableCell = { stack: renderCell(cell, header), ...(header ? { fillColor: COLOURS.shade } : {}) };
      if (colSpan > 1) (content as { colSpan?: number }).colSpan = colSpan;
      if (rowSpan > 1) (content as { rowSpan?: number }).rowSpan = rowSpan;
      for (let dr = 0; dr < rowSpan; dr++) for (let dc = 0; dc < colSpan; dc++) grid[r + dr][c + dc] = dr === 0 && dc === 0 ? content : {};
      c += colSpan;
    }
  });
  const width = Math.max(1, ...grid.map((r) => r.length));
  const body = grid.map((r) => Array.from({ length: width }, (_, i) => r[i] ?? { text: '' }));
  if (body.length === 0) return { text: '' };
  const headerRows = children(rows[0]).length > 0 && children(rows[0]).every((c) => c.type === 'tableHeader') ? 1 : 0;
  return {
    table: { headerRows, dontBreakRows: true, widths: Array.from({ length: width }, () => '*'), body },
    layout: {
      hLineWidth: (i: number, n: { table: { body: unknown[] } }) => (i === 0 || i === n.table.body.length || (headerRows && i === 1) ? 0.6 : 0.25),
      hLineColor: (i: number) => (headerRows && i <= 1 ? COLOURS.accent : COLOURS.rule),
      vLineWidth: () => 0,
      paddingTop: () => 3,
      paddingBottom: () => 2,
    },
    fontSize: 9,
    margin: [0, 4, 0, 10],
  } as Content;
}
