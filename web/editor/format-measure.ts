import type { MeasureField } from '#shared/queue/index';
import { readableDuration, SECONDS_PER, type TimeUnit } from '#shared/units/units';

export type MeasureKind = MeasureField['kind'];

/** Plural unit words as a report reads them. */
export const DURATION_WORDS: Record<TimeUnit, string> = { second: 'seconds', minute: 'minutes', hour: 'hours', day: 'days' };

/** What a count counts, so "servers" or "customers" stands in the unit column instead of a bare number. */
const COUNT_UNITS: Record<string, string> = {
  servers: 'servers',
  peakServers: 'servers',
  totalServerIntervals: 'server-intervals',
  L: 'customers',
  Lq: 'customers',
};

/**
 * Decimals for a row of numbers: about three significant figures for the row's largest value
 * (never more than six decimals); whole counts stay whole when `wholeStaysWhole`.
 */
export function rowDecimals(values: readonly number[], wholeStaysWhole = true): number {
  if (values.length === 0) return 0;
  if (wholeStaysWhole && values.every((v) => Number.isInteger(v))) return 0;
  const max = Math.max(...values.map(Math.abs));
  if (max >= 1000) return 0;
  if (max >= 10) return 1;
  if (max >= 1) return 2;
  if (max === 0) return 0;
  return Math.min(6, Math.max(2, 2 - Math.floor(Math.log10(max))));
}

const formatters = new Map<number, Intl.NumberFormat>();
/** en-GB digits with a fixed number of decimals (cached: tables format many cells). */
export function formatNumber(value: number, decimals: number): string {
  let f = formatters.get(decimals);
  if (!f) {
    f = new Intl.NumberFormat('en-GB', { minimumFractionDigits: decimals, maximumFractionDigits: decimals });
    formatters.set(decimals, f);
  }
  return f.format(value);
}

export interface FormattedRow {
  /** The unit of every cell in the row ("%", "per hour", "minutes", "servers"…). */
  unit: string;
  /** One text per value; "—" where there is none. */
  texts: string[];
}

/**
 * Formats one measure across the columns of a results table (a single result, or several
 * scenarios side by side) in one shared unit. Durations take the most readable unit for the
 * row's largest value, so a row never mixes minutes and seconds.
 */
export function formatMeasureRow(name: string, kind: MeasureKind, values: readonly (number | null | undefined)[], timeUnit: TimeUnit): FormattedRow {
  const present = values.filter((v): v is number => typeof v === 'number' && Number.isFinite(v));
  let scale = 1;
  let unit: string;
  switch (kind) {
    case 'probability':
    case 'ratio':
      scale = 100;
      unit = '%';
      break;
    case 'erlangs':
      unit = 'erlangs';
      break;
    case 'rate':
      unit = `per ${timeUnit}`;
      break;
    case 'cost':
      unit = `currency per ${timeUnit}`;
      break;
    case 'duration': {
      const max = present.length ? Math.max(...present.map(Math.abs)) : 0;
      const readable = readableDuration(max, timeUnit).unit;
      scale = SECONDS_PER[timeUnit] / SECONDS_PER[readable];
      unit = DURATION_WORDS[readable];
      break;
    }
    case 'count':
      unit = COUNT_UNITS[name] ?? 'count';
      break;
    default:
      unit = '';
  }
  const scaled = present.map((v) => v * scale);
  // Only counts may drop their decimals: a utilisation of exactly 80 % still reads "80.0".
  const decimals = rowDecimals(scaled, kind === 'count');
  const texts = values.map((v) => (typeof v === 'number' && Number.isFinite(v) ? formatNumber(v * scale, decimals) : '—'));
  return { unit, texts };
}

/** A list measure (a distribution, per-node values) as a short line of numbers. */
export function formatList(values: readonly number[], limit = 12): string {
  const shown = values.slice(0, limit).map((v) => (Number.isInteger(v) ? String(v) : Number(v.toPrecision(3)).toString()));
  return values.length > limit ? `${shown.join(', ')}, … (${values.length} values)` : shown.join(', ');
}
