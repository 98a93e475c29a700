import { invalidInput } from '../errors';

const QUARTER_HOUR_MS = 900_000;

/**
 * Maps an instant (ms since the epoch, UTC) to the wall-clock time of `timeZone` expressed as ms on
 * a UTC-based scale, so calendar fields come from plain arithmetic. The zone offset is looked up
 * with Intl once per quarter hour and cached, which keeps millions of rows fast; every real zone
 * changes its offset on a quarter-hour boundary.
 */
export function createLocalClock(timeZone: string): (ms: number) => number {
  if (timeZone === 'UTC') return (ms) => ms;
  let format: Intl.DateTimeFormat;
  try {
    format = new Intl.DateTimeFormat('en-US', {
      timeZone,
      hourCycle: 'h23',
      year: 'numeric',
      month: 'numeric',
      day: 'numeric',
      hour: 'numeric',
      minute: 'numeric',
      second: 'numeric',
    });
  } catch {
    throw invalidInput('timeZone', `unknown time zone "${timeZone}"; use an IANA name such as "Europe/Paris"`);
  }
  const cache = new Map<number, number>();
  const offsetAt = (ms: number): number => {
    const f: Record<string, number> = {};
    for (const part of format.formatToParts(new Date(ms))) if (part.type !== 'literal') f[part.type] = Number(part.value);
    return Date.UTC(f.year, f.month - 1, f.day, f.hour, f.minute, f.second) - Math.floor(ms / 1000) * 1000;
  };
  return (ms) => {
    const key = Math.floor(ms / QUARTER_HOUR_MS);
    let offset = cache.get(key);
    if (offset === undefined) {
      offset = offsetAt(key * QUARTER_HOUR_MS);
      cache.set(key, offset);
    }
    return ms + offset;
  };
}
