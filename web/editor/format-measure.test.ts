import { describe, expect, it } from 'vitest';
import { formatList, formatMeasureRow, rowDecimals } from './format-measure';

describe('formatMeasureRow', () => {
  it('shows probabilities as percentages', () => {
    expect(formatMeasureRow('serviceLevel', 'probability', [0.8123, 0.9], 'hour')).toEqual({ unit: '%', texts: ['81.2', '90.0'] });
  });

  it('shows a wait in the most readable unit for the row (hours in, seconds out)', () => {
    expect(formatMeasureRow('Wq', 'duration', [0.01, 0.005], 'hour')).toEqual({ unit: 'seconds', texts: ['36.0', '18.0'] });
  });

  it('shows a wait of a few minutes in minutes', () => {
    expect(formatMeasureRow('Wq', 'duration', [0.05], 'hour')).toEqual({ unit: 'minutes', texts: ['3.00'] });
  });

  it('names rates and costs with the block time unit', () => {
    expect(formatMeasureRow('effectiveArrivalRate', 'rate', [118.5], 'hour').unit).toBe('per hour');
    expect(formatMeasureRow('totalCost', 'cost', [412], 'minute').unit).toBe('currency per minute');
  });

  it('keeps whole counts whole and says what they count', () => {
    expect(formatMeasureRow('servers', 'count', [11, 12], 'hour')).toEqual({ unit: 'servers', texts: ['11', '12'] });
  });

  it('shows a dash where a scenario has no value', () => {
    expect(formatMeasureRow('Wq', 'duration', [0.05, null], 'hour').texts[1]).toBe('—');
  });
});

describe('rowDecimals', () => {
  it.each([
    [[1234.5], 0],
    [[123.45], 1],
    [[12.345], 1],
    [[1.2345], 2],
    [[0.5], 3],
    [[0.0123], 4],
    [[0.00012], 6],
    [[3, 4], 0],
  ])('%j → %i decimals', (values, decimals) => expect(rowDecimals(values)).toBe(decimals));
});

describe('formatList', () => {
  it('rounds to three figures and cuts long lists', () => {
    expect(formatList([0.12345, 0.5, 1])).toBe('0.123, 0.5, 1');
    expect(formatList([1, 2, 3, 4], 2)).toBe('1, 2, … (4 values)');
  });
});
