import { describe, expect, it } from 'vitest';
import { QueueError } from '../errors';
import { createRng } from '../sim/rng';
import { createArrivalAccumulator } from './arrival-accumulator';
import { createIntervalCountAccumulator } from './interval-count-accumulator';
import { poissonInterval } from './poisson-interval';

const HOUR = 3_600_000;
const START = Date.UTC(2024, 0, 1); // a Monday

/** Poisson arrivals by thinning: rate(localHour) per hour over `days` days from START (UTC). */
function arrivals(ratePerHour: (hour: number) => number, maxRate: number, days: number, seed: number): number[] {
  const rng = createRng(seed);
  const out: number[] = [];
  let t = START;
  const end = START + days * 24 * HOUR;
  for (;;) {
    t += (-Math.log(rng.next()) / maxRate) * HOUR;
    if (t >= end) return out;
    const hour = new Date(t).getUTCHours();
    if (rng.next() * maxRate < ratePerHour(hour)) out.push(t);
  }
}

describe('poissonInterval (Garwood exact interval)', () => {
  it.each([
    // source: tables of exact Poisson confidence limits (e.g. Garwood 1936 as reprinted in biostatistics texts); from memory
    [0, 0, 3.689],
    [1, 0.0253, 5.572],
    [10, 4.795, 18.39],
  ])('k = %d gives [%d, %d]', (k, lower, upper) => {
    const ci = poissonInterval(k);
    expect(ci.lower).toBeCloseTo(lower, 2);
    expect(ci.upper).toBeCloseTo(upper, 1);
  });
});

describe('createArrivalAccumulator', () => {
  it('recovers a constant rate of 30 per hour within its interval, Poisson dispersion, no variability warning', () => {
    const acc = createArrivalAccumulator({ intervalMinutes: 60 });
    for (const t of arrivals(() => 30, 30, 28, 1)) acc.add(t);
    const fit = acc.result();
    expect(fit.overall.lowerPerHour).toBeLessThanOrEqual(30);
    expect(fit.overall.upperPerHour).toBeGreaterThanOrEqual(30);
    expect(fit.intervalCount).toBe(28 * 24);
    const covered = fit.intervals.filter((i) => i.lowerPerHour <= 30 && 30 <= i.upperPerHour).length / fit.intervals.length;
    expect(covered).toBeGreaterThan(0.93); // Garwood is conservative: at least 95 % in expectation
    expect(fit.dispersion.verdict).toBe('consistent with Poisson');
    expect(fit.warnings.map((w) => w.code)).not.toContain('variable_demand');
    for (const h of fit.profile.byHour) expect(Math.abs(h.ratePerHour - 30)).toBeLessThan(5);
  });

  it('sees a daytime peak: overdispersed, warns, peak interval in the day, profile by hour recovers both rates', () => {
    const rate = (h: number): number => (h >= 9 && h < 17 ? 60 : 5);
    const acc = createArrivalAccumulator({ intervalMinutes: 15 });
    for (const t of arrivals(rate, 60, 21, 2)) acc.add(t);
    const fit = acc.result();
    expect(fit.dispersion.verdict).toBe('overdispersed');
    expect(fit.warnings.map((w) => w.code)).toContain('variable_demand');
    const peakHour = Number(fit.peak!.start.slice(11, 13));
    expect(peakHour).toBeGreaterThanOrEqual(9);
    expect(peakHour).toBeLessThan(17);
    expect(fit.profile.byHour[12].ratePerHour).toBeGreaterThan(55);
    expect(fit.profile.byHour[12].ratePerHour).toBeLessThan(65);
    expect(fit.profile.byHour[3].ratePerHour).toBeLessThan(7);
    expect(fit.profile.byWeekday).toHaveLength(7);
    expect(fit.profile.byWeekdayHour[1 * 24 + 10].weekday).toBe(1);
  });

  it('places arrivals in the local hour and weekday of the time zone, summer time included', () => {
    const acc = createArrivalAccumulator({ intervalMinutes: 30, timeZone: 'Europe/Paris' });
    acc.add(Date.UTC(2024, 0, 15, 8, 40)); // Monday 09:40 in winter (UTC+1)
    acc.add(Date.UTC(2024, 6, 15, 8, 40)); // Monday 10:40 in summer (UTC+2)
    const fit = acc.result();
    expect(fit.profile.byHour[9].arrivals).toBe(1);
    expect(fit.profile.byHour[10].arrivals).toBe(1);
    expect(fit.profile.byWeekday[1].arrivals).toBe(2);
    expect(fit.intervals[0].start).toBe('2024-01-15T09:30');
    expect(fit.peak!.count).toBe(1);
  });

  it('warns about a small sample', () => {
    const acc = createArrivalAccumulator({ intervalMinutes: 60 });
    for (let i = 0; i < 12; i++) acc.add(START + i * 0.7 * HOUR);
    expect(acc.result().warnings.map((w) => w.code)).toContain('small_sample');
  });

  it.each([
    [{ intervalMinutes: 7 }, 'intervalMinutes'],
    [{ intervalMinutes: 15, timeZone: 'Mars/Olympus' }, 'timeZone'],
    [{ intervalMinutes: 15, extra: 1 }, ''],
  ])('refuses options %o', (options, path) => {
    try {
      createArrivalAccumulator(options as { intervalMinutes: number });
      throw new Error('accepted');
    } catch (e) {
      expect(e).toBeInstanceOf(QueueError);
      if (path) expect((e as QueueError).issues.map((i) => i.path)).toContain(path);
    }
  });

  it('refuses a timestamp that is not a finite number, naming its row, and an empty log', () => {
    const acc = createArrivalAccumulator({ intervalMinutes: 60 });
    expect(() => acc.result()).toThrow(QueueError);
    acc.add(START);
    expect(() => acc.add(Number.NaN)).toThrow(expect.objectContaining({ issues: [expect.objectContaining({ path: 'timestamps.1' })] }));
  });
});

describe('createIntervalCountAccumulator', () => {
  it('recovers a rate of 120 per hour from 15-minute Poisson counts and ignores gaps', () => {
    const rng = createRng(3);
    const acc = createIntervalCountAccumulator({ intervalMinutes: 15 });
    for (let i = 0; i < 2000; i++) {
      if (i % 10 === 9) continue; // unobserved intervals: no row
      let k = 0;
      for (let s = -Math.log(rng.next()); s < 30; s += -Math.log(rng.next())) k++; // Poisson(30) by exponential gaps
      acc.add(START + i * 15 * 60_000, k);
    }
    const fit = acc.result();
    expect(fit.intervalCount).toBe(1800);
    expect(fit.overall.lowerPerHour).toBeLessThanOrEqual(120);
    expect(fit.overall.upperPerHour).toBeGreaterThanOrEqual(120);
    expect(fit.dispersion.verdict).toBe('consistent with Poisson');
  });

  it('sums rows of one interval and refuses misaligned starts and bad counts', () => {
    const acc = createIntervalCountAccumulator({ intervalMinutes: 60 });
    acc.add(START, 3);
    acc.add(START, 4);
    expect(acc.result().intervals[0].count).toBe(7);
    expect(() => acc.add(START + 60_000, 1)).toThrow(QueueError);
    expect(() => acc.add(START, -1)).toThrow(QueueError);
    expect(() => acc.add(START, 1.5)).toThrow(QueueError);
  });
});
