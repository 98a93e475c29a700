import { DELIMITER_CHARS, type DatasetMapping } from '../../../shared/schemas/datasets';
import { atCell, DatasetInputError } from './dataset-problem';
import { createTimestampParser, type ParsedTime } from './timestamp-parser';

/** One data row as the fit needs it. */
export interface ReadRow {
  timeMs: number;
  /** Service time (s) of an event log row with both service columns filled. */
  serviceSeconds: number | null;
  channel: string | null;
  /** Interval counts only. */
  count: number;
  handlingSeconds: number | null;
}

const NAMES: Record<string, string> = { comma: 'commas', tab: 'tabs', semicolon: 'semicolons', pipe: 'vertical bars' };

/** Which other delimiter the header seems to use, for the "wrong delimiter" message. */
function delimiterHint(header: string[], mapping: DatasetMapping): string {
  if (header.length !== 1) return '';
  for (const [name, ch] of Object.entries(DELIMITER_CHARS)) {
    if (name !== mapping.delimiter && header[0].includes(ch)) return ` The header reads as one column "${header[0].slice(0, 80)}": the file seems to be separated by ${NAMES[name]}, not ${NAMES[mapping.delimiter]}.`;
  }
  return '';
}

/** Checks the header against the mapping: no duplicated names, every mapped column present. */
export function checkHeader(header: string[], mapping: DatasetMapping): Map<string, number> {
  const index = new Map<string, number>();
  header.forEach((raw, i) => {
    const name = raw.trim();
    if (name === '') return;
    if (index.has(name)) throw new DatasetInputError(`Row 1: the column name "${name}" appears twice (columns ${index.get(name)! + 1} and ${i + 1}); give each column its own name.`, 1, name);
    index.set(name, i);
  });
  const mapped = [mapping.timeColumn, mapping.serviceStartColumn, mapping.serviceEndColumn, mapping.channelColumn, mapping.countColumn, mapping.handlingTimeColumn];
  for (const c of mapped) {
    if (c && !index.has(c)) throw new DatasetInputError(`The file has no column "${c}".${delimiterHint(header, mapping)}`, 1, c);
  }
  return index;
}

/**
 * Builds the reader of data rows for a mapping: finds the columns, parses cells, and throws a
 * DatasetInputError naming the row and column for the first cell that cannot be used.
 */
export function createRowReader(header: string[], mapping: DatasetMapping, toLocal: (ms: number) => number) {
  const index = checkHeader(header, mapping);
  const col = (name: string | null) => (name ? index.get(name)! : -1);
  const time = col(mapping.timeColumn), start = col(mapping.serviceStartColumn), end = col(mapping.serviceEndColumn);
  const channel = col(mapping.channelColumn), count = col(mapping.countColumn), handling = col(mapping.handlingTimeColumn);
  const parseTime = createTimestampParser(mapping.timestampFormat, toLocal);
  const formatName = mapping.timestampFormat === 'iso8601' ? 'an ISO 8601 date and time' : mapping.timestampFormat === 'epoch_seconds' ? 'seconds since 1970' : 'milliseconds since 1970';
  const handlingScale = mapping.handlingTimeUnit === 'minutes' ? 60 : 1;
  let firstOffset: number | null | undefined;

  // Reused holders: the reader allocates nothing per row (10⁶-row files).
  const arrived: ParsedTime = { ms: 0, offsetMinutes: null }, started: ParsedTime = { ms: 0, offsetMinutes: null }, ended: ParsedTime = { ms: 0, offsetMinutes: null };
  const out: ReadRow = { timeMs: 0, serviceSeconds: null, channel: null, count: 1, handlingSeconds: null };

  const timeAt = (cells: string[], i: number, name: string, row: number, t: ParsedTime): ParsedTime => {
    const raw = cells[i] ?? '';
    if (!parseTime(raw, t)) throw atCell(row, name, raw.trim() === '' ? 'the time is empty.' : `"${raw.slice(0, 40)}" is not ${formatName}.`);
    // One file, one clock: offsets may follow the zone's own changes (summer time) but not jump
    // between unrelated zones, and a file may not mix stamped and unstamped times.
    if (firstOffset === undefined) firstOffset = t.offsetMinutes;
    else if ((firstOffset === null) !== (t.offsetMinutes === null)) {
      throw atCell(row, name, `"${raw.slice(0, 40)}" ${t.offsetMinutes === null ? 'has no time-zone offset while earlier rows have one' : 'has a time-zone offset while earlier rows have none'}; use one form throughout.`);
    } else if (t.offsetMinutes !== null && t.offsetMinutes !== firstOffset && Math.round((toLocal(t.ms) - t.ms) / 60_000) !== t.offsetMinutes) {
      throw atCell(row, name, `the offset of "${raw.slice(0, 40)}" differs from earlier rows and from ${mapping.timeZone} at that date: the file mixes time zones.`);
    }
    return t;
  };
  const numberAt = (cells: string[], i: number, name: string, row: number, what: string): number => {
    const raw = (cells[i] ?? '').trim();
    const v = raw === '' ? NaN : Number(raw);
    if (!Number.isFinite(v)) throw atCell(row, name, `"${raw.slice(0, 40)}" is not a number (${what}).`);
    if (v < 0) throw atCell(row, name, `${raw} is negative; ${what} cannot be.`);
    return v;
  };

  /** Reads one row; the returned object is reused by the next call. */
  return (cells: string[], row: number): ReadRow => {
    const t = timeAt(cells, time, mapping.timeColumn, row, arrived);
    out.timeMs = t.ms;
    out.serviceSeconds = null;
    out.channel = channel >= 0 ? (cells[channel] ?? '').trim() || null : null;
    out.count = 1;
    out.handlingSeconds = null;
    if (mapping.kind === 'interval_counts') {
      const n = numberAt(cells, count, mapping.countColumn!, row, 'a count of arrivals');
      if (!Number.isInteger(n)) throw atCell(row, mapping.countColumn!, `${n} is not a whole number of arrivals.`);
      out.count = n;
      if (handling >= 0 && (cells[handling] ?? '').trim() !== '') out.handlingSeconds = numberAt(cells, handling, mapping.handlingTimeColumn!, row, 'a handling time') * handlingScale;
      return out;
    }
    if (start >= 0 && end >= 0 && (cells[start] ?? '').trim() !== '' && (cells[end] ?? '').trim() !== '') {
      const s = timeAt(cells, start, mapping.serviceStartColumn!, row, started);
      const e = timeAt(cells, end, mapping.serviceEndColumn!, row, ended);
      if (s.ms < t.ms) throw atCell(row, mapping.serviceStartColumn!, 'the service starts before the arrival.');
      if (e.ms < s.ms) throw atCell(row, mapping.serviceEndColumn!, `the service ends before it starts (a negative duration of ${((s.ms - e.ms) / 1000).toFixed(0)} s).`);
      out.serviceSeconds = (e.ms - s.ms) / 1000;
    }
    return out;
  };
}
