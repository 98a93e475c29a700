import { describe, expect, it } from 'vitest';
import { formatMoved } from './format-moved';

describe('formatMoved', () => {
  it('shows a utilisation as a percentage', () => {
    expect(formatMoved({ measure: 'rho', before: 0.8, after: 0.9 }, 'hour')).toMatchObject({ label: 'Utilisation ρ', unit: '%', before: '80.0', after: '90.0', direction: 'up' });
  });

  it('puts a mean wait in the most readable unit of the block', () => {
    // 0.05 hours = 3 minutes; 0.02 hours = 1.2 minutes.
    expect(formatMoved({ measure: 'Wq', before: 0.05, after: 0.02 }, 'hour')).toMatchObject({ unit: 'minutes', before: '3.00', after: '1.20', direction: 'down' });
  });

  it('adds decimals until before and after read differently', () => {
    const line = formatMoved({ measure: 'L', before: 2.0001, after: 2.0002 }, 'minute');
    expect(line.before).not.toBe(line.after);
    expect(line.unit).toBe('customers');
  });

  it('names the scenario apart from the measure', () => {
    expect(formatMoved({ measure: 'Option B: serviceLevel', before: 0.7, after: null }, 'minute')).toMatchObject({ scenario: 'Option B', before: '70.0', after: '—', direction: 'vanished' });
  });

  it('leaves rates without a unit when the block unit is unknown', () => {
    expect(formatMoved({ measure: 'effectiveArrivalRate', before: 10, after: 12 }, null)).toMatchObject({ unit: '', before: '10.0', after: '12.0' });
  });

  it('keeps an unknown measure under its own name', () => {
    expect(formatMoved({ measure: 'mystery', before: 1, after: 2 }, 'hour')).toMatchObject({ label: 'mystery', unit: '' });
  });
});
