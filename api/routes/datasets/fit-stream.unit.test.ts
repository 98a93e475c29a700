/** Parsing and fitting generated logs with known rates, through the same stream the fit job uses. */
import { Readable } from 'node:stream';
import kstest from '@stdlib/stats-kstest';
import { parse } from 'csv-parse/sync';
import { describe, expect, it } from 'vitest';
import { eventLogLines, type EventLogOptions } from '../../../fakes/demo-event-log';
import type { DatasetMapping } from '../../../shared/schemas/datasets';
import { fitStream } from './fit-stream';

const FLAT: EventLogOptions = {
  seed: 7,
  startDate: '2026-01-05',
  days: 14,
  hourlyRates: Array.from({ length: 24 }, () => 30),
  weekendFactor: 1,
  serviceMeanSeconds: 120,
  serviceScv: 1,
  serviceDistribution: 'exponential',
  meanWaitSeconds: 60,
  channels: ['desk'],
};

const mapping: DatasetMapping = {
  kind: 'event_log',
  delimiter: 'comma',
  timestampFormat: 'iso8601',
  timeZone: 'UTC',
  intervalMinutes: 60,
  timeColumn: 'arrived_at',
  serviceStartColumn: 'service_start',
  serviceEndColumn: 'service_end',
  channelColumn: 'channel',
  countColumn: null,
  handlingTimeColumn: null,
  handlingTimeUnit: 'seconds',
};

const fitOf = (o: EventLogOptions, m: Partial<DatasetMapping> = {}) => fitStream(Readable.from([...eventLogLines(o)].join('')), { ...mapping, ...m }, 'test.csv');
const durations = (o: EventLogOptions): number[] =>
  [...eventLogLines(o)].slice(1).map((l) => {
    const [, s, e] = l.trim().split(',');
    return (Date.parse(e) - Date.parse(s)) / 1000;
  });

describe('fitStream on generated event logs', () => {
  it('recovers a constant rate of 30 per hour inside its exact Poisson interval', async () => {
    const fit = await fitOf(FLAT);
    // 14 days × 24 h × 30 per hour ≈ 10 080 arrivals; the Garwood interval should cover 30.
    expect(fit.demand.overall.lowerPerHour).toBeLessThan(30);
    expect(fit.demand.overall.upperPerHour).toBeGreaterThan(30);
    expect(fit.demand.overall.ratePerHour).toBeCloseTo(30, 0);
    expect(fit.demand.dispersion.verdict).toBe('consistent with Poisson');
    expect(fit.rows).toBe(fit.demand.totalArrivals);
    expect(fit.channels).toEqual([{ name: 'desk', count: fit.rows }]);
  });

  it('recovers the daily profile: closed hours at 0, the 11:00 peak near 34 per hour', async () => {
    const fit = await fitOf({ ...FLAT, hourlyRates: [0, 0, 0, 0, 0, 0, 0, 0, 14, 22, 30, 34, 26, 20, 24, 22, 16, 0, 0, 0, 0, 0, 0, 0], weekendFactor: 0, days: 56 });
    const byHour = fit.demand.profile.byHour;
    expect(byHour[3].arrivals).toBe(0);
    // Weekends are closed, so the average over all days is 5/7 of the weekday rate.
    expect(byHour[11].ratePerHour).toBeCloseTo((34 * 5) / 7, -0.5);
    expect(fit.demand.warnings.map((w) => w.code)).toContain('variable_demand');
    expect(fit.suggestions.find((s) => s.key === 'arrival_rate_busiest_hour')?.name).toMatch(/busiest hour/);
  });

  it('gives the same KS verdict as @stdlib/stats-kstest on the same service times', async () => {
    for (const o of [FLAT, { ...FLAT, serviceDistribution: 'lognormal' as const, serviceScv: 0.3, days: 4 }]) {
      const xs = durations(o);
      const mean = xs.reduce((a, b) => a + b, 0) / xs.length;
      // source: @stdlib/stats-kstest, exponential with the sample mean (what the engine wraps).
      const ref = kstest(xs, 'exponential', 1 / mean);
      const fit = await fitOf(o);
      if (xs.length <= 5000) {
        expect(fit.service!.goodnessOfFit.statistic).toBeCloseTo(ref.statistic, 9);
        expect(fit.service!.goodnessOfFit.rejected).toBe(ref.pValue < 0.05);
      }
      expect(fit.service!.meanSeconds).toBeCloseTo(mean, 6);
    }
    const lognormal = await fitOf({ ...FLAT, serviceDistribution: 'lognormal', serviceScv: 0.3, days: 4 });
    expect(lognormal.service!.goodnessOfFit.rejected).toBe(true);
    expect(lognormal.service!.scv).toBeGreaterThan(0.2);
    expect(lognormal.service!.scv).toBeLessThan(0.4);
  });

  it('reads epoch seconds and interval counts with a handling time', async () => {
    const counts = ['start;arrivals;aht_min\n', ...Array.from({ length: 48 }, (_, i) => `${1767225600 + i * 1800};${10 + (i % 3)};${4}\n`)].join('');
    const fit = await fitStream(Readable.from(counts), { ...mapping, kind: 'interval_counts', delimiter: 'semicolon', timestampFormat: 'epoch_seconds', intervalMinutes: 30, timeColumn: 'start', serviceStartColumn: null, serviceEndColumn: null, channelColumn: null, countColumn: 'arrivals', handlingTimeColumn: 'aht_min', handlingTimeUnit: 'minutes' }, 'c.csv');
    expect(fit.demand.totalArrivals).toBe(16 * 10 + 16 * 11 + 16 * 12);
    expect(fit.handling?.meanSeconds).toBe(240);
    expect(fit.service).toBeNull();
  });

  it('reads bytes cut anywhere, mid-character included, with a BOM, CRLF and quoted cells, as csv-parse does', async () => {
    const lines = [...eventLogLines({ ...FLAT, days: 1 })].slice(1).map((l, i) => l.trim().replace(/desk$/, ['café', '"Bureau, 2e étage"', '€ desk'][i % 3]));
    const csv = '\uFEFFarrived_at,service_start,service_end,channel\r\n' + lines.join('\r\n') + '\r\n';
    const bytes = Buffer.from(csv);
    const chunks: Buffer[] = [];
    for (let at = 0, n = 1; at < bytes.length; at += n, n = (n % 7) + 1) chunks.push(bytes.subarray(at, at + n));
    const fit = await fitStream(Readable.from(chunks), mapping, 'cut.csv');
    // source: csv-parse (sync API) on the whole text, counting the channel column.
    const expected = new Map<string, number>();
    for (const r of (parse(csv, { bom: true, skip_empty_lines: true }) as string[][]).slice(1)) expected.set(r[3], (expected.get(r[3]) ?? 0) + 1);
    expect(new Map(fit.channels.map((c) => [c.name, c.count]))).toEqual(expected);
    expect(fit.rows).toBe(lines.length);
  });
});
