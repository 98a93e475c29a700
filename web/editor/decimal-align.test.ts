import { describe, expect, it } from 'vitest';
import { alignDecimals, FIGURE_SPACE as F } from './decimal-align';

describe('alignDecimals', () => {
  it('pads fractions so the points line up in a right-aligned column', () => {
    expect(alignDecimals(['12.5', '0.125', '3.00'])).toEqual([`12.5${F}${F}`, '0.125', `3.00${F}`]);
  });

  it('gives whole numbers room for the point as well', () => {
    expect(alignDecimals(['10', '81.25'])).toEqual([`10${F}${F}${F}`, '81.25']);
  });

  it('handles grouped thousands and leaves dashes alone', () => {
    expect(alignDecimals(['1,234.5', '—', '7.25'])).toEqual([`1,234.5${F}`, '—', '7.25']);
  });

  it('changes nothing when no value has a fraction', () => {
    expect(alignDecimals(['10', '12'])).toEqual(['10', '12']);
  });
});
