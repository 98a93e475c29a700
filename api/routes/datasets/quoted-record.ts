import { parse, CsvError } from 'csv-parse/sync';
import { DATASET_MAX_LINE } from '../../../shared/schemas/datasets';
import { DatasetInputError } from './dataset-problem';

const QUOTE = 34; // "

/**
 * Whether a line ends inside a quoted field, i.e. the record goes on over the next line.
 * `quoting` is the state at the line's start (true when an earlier line left a field open).
 * Follows csv-parse with `relax_quotes`: a quote opens a field only as its first character,
 * `""` inside a quoted field is one quote, and any other quote closes it (a quote followed by
 * more text then makes the field literal, which csv-parse sorts out when it parses the record).
 */
export function endsInQuotes(line: string, delimiter: number, quoting: boolean): boolean {
  let fieldStart = !quoting;
  for (let i = 0; i < line.length; i++) {
    const c = line.charCodeAt(i);
    if (quoting) {
      if (c !== QUOTE) continue;
      if (line.charCodeAt(i + 1) === QUOTE) i++;
      else quoting = false;
    } else if (c === QUOTE && fieldStart) {
      quoting = true;
      fieldStart = false;
    } else fieldStart = c === delimiter;
  }
  return quoting;
}

/**
 * Parses one record whose text contains a quote with csv-parse itself (the rare case), so quoted
 * fields keep exactly csv-parse's meaning. `text` is the record without its final line break;
 * `firstLine` its line in the file, for messages.
 */
export function parseQuotedRecord(text: string, delimiter: string, recordDelimiter: string, firstLine: number): string[] {
  try {
    const records = parse(text, { delimiter, record_delimiter: recordDelimiter, relax_quotes: true, relax_column_count: true, max_record_size: DATASET_MAX_LINE }) as string[][];
    return records[0] ?? [''];
  } catch (err) {
    if (!(err instanceof CsvError)) throw err;
    const row = firstLine + ((err as CsvError & { lines?: number }).lines ?? 1) - 1;
    // csv-parse counts lines within this record only: drop its "at line n" and name the file's row.
    const what = err.message.replace(/ (at|on) line \d+/g, '');
    throw new DatasetInputError(`Row ${row}: ${what}. Check the quotes in that row.`, row);
  }
}
