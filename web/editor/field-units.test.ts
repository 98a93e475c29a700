import { describe, expect, it } from 'vitest';
import { fromDisplay, initialDisplayUnit, tidy, toDisplay, unitWord } from './field-units';

describe('field units', () => {
  it('shows a rate stored per hour in the unit the author picks, and stores it back per hour', () => {
    expect(toDisplay(120, 'rate', 'minute', 'hour')).toBeCloseTo(2);
    expect(fromDisplay(2, 'rate', 'minute', 'hour')).toBeCloseTo(120);
  });

  it('opens a duration in its most readable unit', () => {
    expect(initialDisplayUnit('duration', 1 / 30, 'hour')).toBe('minute');
    expect(tidy(toDisplay(1 / 30, 'duration', 'minute', 'hour'))).toBe(2);
    expect(fromDisplay(20, 'duration', 'second', 'minute')).toBeCloseTo(1 / 3);
  });

  it('types probabilities as percentages', () => {
    expect(initialDisplayUnit('probability', 0.8, 'hour')).toBe('percent');
    expect(toDisplay(0.8, 'probability', 'percent', 'hour')).toBe(80);
    expect(fromDisplay(95, 'probability', 'percent', 'hour')).toBeCloseTo(0.95);
    expect(unitWord('probability', 'percent', 'hour')).toBe('%');
  });

  it('names costs per the block time unit', () => {
    expect(unitWord('cost', 'plain', 'hour')).toBe('per hour');
  });
});
