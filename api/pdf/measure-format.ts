/**
 * Numbers as the report prints them: a unit per row (durations in a readable unit converted from
 * the block's time unit, probabilities and utilisations as %), a precision chosen per row from
 * its largest value so a row of scenarios reads alike, and grouping for thousands.
 */
import type { MeasureField } from '../../shared/queue/catalog';
import { readableDuration, SECONDS_PER, type TimeUnit } from '../../shared/units/units';

export type MeasureKind = MeasureField['kind'] | 'percent-ratio';

export interface FormattedRow {
  unit: string;
  /** One formatted number per input value; null stays null (shown as a dash). */
  cells: (string | null)[];
}

const PLURAL: Record<TimeUnit, string> = { second: 'seconds', minute: 'minutes', hour: 'hours', day: 'days' };

/** Fraction digits from the magnitude: 3 below 1, 2 below 100, 1 below 1000, else none. */
function digitsFor(max: number): number {
  if (max >= 1000) return 0;
  if (max >= 100) return 1;
  if (max >= 1) return 2;
  return 3;
}

const formatters = new Map<number, Intl.NumberFormat>();
/** A fixed-point number with thousands grouping ("12,480.5"); en-GB so output never depends on the host locale. */
export function formatFixed(value: number, digits: number): string {
  let f = formatters.get(digits);
  if (!f) {
    f = new Intl.NumberFormat('en-GB', { minimumFractionDigits: digits, maximumFractionDigits: digits, useGrouping: true });
    formatters.set(digits, f);
  }
  const s = f.format(value);
  return s === '-0' || /^-0\.0*$/.test(s) ? s.slice(1) : s;
}

function fixedRow(values: (number | null)[], scale: number, digitsOverride?: number): (string | null)[] {
  const finite = values.filter((v): v is number => v !== null && Number.isFinite(v)).map((v) => Math.abs(v * scale));
  const allIntegers = values.every((v) => v === null || Number.isInteger(v * scale));
  const digits = digitsOverride ?? (allIntegers ? 0 : digitsFor(finite.length > 0 ? Math.max(...finite) : 0));
  return values.map((v) => (v === null || !Number.isFinite(v) ? null : formatFixed(v * scale, digits)));
}

/** Percentages: one decimal from 10 %, two from 1 %, three below (so 0.042 % is not "0.0 %"). */
function percentRow(values: (number | null)[]): (string | null)[] {
  const finite = values.filter((v): v is number => v !== null && Number.isFinite(v)).map((v) => Math.abs(v * 100));
  const positive = finite.filter((v) => v > 0);
  const smallest = positive.length > 0 ? Math.min(...positive) : 10;
  const digits = smallest >= 10 ? 1 : smallest >= 1 ? 2 : 3;
  return fixedRow(values, 100, digits);
}

/** Formats a row of values of one measure kind, all in the block's `timeUnit`. */
export function formatRow(kind: MeasureKind, values: (number | null)[], timeUnit: TimeUnit): FormattedRow {
  switch (kind) {
    case 'probability':
    case 'percent-ratio':
      return { unit: '%', cells: percentRow(values) };
    case 'duration': {
      const finite = values.filter((v): v is number => v !== null && Number.isFinite(v));
      const largest = finite.length > 0 ? Math.max(...finite.map(Math.abs)) : 0;
      // One readable unit for the whole row, chosen by its largest value.
      const unit = largest > 0 ? readableDuration(largest, timeUnit).unit : timeUnit;
      const scale = SECONDS_PER[timeUnit] / SECONDS_PER[unit];
      return { unit: PLURAL[unit], cells: fixedRow(values, scale) };
    }
    case 'rate':
      return { unit: `per ${timeUnit}`, cells: fixedRow(values, 1) };
    case 'cost':
      return { unit: `per ${timeUnit}`, cells: fixedRow(values, 1, 2) };
    case 'erlangs':
      return { unit: 'erlangs', cells: fixedRow(values, 1) };
    case 'ratio':
      return { unit: '', cells: fixedRow(values, 1, 3) };
    default:
      return { unit: '', cells: fixedRow(values, 1) };
  }
}

/** The integer and fraction parts of a formatted number ("1,234.5" → ["1,234", ".5"]), for decimal alignment. */
export function splitDecimal(formatted: string): [string, string] {
  const dot = formatted.indexOf('.');
  return dot < 0 ? [formatted, ''] : [formatted.slice(0, dot), formatted.slice(dot)];
}
