import { describe, expect, it } from 'vitest';
import { intervalDecimals } from './interval-decimals';

describe('intervalDecimals', () => {
  it.each([
    // [half-width, value, decimals] — two significant figures of the half-width (common practice)
    [0.0159, 0.5589, 3],
    [0.07, 6.23, 3],
    [0.15, 12.4, 2],
    [3.2, 450, 1],
    [32, 4500, 0],
    [1e-9, 0.5, 6],
  ])('half-width %d around %d shows %d decimals', (hw, value, decimals) => {
    expect(intervalDecimals(hw, value)).toBe(decimals);
  });

  it('falls back to three significant figures of the value for a zero-width interval', () => {
    expect(intervalDecimals(0, 0)).toBe(0);
    expect(intervalDecimals(0, 0.8)).toBe(3);
    expect(intervalDecimals(0, 40)).toBe(1);
  });
});
