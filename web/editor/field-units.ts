import { convertDuration, convertRate, readableDuration, type TimeUnit } from '#shared/units/units';
import { DURATION_WORDS } from './format-measure';

/**
 * How an input is typed versus how it is stored. Stored values are in the block's time unit
 * (rates per unit, durations in units) and probabilities as fractions; people type rates and
 * durations in any unit they like and probabilities as percentages.
 */
export type DisplayUnit = TimeUnit | 'percent' | 'plain';

/** The unit an input shows when the panel opens: durations in their most readable unit. */
export function initialDisplayUnit(kind: string, stored: unknown, timeUnit: TimeUnit): DisplayUnit {
  if (kind === 'probability') return 'percent';
  if (kind === 'duration') return typeof stored === 'number' && stored > 0 ? readableDuration(stored, timeUnit).unit : timeUnit;
  if (kind === 'rate') return timeUnit;
  return 'plain';
}

/** A stored value as shown in `unit`. */
export function toDisplay(stored: number, kind: string, unit: DisplayUnit, timeUnit: TimeUnit): number {
  if (unit === 'percent') return stored * 100;
  if (unit === 'plain') return stored;
  return kind === 'rate' ? convertRate(stored, timeUnit, unit) : convertDuration(stored, timeUnit, unit);
}

/** A typed value in `unit` as stored in the block. */
export function fromDisplay(typed: number, kind: string, unit: DisplayUnit, timeUnit: TimeUnit): number {
  if (unit === 'percent') return typed / 100;
  if (unit === 'plain') return typed;
  return kind === 'rate' ? convertRate(typed, unit, timeUnit) : convertDuration(typed, unit, timeUnit);
}

/** Words for a unit as an input's suffix or choice. */
export function unitWord(kind: string, unit: DisplayUnit, timeUnit: TimeUnit): string {
  if (unit === 'percent') return '%';
  if (unit === 'plain') {
    if (kind === 'cost') return `per ${timeUnit}`;
    if (kind === 'rates') return `per ${timeUnit}`;
    return '';
  }
  return kind === 'rate' ? `per ${unit}` : DURATION_WORDS[unit];
}

/** Rounds away float noise from unit conversions (0.30000000000000004 → 0.3) for display. */
export function tidy(value: number): number {
  return Number(value.toPrecision(12));
}
