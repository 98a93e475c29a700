/**
 * Keeps each heading on the same page as what follows it. pdfmake's pageBreakBefore hook does
 * this by laying the whole document out again for every heading it moves (seconds on a long
 * study), so instead a heading and its next node become one unbreakable stack — except before a
 * long table, which would then be pushed whole to the next page.
 */
import type { Content } from 'pdfmake/interfaces';

const isHeading = (c: Content): boolean => typeof c === 'object' && c !== null && 'headlineLevel' in c;

function isLongTable(c: Content): boolean {
  const body = typeof c === 'object' && c !== null && 'table' in c ? (c.table as { body?: unknown[] }).body : undefined;
  return Array.isArray(body) && body.length > 12;
}

export function keepWithNext(items: Content[]): Content[] {
  const out: Content[] = [];
  for (let i = 0; i < items.length; i++) {
    const item = items[i];
    const next = items[i + 1];
    if (isHeading(item) && next !== undefined && !isHeading(next) && !isLongTable(next)) {
      out.push({ stack: [item, next], unbreakable: true } as Content);
      i++;
    } else {
      out.push(item);
    }
  }
  return out;
}
