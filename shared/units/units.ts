/**
 * Units of the study: every rate and duration a person types carries one. The engine needs one
 * time unit per spec; a model block declares it (its `timeUnit`) and every linked assumption is
 * converted into it, so changing a unit never changes what a number means.
 */
export const TIME_UNITS = ['second', 'minute', 'hour', 'day'] as const;
export type TimeUnit = (typeof TIME_UNITS)[number];

export const SECONDS_PER: Record<TimeUnit, number> = { second: 1, minute: 60, hour: 3600, day: 86_400 };

/** Units an assumption may carry, each with its dimension. */
export const UNIT_CODES = [
  'per_second', 'per_minute', 'per_hour', 'per_day',
  'seconds', 'minutes', 'hours', 'days',
  'count', 'percent', 'fraction', 'currency_per_hour', 'number',
] as const;
export type UnitCode = (typeof UNIT_CODES)[number];

export type Dimension = 'rate' | 'duration' | 'count' | 'probability' | 'cost' | 'number';

export const UNIT_INFO: Record<UnitCode, { dimension: Dimension; label: string; time?: TimeUnit }> = {
  per_second: { dimension: 'rate', label: 'per second', time: 'second' },
  per_minute: { dimension: 'rate', label: 'per minute', time: 'minute' },
  per_hour: { dimension: 'rate', label: 'per hour', time: 'hour' },
  per_day: { dimension: 'rate', label: 'per day', time: 'day' },
  seconds: { dimension: 'duration', label: 'seconds', time: 'second' },
  minutes: { dimension: 'duration', label: 'minutes', time: 'minute' },
  hours: { dimension: 'duration', label: 'hours', time: 'hour' },
  days: { dimension: 'duration', label: 'days', time: 'day' },
  count: { dimension: 'count', label: 'count' },
  percent: { dimension: 'probability', label: '%' },
  fraction: { dimension: 'probability', label: 'fraction (0–1)' },
  currency_per_hour: { dimension: 'cost', label: 'currency per hour' },
  number: { dimension: 'number', label: 'number' },
};

/** A rate per `from` expressed per `to` (12 per hour = 0.2 per minute). */
export const convertRate = (value: number, from: TimeUnit, to: TimeUnit): number => (value * SECONDS_PER[to]) / SECONDS_PER[from];

/** A duration in `from` expressed in `to` (90 seconds = 1.5 minutes). */
export const convertDuration = (value: number, from: TimeUnit, to: TimeUnit): number => (value * SECONDS_PER[from]) / SECONDS_PER[to];

/** The largest unit in which the duration is at least 1 (or seconds), for display. */
export function readableDuration(value: number, unit: TimeUnit): { value: number; unit: TimeUnit } {
  const seconds = value * SECONDS_PER[unit];
  for (const u of ['day', 'hour', 'minute'] as const) {
    if (Math.abs(seconds) >= SECONDS_PER[u]) return { value: seconds / SECONDS_PER[u], unit: u };
  }
  return { value: seconds, unit: 'second' };
}

/** Field kinds of the engine's catalog that take a time unit. */
export type TimedKind = 'rate' | 'duration';

/**
 * Converts an assumption's value into the unit a block field expects. A duration linked to a
 * rate field (or the reverse) is inverted: "6 minutes per customer" feeds a rate of 10 per hour.
 * Returns null when the dimensions cannot meet (a cost into a rate field, say).
 */
export function toFieldValue(value: number, unit: UnitCode, fieldKind: string, blockUnit: TimeUnit): number | null {
  const info = UNIT_INFO[unit];
  if (fieldKind === 'rate' || fieldKind === 'duration') {
    if (!info.time) return null;
    if (info.dimension === fieldKind) {
      return fieldKind === 'rate' ? convertRate(value, info.time, blockUnit) : convertDuration(value, info.time, blockUnit);
    }
    if (value === 0) return null;
    // rate ↔ duration: the reciprocal, then into the block's unit.
    return fieldKind === 'rate' ? convertRate(1 / value, info.time, blockUnit) : convertDuration(1 / value, info.time, blockUnit);
  }
  if (fieldKind === 'probability') {
    if (unit === 'percent') return value / 100;
    return unit === 'fraction' || unit === 'number' ? value : null;
  }
  if (fieldKind === 'cost') {
    // Costs are money per unit of time, so they convert like rates (60 per hour = 1 per minute).
    return unit === 'currency_per_hour' ? convertRate(value, 'hour', blockUnit) : unit === 'number' ? value : null;
  }
  if (info.dimension === 'rate' || info.dimension === 'duration' || info.dimension === 'cost') return null;
  return value;
}
