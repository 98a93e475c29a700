import type { DatasetMapping } from '../../../shared/schemas/datasets';
import { daysFromCivil } from './days-from-civil';

/** A timestamp read from a cell: the instant, and the offset it carried (minutes) if any. */
export interface ParsedTime {
  ms: number;
  offsetMinutes: number | null;
}

/** Reads a cell into `into` (reused, so a million rows allocate nothing); false when it is not a timestamp. */
export type TimestampParser = (cell: string, into: ParsedTime) => boolean;

// What is accepted, in full: calendar date, "T" or a space, clock time to the minute, optional
// seconds and fraction, optional zone. The hand-written path below covers the usual exports only.
const ISO = /^(\d{4})-(\d{2})-(\d{2})[T ](\d{2}):(\d{2})(?::(\d{2})(?:[.,](\d{1,9}))?)?\s*(Z|[+-]\d{2}(?::?\d{2})?)?$/i;
const EPOCH = /^-?\d+(?:\.\d+)?$/;
const MONTH_DAYS = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];
const NO_ZONE = 1e9; // `offset` argument of settle(): the text carried no offset

/**
 * Turns local wall-clock ms (a UTC-based scale) into an instant, given `toLocal` of the zone.
 * Two passes settle the offset except inside a clock change, where either reading is accepted.
 */
export function fromLocal(localMs: number, toLocal: (ms: number) => number): number {
  const guess = localMs - (toLocal(localMs) - localMs);
  return localMs - (toLocal(guess) - guess);
}

/** The two decimal digits at i as a number, or a negative number when they are not digits. */
function two(s: string, i: number): number {
  const a = s.charCodeAt(i) - 48, b = s.charCodeAt(i + 1) - 48;
  return a >= 0 && a <= 9 && b >= 0 && b <= 9 ? a * 10 + b : -1;
}

/**
 * Checks the fields and stores the instant. A second of 60 (a leap second) reads as the next
 * minute's 0, as Date.UTC would; a date that does not exist (31 February) is refused.
 */
function settle(y: number, month: number, day: number, hour: number, minute: number, second: number, fracMs: number, offset: number, toLocal: (ms: number) => number, into: ParsedTime): boolean {
  if (month < 1 || month > 12 || day < 1 || hour > 23 || minute > 59 || second > 60) return false;
  const leap = month === 2 && y % 4 === 0 && (y % 100 !== 0 || y % 400 === 0);
  if (day > MONTH_DAYS[month - 1] + (leap ? 1 : 0)) return false;
  const wall = daysFromCivil(y, month, day) * 86_400_000 + ((hour * 60 + minute) * 60 + second) * 1000 + fracMs;
  if (offset === NO_ZONE) {
    into.ms = fromLocal(wall, toLocal);
    into.offsetMinutes = null;
  } else {
    into.ms = wall - offset * 60_000;
    into.offsetMinutes = offset;
  }
  return true;
}

/** ms of a fraction of a second given as `digits` decimal digits: exact to the millisecond. */
const fractionMs = (value: number, digits: number): number => (digits <= 3 ? value * 10 ** (3 - digits) : value / 10 ** (digits - 3));

/**
 * The usual layout, read digit by digit (a regular expression with captures costs several times
 * more per cell): YYYY-MM-DD(T| )HH:MM:SS(.f{1,9})?(Z|±HH:MM)?. Undefined for anything else,
 * which the full grammar then decides.
 */
function readUsual(s: string, toLocal: (ms: number) => number, into: ParsedTime): boolean | undefined {
  if (s.length < 19 || s.charCodeAt(4) !== 45 || s.charCodeAt(7) !== 45 || s.charCodeAt(13) !== 58 || s.charCodeAt(16) !== 58) return undefined;
  const sep = s.charCodeAt(10);
  if (sep !== 84 && sep !== 32) return undefined;
  const c1 = two(s, 0), c2 = two(s, 2), month = two(s, 5), day = two(s, 8), hour = two(s, 11), minute = two(s, 14), second = two(s, 17);
  if ((c1 | c2 | month | day | hour | minute | second) < 0) return undefined;
  let i = 19, frac = 0, fracDigits = 0;
  if (s.charCodeAt(i) === 46) {
    for (i++; fracDigits < 10; i++, fracDigits++) {
      const d = s.charCodeAt(i) - 48;
      if (!(d >= 0 && d <= 9)) break;
      frac = frac * 10 + d;
    }
    if (fracDigits === 0 || fracDigits > 9) return undefined;
  }
  let offset = NO_ZONE;
  const z = s.charCodeAt(i);
  if (z === 90 && i + 1 === s.length) offset = 0;
  else if ((z === 43 || z === 45) && i + 6 === s.length && s.charCodeAt(i + 3) === 58) {
    const oh = two(s, i + 1), om = two(s, i + 4);
    if ((oh | om) < 0) return undefined;
    offset = (z === 45 ? -1 : 1) * (oh * 60 + om);
  } else if (i !== s.length) return undefined;
  return settle(c1 * 100 + c2, month, day, hour, minute, second, fractionMs(frac, fracDigits), offset, toLocal, into);
}

/** Any text the full grammar accepts (spaces, lower case, a comma, short or colon-less offsets). */
function readAny(cell: string, toLocal: (ms: number) => number, into: ParsedTime): boolean {
  const m = ISO.exec(cell.trim());
  if (!m) return false;
  const [, y, mo, d, h, mi, s, frac, zone] = m;
  let offset = NO_ZONE;
  if (zone && zone.toUpperCase() === 'Z') offset = 0;
  else if (zone) {
    const digits = zone.slice(1).replace(':', '');
    offset = (zone.startsWith('-') ? -1 : 1) * (Number(digits.slice(0, 2)) * 60 + Number(digits.slice(2) || '0'));
  }
  return settle(Number(y), Number(mo), Number(d), Number(h), Number(mi), s ? Number(s) : 0, frac ? fractionMs(Number(frac), frac.length) : 0, offset, toLocal, into);
}

/**
 * Builds the cell parser of one mapping. A plain ISO time (no offset) is read in the mapping's
 * time zone; epoch values are instants. The caller names the row and column of a refused cell.
 */
export function createTimestampParser(format: DatasetMapping['timestampFormat'], toLocal: (ms: number) => number): TimestampParser {
  if (format !== 'iso8601') {
    const scale = format === 'epoch_seconds' ? 1000 : 1;
    return (cell, into) => {
      const s = cell.trim();
      if (!EPOCH.test(s)) return false;
      into.ms = Number(s) * scale;
      into.offsetMinutes = null;
      return Number.isFinite(into.ms);
    };
  }
  return (cell, into) => readUsual(cell, toLocal, into) ?? readAny(cell, toLocal, into);
}
