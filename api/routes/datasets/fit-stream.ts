import type { Readable } from 'node:stream';
import { parse, CsvError } from 'csv-parse';
import { createArrivalAccumulator, createIntervalCountAccumulator, createServiceAccumulator } from '../../../shared/queue/fit/index';
import { createLocalClock } from '../../../shared/queue/fit/local-clock';
import { QueueError } from '../../../shared/queue/errors';
import { DATASET_MAX_LINE, DELIMITER_CHARS, type DatasetFit, type DatasetMapping } from '../../../shared/schemas/datasets';
import { DatasetInputError } from './dataset-problem';
import { fitSuggestions } from './fit-suggestions';
import { createRowReader } from './row-reader';

/** Per-interval rows kept in a stored fit; beyond this only the profile and the peak are kept. */
export const STORED_INTERVALS_MAX = 5000;
const MAX_CHANNELS = 1000;

export interface FitProgress {
  bytes: number;
  rows: number;
}

/** csv-parse's own errors, rewritten as located messages for the user. */
function fromCsvError(err: CsvError): DatasetInputError {
  const row = (err as CsvError & { lines?: number }).lines ?? null;
  const where = row ? `Row ${row}: ` : '';
  switch (err.code) {
    case 'CSV_RECORD_INCONSISTENT_FIELDS_LENGTH':
      return new DatasetInputError(`${where}${err.message.replace(/^Invalid Record Length: /, '')}. Check the delimiter and any quotes in that row.`, row);
    case 'CSV_MAX_RECORD_SIZE':
      return new DatasetInputError(`${where}a line is longer than ${DATASET_MAX_LINE.toLocaleString('en')} characters; this does not look like a table of observations.`, row);
    default:
      return new DatasetInputError(`${where}${err.message}`, row);
  }
}

/**
 * Streams a CSV/TSV through csv-parse into the engine's accumulators, so memory stays flat
 * whatever the file size (the service buffer is bounded by the engine). `onProgress` is awaited
 * every few thousand rows: the job uses it to report and to learn that it should stop.
 */
export async function fitStream(source: Readable, mapping: DatasetMapping, datasetName: string, onProgress?: (p: FitProgress) => Promise<void> | void): Promise<DatasetFit> {
  let bytes = 0;
  source.on('data', (chunk: Buffer) => (bytes += chunk.length));
  const parser = source.pipe(
    parse({ delimiter: DELIMITER_CHARS[mapping.delimiter], bom: true, skip_empty_lines: true, max_record_size: DATASET_MAX_LINE, relax_quotes: true }),
  );
  source.on('error', (err) => parser.destroy(err));
  const toLocal = createLocalClock(mapping.timeZone);
  const options = { intervalMinutes: mapping.intervalMinutes, timeZone: mapping.timeZone };
  const arrivals = mapping.kind === 'event_log' ? createArrivalAccumulator(options) : null;
  const counts = mapping.kind === 'interval_counts' ? createIntervalCountAccumulator(options) : null;
  const service = createServiceAccumulator();
  const channels = new Map<string, number>();
  let read: ReturnType<typeof createRowReader> | null = null;
  let rows = 0, handlingSum = 0, handlingWeight = 0, handlingRows = 0;
  try {
    for await (const record of parser as AsyncIterable<string[]>) {
      if (!read) {
        read = createRowReader(record, mapping, toLocal);
        continue;
      }
      rows++;
      const row = read(record, rows + 1);
      if (arrivals) arrivals.add(row.timeMs);
      else {
        try {
          counts!.add(row.timeMs, row.count);
        } catch (err) {
          if (err instanceof QueueError) throw new DatasetInputError(`Row ${rows + 1}, column "${mapping.timeColumn}": does not start a ${mapping.intervalMinutes}-minute interval in ${mapping.timeZone}; choose the interval length of the file.`, rows + 1, mapping.timeColumn);
          throw err;
        }
      }
      if (row.serviceSeconds !== null) service.add(row.serviceSeconds);
      if (row.handlingSeconds !== null) {
        handlingSum += row.handlingSeconds * row.count;
        handlingWeight += row.count;
        handlingRows++;
      }
      if (row.channel !== null) {
        const key = channels.has(row.channel) || channels.size < MAX_CHANNELS ? row.channel : 'other';
        channels.set(key, (channels.get(key) ?? 0) + row.count);
      }
      if (onProgress && (rows & 8191) === 0) await onProgress({ bytes, rows });
    }
  } catch (err) {
    if (err instanceof CsvError) throw fromCsvError(err);
    throw err;
  }
  if (!read) throw new DatasetInputError('The file is empty.');
  if (rows === 0) throw new DatasetInputError('The file has a header but no data rows.', 2);
  const demand = (arrivals ?? counts)!.result();
  if (demand.totalArrivals === 0) throw new DatasetInputError('Every interval count is 0: there are no arrivals to fit.');
  const intervalsOmitted = demand.intervals.length > STORED_INTERVALS_MAX;
  if (intervalsOmitted) demand.intervals = [];
  const fit: DatasetFit = {
    kind: mapping.kind,
    rows,
    demand,
    service: service.count >= 2 ? service.result() : null,
    handling: handlingWeight > 0 ? { meanSeconds: handlingSum / handlingWeight, intervals: handlingRows } : null,
    channels: [...channels.entries()].sort((a, b) => b[1] - a[1]).slice(0, 20).map(([name, count]) => ({ name, count })),
    intervalsOmitted,
    suggestions: [],
  };
  fit.suggestions = fitSuggestions(fit, datasetName);
  if (onProgress) await onProgress({ bytes, rows });
  return fit;
}
