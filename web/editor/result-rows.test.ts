import { describe, expect, it } from 'vitest';
import { compute } from '#shared/queue/index';
import { FIGURE_SPACE as F } from './decimal-align';
import { resultRows } from './result-rows';

const run = (spec: Record<string, unknown>) => compute(spec) as unknown as Record<string, unknown>;

describe('resultRows', () => {
  it('lists the measures a model reports, each with its unit, aligned on the point', () => {
    const rows = resultRows('M/M/c', [{ label: 'Result', result: run({ model: 'M/M/c', arrivalRate: 120, serviceRate: 15, servers: 10, t: 1 / 30 }) }], 'hour');
    const rho = rows.find((r) => r.name === 'rho');
    expect(rho?.unit).toBe('%');
    // P(empty) has four decimals here, so 80.0 is padded by three figure spaces.
    expect(rho?.cells).toEqual([`80.0${F}${F}${F}`]);
    expect(rows.find((r) => r.name === 'Wq')?.unit).toBe('seconds');
    expect(rows.some((r) => r.name === 'probN')).toBe(false);
  });

  it('puts scenarios side by side in one unit per row', () => {
    const a = run({ model: 'M/M/c', arrivalRate: 120, serviceRate: 15, servers: 10 });
    const b = run({ model: 'M/M/c', arrivalRate: 120, serviceRate: 15, servers: 12 });
    const rows = resultRows('M/M/c', [{ label: '10', result: a }, { label: '12', result: b }], 'hour', ['Wq', 'rho']);
    expect(rows.map((r) => r.name)).toEqual(['Wq', 'rho']);
    expect(rows[0].cells).toHaveLength(2);
  });

  it('types a staffing result by its criterion and shows the queue at the chosen count', () => {
    const r = run({ model: 'staffing', arrivalRate: 120, serviceRate: 15, criterion: 'serviceLevel', target: 0.8, t: 1 / 30 });
    const rows = resultRows('staffing', [{ label: 'Result', result: r }], 'hour', undefined, 'serviceLevel');
    expect(rows.find((x) => x.name === 'servers')).toMatchObject({ unit: 'servers' });
    expect(rows.find((x) => x.name === 'achieved')).toMatchObject({ label: 'Achieved service level', unit: '%' });
    expect(rows.find((x) => x.name === 'Wq')).toBeTruthy();
  });
});
