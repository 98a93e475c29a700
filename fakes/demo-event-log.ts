/**
 * An invented event log for demos, tests and the bench: arrivals from a Poisson process whose
 * rate follows a daily profile (constant within each hour, so the hour's gaps are exponential),
 * service times from a lognormal with a given mean and SCV. Seeded: the same options give the
 * same bytes. Times are ISO 8601 in UTC ("Z").
 */
import { createRng } from '../shared/queue/sim/rng';

export interface EventLogOptions {
  seed: number;
  /** First day (UTC midnight), "YYYY-MM-DD". */
  startDate: string;
  days: number;
  /** Arrivals per hour for each hour of the day (24 values) on weekdays. */
  hourlyRates: readonly number[];
  /** Multiplier of the rates on Saturdays and Sundays (0: closed). */
  weekendFactor: number;
  serviceMeanSeconds: number;
  /** Squared coefficient of variation of the service times (1 would be like exponential). */
  serviceScv: number;
  /** 'exponential' ignores serviceScv (tests of the exponential verdict). */
  serviceDistribution?: 'lognormal' | 'exponential';
  /** Mean wait before service starts (exponential), seconds. */
  meanWaitSeconds: number;
  channels: readonly string[];
}

/** A counter that is open 08:00–17:00 with a late-morning peak (arrivals per hour). */
export const COUNTER_DAY: readonly number[] = [0, 0, 0, 0, 0, 0, 0, 0, 14, 22, 30, 34, 26, 20, 24, 22, 16, 0, 0, 0, 0, 0, 0, 0];

export const DEMO_LOG_OPTIONS: EventLogOptions = {
  seed: 20260,
  startDate: '2026-03-02',
  days: 28,
  hourlyRates: COUNTER_DAY,
  weekendFactor: 0,
  serviceMeanSeconds: 330,
  serviceScv: 0.45,
  meanWaitSeconds: 240,
  channels: ['walk-in', 'appointment'],
};

const iso = (ms: number): string => new Date(Math.round(ms)).toISOString().replace('.000Z', 'Z');

/** Yields the CSV line by line, header first, each with its "\n". */
export function* eventLogLines(o: EventLogOptions): Generator<string> {
  const rng = createRng(o.seed);
  const sigma2 = Math.log(1 + o.serviceScv);
  const mu = Math.log(o.serviceMeanSeconds) - sigma2 / 2;
  const normal = (): number => Math.sqrt(-2 * Math.log(1 - rng.next())) * Math.cos(2 * Math.PI * rng.next());
  const expo = (mean: number): number => -mean * Math.log(1 - rng.next());
  yield 'arrived_at,service_start,service_end,channel\n';
  const day0 = Date.parse(`${o.startDate}T00:00:00Z`);
  for (let d = 0; d < o.days; d++) {
    const weekday = new Date(day0 + d * 86_400_000).getUTCDay();
    const factor = weekday === 0 || weekday === 6 ? o.weekendFactor : 1;
    for (let h = 0; h < 24; h++) {
      const rate = o.hourlyRates[h] * factor;
      if (rate <= 0) continue;
      const hourStart = day0 + d * 86_400_000 + h * 3_600_000;
      let t = hourStart + expo(3_600_000 / rate);
      while (t < hourStart + 3_600_000) {
        const start = t + expo(o.meanWaitSeconds * 1000);
        const service = (o.serviceDistribution === 'exponential' ? expo(o.serviceMeanSeconds) : Math.exp(mu + Math.sqrt(sigma2) * normal())) * 1000;
        const channel = o.channels[Math.floor(rng.next() * o.channels.length)] ?? '';
        yield `${iso(t)},${iso(start)},${iso(start + service)},${channel}\n`;
        t += expo(3_600_000 / rate);
      }
    }
  }
}

/** The whole log as one string (small logs only: demos and tests). */
export const eventLogCsv = (o: EventLogOptions = DEMO_LOG_OPTIONS): string => [...eventLogLines(o)].join('');
