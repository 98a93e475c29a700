import { describe, expect, it } from 'vitest';
import { convertDuration, convertRate, readableDuration, toFieldValue } from './units';

// Unit arithmetic is definitional (1 h = 60 min = 3600 s); no outside source is needed.
describe('unit conversion', () => {
  it.each([
    [12, 'hour', 'minute', 0.2],
    [1, 'second', 'hour', 3600],
    [24, 'day', 'hour', 1],
  ] as const)('a rate of %d per %s is %d per %s… (%s)', (v, from, to, want) => {
    expect(convertRate(v, from, to)).toBeCloseTo(want, 12);
  });

  it('converts durations the other way round', () => {
    expect(convertDuration(90, 'second', 'minute')).toBe(1.5);
  });

  it('shows a duration in the largest unit in which it is at least 1', () => {
    expect(readableDuration(0.025, 'hour')).toEqual({ value: 1.5, unit: 'minute' });
    expect(readableDuration(0.5, 'second')).toEqual({ value: 0.5, unit: 'second' });
  });
});

describe('toFieldValue', () => {
  it('feeds a handling time into a rate field as its reciprocal', () => {
    expect(toFieldValue(6, 'minutes', 'rate', 'hour')).toBeCloseTo(10, 12);
  });
  it('turns percent into a probability', () => {
    expect(toFieldValue(80, 'percent', 'probability', 'hour')).toBe(0.8);
  });
  it('converts an hourly cost into the block time unit', () => {
    expect(toFieldValue(60, 'currency_per_hour', 'cost', 'minute')).toBeCloseTo(1, 12);
    expect(toFieldValue(60, 'currency_per_hour', 'cost', 'hour')).toBe(60);
  });
  it('refuses dimensions that cannot meet', () => {
    expect(toFieldValue(60, 'currency_per_hour', 'rate', 'hour')).toBeNull();
    expect(toFieldValue(3, 'per_hour', 'count', 'hour')).toBeNull();
  });
});
