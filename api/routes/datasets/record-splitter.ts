import { DATASET_MAX_LINE } from '../../../shared/schemas/datasets';
import { DatasetInputError } from './dataset-problem';
import { endsInQuotes, parseQuotedRecord } from './quoted-record';

/** Receives a record's cells and the file line it starts on (the header is line 1). */
export type OnRecord = (cells: string[], line: number) => void;

export interface RecordSplitter {
  /** Feeds the next piece of decoded text; a line may be cut anywhere between pieces. */
  push(text: string): void;
  /** Flushes the last line (a file need not end with a line break). */
  end(): void;
}

const longLine = (line: number) => new DatasetInputError(`Row ${line}: a line is longer than ${DATASET_MAX_LINE.toLocaleString('en')} characters; this does not look like a table of observations.`, line);

/**
 * Splits CSV/TSV text into records the way csv-parse does with the options the datasets use
 * (`bom`, `skip_empty_lines`, `relax_quotes`, `max_record_size`, line breaks \n, \r\n or \r
 * found from the first one), but without its per-character state machine: a line with no quote
 * character is split on the delimiter with String#split, which is many times faster. Lines
 * with a quote (a small minority in real exports) go to csv-parse, joined with the following
 * lines while a quoted field is still open. Every record must have as many fields as the first.
 * Memory is bounded by DATASET_MAX_LINE whatever the input.
 */
export function createRecordSplitter(delimiter: string, onRecord: OnRecord): RecordSplitter {
  const delimiterCode = delimiter.charCodeAt(0);
  let rest = '';
  let started = false;
  let eol = ''; // '\n' (also for \r\n, whose \r is cut off) or '\r'; '' until the first break is seen
  let crlf = false;
  let line = 0;
  let width = -1;
  let pending: string | null = null; // a quoted record spanning lines, so far
  let pendingLine = 0;

  const emit = (cells: string[], at: number) => {
    if (width < 0) width = cells.length;
    else if (cells.length !== width) {
      throw new DatasetInputError(`Row ${at}: ${cells.length} field${cells.length === 1 ? '' : 's'} where the header has ${width}. Check the delimiter and any quotes in that row.`, at);
    }
    onRecord(cells, at);
  };

  const onLine = (raw: string) => {
    line++;
    const text = crlf && raw.charCodeAt(raw.length - 1) === 13 ? raw.slice(0, -1) : raw;
    if (pending !== null) {
      pending += (crlf ? '\r\n' : eol) + text;
      if (pending.length > DATASET_MAX_LINE) throw longLine(pendingLine);
      if (!endsInQuotes(text, delimiterCode, true)) {
        emit(parseQuotedRecord(pending, delimiter, crlf ? '\r\n' : eol, pendingLine), pendingLine);
        pending = null;
      }
      return;
    }
    if (text.length > DATASET_MAX_LINE) throw longLine(line);
    if (text.length === 0) return;
    if (text.indexOf('"') < 0) emit(text.split(delimiter), line);
    else if (endsInQuotes(text, delimiterCode, false)) {
      pending = text;
      pendingLine = line;
    } else emit(parseQuotedRecord(text, delimiter, crlf ? '\r\n' : eol || '\n', line), line);
  };

  /** Picks the line break from the first \r or \n, as csv-parse's auto-discovery does. */
  const findEol = (text: string, final: boolean) => {
    const cr = text.indexOf('\r');
    const lf = text.indexOf('\n');
    if (cr < 0 && lf < 0) return;
    if (cr < 0 || (lf >= 0 && lf < cr)) eol = '\n';
    else if (cr + 1 < text.length || final) {
      crlf = text.charCodeAt(cr + 1) === 10;
      eol = crlf ? '\n' : '\r';
    }
  };

  const push = (chunk: string) => {
    let text = rest + chunk;
    if (!started && text.length > 0) {
      started = true;
      if (text.charCodeAt(0) === 0xfeff) text = text.slice(1);
    }
    if (!eol) findEol(text, false);
    let from = 0;
    if (eol) {
      for (let at = text.indexOf(eol); at >= 0; at = text.indexOf(eol, from)) {
        onLine(text.slice(from, at));
        from = at + 1;
      }
    }
    rest = from === 0 ? text : text.slice(from);
    // A line that never ends must not fill the memory: judge it as soon as it is too long.
    if (rest.length > DATASET_MAX_LINE + 1) throw longLine(pending !== null ? pendingLine : line + 1);
  };

  return {
    push,
    end() {
      if (!eol) {
        findEol(rest, true);
        const text = rest;
        rest = '';
        if (eol) push(text);
        else rest = text;
      }
      if (rest.length > 0) onLine(rest);
      rest = '';
      // A quoted field still open at the end of the file: csv-parse says so, naming the row.
      if (pending !== null) emit(parseQuotedRecord(pending, delimiter, crlf ? '\r\n' : eol || '\n', pendingLine), pendingLine);
    },
  };
}
