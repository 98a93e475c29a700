import { invalidInput } from '../errors';
import { buildDemandFit, type DemandFit } from './demand-fit';
import { parseDemandOptions, type DemandOptions } from './demand-options';
import { createLocalClock } from './local-clock';

export interface IntervalCountAccumulator {
  /**
   * Adds `count` arrivals (a whole number ≥ 0) for the interval starting at `intervalStartMs`
   * (ms since the epoch, UTC), which must fall on the interval grid of the time zone. Rows for
   * the same interval are summed (e.g. several channels).
   */
  add(intervalStartMs: number, count: number): void;
  /** Rows added so far. */
  readonly count: number;
  /** The fit over the intervals given; intervals with no row count as not observed (not as 0). */
  result(): DemandFit;
}

/** Streams interval counts (e.g. a "calls per 15 minutes" export) into a demand fit. */
export function createIntervalCountAccumulator(options: DemandOptions): IntervalCountAccumulator {
  const { intervalMinutes, timeZone } = parseDemandOptions(options);
  const toLocal = createLocalClock(timeZone);
  const intervalMs = intervalMinutes * 60_000;
  const counts = new Map<number, number>();
  let rows = 0;
  return {
    add(intervalStartMs: number, count: number): void {
      if (typeof intervalStartMs !== 'number' || !Number.isFinite(intervalStartMs)) {
        throw invalidInput(`rows.${rows}.intervalStartMs`, 'must be a finite number of milliseconds since the epoch');
      }
      if (typeof count !== 'number' || !Number.isInteger(count) || count < 0) {
        throw invalidInput(`rows.${rows}.count`, 'must be a whole number, 0 or more');
      }
      const local = toLocal(intervalStartMs);
      if (local % intervalMs !== 0) {
        throw invalidInput(`rows.${rows}.intervalStartMs`, `must start a ${intervalMinutes}-minute interval in ${timeZone}`);
      }
      rows++;
      const index = local / intervalMs;
      counts.set(index, (counts.get(index) ?? 0) + count);
    },
    get count() {
      return rows;
    },
    result(): DemandFit {
      if (rows === 0) throw invalidInput('rows', 'no interval counts were added');
      const observed = [...counts.keys()].sort((a, b) => a - b);
      return buildDemandFit(counts, observed, intervalMinutes, timeZone);
    },
  };
}
