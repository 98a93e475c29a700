import { describe, expect, it } from 'vitest';
import { fontRuns } from './pdf-fonts';
import { formatRow, splitDecimal } from './measure-format';

// Expected strings worked out by hand (from memory of the unit definitions in shared/units).
describe('formatRow', () => {
  it.each([
    ['probability as % with one decimal from 10 %', 'probability', [0.8674], 'minute', '%', ['86.7']],
    ['small probability keeps three decimals', 'probability', [0.00042], 'minute', '%', ['0.042']],
    ['utilisation as %', 'percent-ratio', [0.9], 'hour', '%', ['90.0']],
    ['duration in hours read as seconds', 'duration', [0.0096], 'hour', 'seconds', ['34.56']],
    ['duration row shares the unit of its largest value', 'duration', [0.5, 2.1], 'minute', 'minutes', ['0.50', '2.10']],
    ['rate per block time unit', 'rate', [180.25], 'hour', 'per hour', ['180.3']],
    ['whole counts print without decimals', 'count', [9, 12480], 'hour', '', ['9', '12,480']],
    ['missing values stay missing', 'count', [null, 1.5], 'hour', '', [null, '1.50']],
  ] as const)('%s', (_what, kind, values, unit, expectedUnit, cells) => {
    const row = formatRow(kind, [...values], unit);
    expect(row.unit).toBe(expectedUnit);
    expect(row.cells).toEqual(cells);
  });

  it('splits numbers at the decimal point for alignment', () => {
    expect(splitDecimal('12,480.5')).toEqual(['12,480', '.5']);
    expect(splitDecimal('9')).toEqual(['9', '']);
  });
});

describe('fontRuns', () => {
  it('keeps Latin text in the serif and sends Greek letters and ≤ to a face that has them', () => {
    expect(fontRuns('Utilisation', 'Serif')).toEqual([{ text: 'Utilisation', font: 'Serif' }]);
    const runs = fontRuns('Utilisation ρ ≤ 1', 'Serif');
    expect(runs.map((r) => r.text).join('')).toBe('Utilisation ρ ≤ 1');
    expect(runs.find((r) => r.text.includes('ρ'))?.font).not.toBe('Serif');
    expect(fontRuns('ρ', 'Sans')[0].font).toBe('SansGreek');
  });
});
