import { parse } from 'csv-parse/sync';
import { DATASET_MAX_LINE, DATASET_PREVIEW_ROWS, DELIMITER_CHARS, type DatasetDelimiter } from '../../../shared/schemas/datasets';
import { DatasetInputError } from './dataset-problem';

/** Bytes of the file's start kept while streaming, for the checks and the preview. */
export const HEAD_BYTES = 256 * 1024;

export interface HeadSummary {
  delimiter: DatasetDelimiter;
  header: string[];
  preview: string[][];
}

/** True when the start looks like a binary file: NUL bytes or many control characters. */
export function looksBinary(head: Buffer): boolean {
  const n = Math.min(head.length, 8192);
  let control = 0;
  for (let i = 0; i < n; i++) {
    const b = head[i];
    if (b === 0) return true;
    if (b < 9 || (b > 13 && b < 32)) control++;
  }
  return n > 0 && control / n > 0.1;
}

/** The delimiter that splits the header line into the most columns (ties: comma first). */
function detectDelimiter(line: string): DatasetDelimiter {
  let best: DatasetDelimiter = 'comma';
  let most = 0;
  for (const [name, ch] of Object.entries(DELIMITER_CHARS) as [DatasetDelimiter, string][]) {
    const n = line.split(ch).length - 1;
    if (n > most) {
      most = n;
      best = name;
    }
  }
  return best;
}

/**
 * Checks the start of an upload and reads its header and first rows. `complete` says whether
 * `head` is the whole file; `chosen` overrides the detected delimiter. Throws DatasetInputError for an empty, binary or unreadable file.
 */
export function sniffHead(head: Buffer, complete: boolean, chosen?: DatasetDelimiter): HeadSummary {
  if (head.length === 0 || head.toString('utf8').trim() === '') throw new DatasetInputError('The file is empty.');
  if (looksBinary(head)) throw new DatasetInputError('This is not a text file (it contains binary data). Upload a CSV or TSV export.');
  let text = head.toString('utf8').replace(/^\uFEFF/, '');
  const firstBreak = text.search(/\r?\n/);
  if (firstBreak < 0 && !complete) throw new DatasetInputError(`Row 1 is longer than ${HEAD_BYTES.toLocaleString('en')} bytes; this does not look like a table of observations.`, 1);
  // Keep whole lines only: the last one may be cut off mid-way.
  if (!complete) text = text.slice(0, text.lastIndexOf('\n') + 1);
  const headerLine = firstBreak < 0 ? text : text.slice(0, firstBreak);
  if (headerLine.length > DATASET_MAX_LINE) throw new DatasetInputError(`Row 1 is longer than ${DATASET_MAX_LINE.toLocaleString('en')} characters; this does not look like a table of observations.`, 1);
  const delimiter = chosen ?? detectDelimiter(headerLine);
  let records: string[][];
  try {
    records = parse(text, { delimiter: DELIMITER_CHARS[delimiter], skip_empty_lines: true, relax_column_count: true, relax_quotes: true, to: DATASET_PREVIEW_ROWS + 1, max_record_size: DATASET_MAX_LINE }) as string[][];
  } catch (err) {
    const line = (err as { lines?: number }).lines;
    throw new DatasetInputError(`${line ? `Row ${line}: ` : ''}the file cannot be read as a table (${(err as Error).message}).`, line ?? null);
  }
  const [header = [], ...rows] = records;
  if (header.every((h) => h.trim() === '')) throw new DatasetInputError('Row 1 should name the columns, but it is blank.', 1);
  if (rows.length === 0) throw new DatasetInputError('The file has a header but no data rows.', 2);
  return { delimiter, header: header.map((h) => h.trim()), preview: rows };
}
