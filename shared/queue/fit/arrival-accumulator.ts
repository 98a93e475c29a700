import { invalidInput } from '../errors';
import { buildDemandFit, type DemandFit } from './demand-fit';
import { parseDemandOptions, type DemandOptions } from './demand-options';
import { createLocalClock } from './local-clock';

export interface ArrivalAccumulator {
  /** Adds one arrival at `timestampMs` (ms since the epoch, UTC); any order. */
  add(timestampMs: number): void;
  /** Arrivals added so far. */
  readonly count: number;
  /**
   * The fit: every interval from the first arrival's to the last arrival's counts as observed,
   * empty ones included. Intervals are wall-clock intervals of the time zone: on the nights clocks
   * change, one interval is really an hour longer or shorter, which the fit ignores.
   */
  result(): DemandFit;
}

/**
 * Streams an event log of arrival timestamps into per-interval counts (memory grows with the
 * number of intervals, not of rows). Throws QueueError invalid_input for bad options or a
 * timestamp that is not a finite number (path "timestamps.<row>"), and from result() when no
 * arrival was added.
 */
export function createArrivalAccumulator(options: DemandOptions): ArrivalAccumulator {
  const { intervalMinutes, timeZone } = parseDemandOptions(options);
  const toLocal = createLocalClock(timeZone);
  const intervalMs = intervalMinutes * 60_000;
  const counts = new Map<number, number>();
  let rows = 0;
  let first = Infinity;
  let last = -Infinity;
  return {
    add(timestampMs: number): void {
      if (typeof timestampMs !== 'number' || !Number.isFinite(timestampMs)) {
        throw invalidInput(`timestamps.${rows}`, 'must be a finite number of milliseconds since the epoch');
      }
      rows++;
      const index = Math.floor(toLocal(timestampMs) / intervalMs);
      counts.set(index, (counts.get(index) ?? 0) + 1);
      if (index < first) first = index;
      if (index > last) last = index;
    },
    get count() {
      return rows;
    },
    result(): DemandFit {
      if (rows === 0) throw invalidInput('timestamps', 'no arrivals were added');
      function* span(): Generator<number> {
        for (let i = first; i <= last; i++) yield i;
      }
      return buildDemandFit(counts, span(), intervalMinutes, timeZone);
    },
  };
}
