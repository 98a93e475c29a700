import type { Readable } from 'node:stream';
import { StringDecoder } from 'node:string_decoder';
import { createArrivalAccumulator, createIntervalCountAccumulator, createServiceAccumulator } from '../../../shared/queue/fit/index';
import { createLocalClock } from '../../../shared/queue/fit/local-clock';
import { QueueError } from '../../../shared/queue/errors';
import { DELIMITER_CHARS, type DatasetFit, type DatasetMapping } from '../../../shared/schemas/datasets';
import { DatasetInputError } from './dataset-problem';
import { fitSuggestions } from './fit-suggestions';
import { createRecordSplitter } from './record-splitter';
import { createRowReader } from './row-reader';

/** Per-interval rows kept in a stored fit; beyond this only the profile and the peak are kept. */
export const STORED_INTERVALS_MAX = 5000;
const MAX_CHANNELS = 1000;
const DECODE_PIECE = 32 * 1024;

export interface FitProgress {
  bytes: number;
  rows: number;
}

/**
 * Streams a CSV/TSV into the engine's accumulators, so memory stays flat whatever the file size
 * (the service buffer is bounded by the engine). Chunks are split into records synchronously
 * (createRecordSplitter), with no per-row promise: `onProgress` is awaited once per chunk, and
 * the job uses it to report (throttled there) and to learn that it should stop.
 */
export async function fitStream(source: Readable, mapping: DatasetMapping, datasetName: string, onProgress?: (p: FitProgress) => Promise<void> | void): Promise<DatasetFit> {
  const toLocal = createLocalClock(mapping.timeZone);
  const options = { intervalMinutes: mapping.intervalMinutes, timeZone: mapping.timeZone };
  const arrivals = mapping.kind === 'event_log' ? createArrivalAccumulator(options) : null;
  const counts = mapping.kind === 'interval_counts' ? createIntervalCountAccumulator(options) : null;
  const service = createServiceAccumulator();
  const channels = new Map<string, number>();
  let read: ReturnType<typeof createRowReader> | null = null;
  let bytes = 0, rows = 0, handlingSum = 0, handlingWeight = 0, handlingRows = 0;

  const onRecord = (record: string[]) => {
    if (!read) {
      read = createRowReader(record, mapping, toLocal);
      return;
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
  };

  const splitter = createRecordSplitter(DELIMITER_CHARS[mapping.delimiter], onRecord);
  // A multi-byte character may be cut between chunks: the decoder keeps its first bytes.
  const decoder = new StringDecoder('utf8');
  for await (const chunk of source as AsyncIterable<Buffer | string>) {
    if (typeof chunk === 'string') {
      bytes += Buffer.byteLength(chunk);
      splitter.push(chunk);
    } else {
      bytes += chunk.length;
      // Decoded in small pieces: a string over ~128 kB lands in V8's large-object space, and the
      // cells sliced from it keep it alive, which made garbage collection cost more than parsing.
      for (let at = 0; at < chunk.length; at += DECODE_PIECE) splitter.push(decoder.write(chunk.subarray(at, at + DECODE_PIECE)));
    }
    if (onProgress) await onProgress({ bytes, rows });
  }
  splitter.push(decoder.end());
  splitter.end();
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
