import type { DatasetMapping } from '../../../shared/schemas/datasets';

/** A timestamp read from a cell: the instant, and the offset it carried (minutes) if any. */
export interface ParsedTime {
  ms: number;
  offsetMinutes: number | null;
}

// Calendar date, "T" or a space, clock time to the minute, optional seconds and fraction, optional zone.
const ISO = /^(\d{4})-(\d{2})-(\d{2})[T ](\d{2}):(\d{2})(?::(\d{2})(?:[.,](\d{1,9}))?)?\s*(Z|[+-]\d{2}(?::?\d{2})?)?$/i;
const EPOCH = /^-?\d+(?:\.\d+)?$/;

/**
 * Turns local wall-clock ms (a UTC-based scale) into an instant, given `toLocal` of the zone.
 * Two passes settle the offset except inside a clock change, where either reading is accepted.
 */
export function fromLocal(localMs: number, toLocal: (ms: number) => number): number {
  const guess = localMs - (toLocal(localMs) - localMs);
  return localMs - (toLocal(guess) - guess);
}

/**
 * Builds the cell parser of one mapping. Returns null for a cell that is not a timestamp of the
 * chosen format (the caller names the row and column). A plain ISO time (no offset) is read in
 * the mapping's time zone; epoch values are instants.
 */
export function createTimestampParser(format: DatasetMapping['timestampFormat'], toLocal: (ms: number) => number): (cell: string) => ParsedTime | null {
  if (format !== 'iso8601') {
    const scale = format === 'epoch_seconds' ? 1000 : 1;
    return (cell) => {
      const s = cell.trim();
      if (!EPOCH.test(s)) return null;
      const ms = Number(s) * scale;
      return Number.isFinite(ms) ? { ms, offsetMinutes: null } : null;
    };
  }
  return (cell) => {
    const m = ISO.exec(cell.trim());
    if (!m) return null;
    const [, y, mo, d, h, mi, s, frac, zone] = m;
    const month = Number(mo);
    const day = Number(d);
    const hour = Number(h);
    const minute = Number(mi);
    const second = s ? Number(s) : 0;
    if (month < 1 || month > 12 || day < 1 || day > 31 || hour > 23 || minute > 59 || second > 60) return null;
    const fracMs = frac ? Number(`0.${frac}`) * 1000 : 0;
    const wall = Date.UTC(Number(y), month - 1, day, hour, minute, second) + fracMs;
    // Date.UTC rolls 31 February into March: refuse dates that do not exist.
    if (new Date(wall).getUTCDate() !== day) return null;
    if (!zone) return { ms: fromLocal(wall, toLocal), offsetMinutes: null };
    if (zone.toUpperCase() === 'Z') return { ms: wall, offsetMinutes: 0 };
    const sign = zone.startsWith('-') ? -1 : 1;
    const digits = zone.slice(1).replace(':', '');
    const offsetMinutes = sign * (Number(digits.slice(0, 2)) * 60 + Number(digits.slice(2) || '0'));
    return { ms: wall - offsetMinutes * 60_000, offsetMinutes };
  };
}
