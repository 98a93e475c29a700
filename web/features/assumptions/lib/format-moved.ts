import { readableDuration, SECONDS_PER, type TimeUnit } from '#shared/units/units';
import type { MovedNumber } from '#shared/schemas/assumptions';
import { measureInfo } from './measure-info';

export interface MovedLine {
  scenario: string | null;
  label: string;
  /** "%", "minutes", "per hour", "servers"…; empty where the number has no unit. */
  unit: string;
  before: string;
  after: string;
  direction: 'up' | 'down' | 'appeared' | 'vanished';
}

const DURATION_WORDS: Record<TimeUnit, string> = { second: 'seconds', minute: 'minutes', hour: 'hours', day: 'days' };
const COUNT_UNITS: Record<string, string> = { L: 'customers', Lq: 'customers', servers: 'servers', peakServers: 'servers', totalServerIntervals: 'server-intervals' };

function scaleAndUnit(name: string, kind: string | null, values: number[], timeUnit: TimeUnit | null): { scale: number; unit: string } {
  switch (kind) {
    case 'probability':
    case 'ratio':
      return { scale: 100, unit: '%' };
    case 'erlangs':
      return { scale: 1, unit: 'erlangs' };
    case 'count':
      return { scale: 1, unit: COUNT_UNITS[name] ?? '' };
    case 'rate':
      return { scale: 1, unit: timeUnit ? `per ${timeUnit}` : '' };
    case 'cost':
      return { scale: 1, unit: timeUnit ? `currency per ${timeUnit}` : '' };
    case 'duration': {
      if (!timeUnit) return { scale: 1, unit: '' };
      const readable = readableDuration(Math.max(0, ...values.map(Math.abs)), timeUnit).unit;
      return { scale: SECONDS_PER[timeUnit] / SECONDS_PER[readable], unit: DURATION_WORDS[readable] };
    }
    default:
      return { scale: 1, unit: '' };
  }
}

const text = (v: number, decimals: number) => new Intl.NumberFormat('en-GB', { minimumFractionDigits: decimals, maximumFractionDigits: decimals }).format(v);

/**
 * One moved number as a reviewer reads it: a label, before and after in one readable unit, with
 * just enough decimals that the two differ (three significant figures, more if they would tie).
 * `timeUnit` is the block's; without it rates and durations go without a unit rather than a wrong one.
 */
export function formatMoved(m: Pick<MovedNumber, 'measure' | 'before' | 'after'>, timeUnit: TimeUnit | null): MovedLine {
  const info = measureInfo(m.measure);
  const present = [m.before, m.after].filter((v): v is number => v !== null);
  const { scale, unit } = scaleAndUnit(info.name, info.kind, present, timeUnit);
  const scaled = present.map((v) => v * scale);
  const max = Math.max(0, ...scaled.map(Math.abs));
  // Only counts drop their decimals: a utilisation of exactly 80 % still reads "80.0".
  let decimals = info.kind === 'count' && scaled.every(Number.isInteger) ? 0 : max >= 1000 ? 0 : max >= 10 ? 1 : max >= 1 ? 2 : Math.min(6, 2 - Math.floor(Math.log10(max || 1)));
  if (m.before !== null && m.after !== null) {
    while (decimals < 8 && text(m.before * scale, decimals) === text(m.after * scale, decimals)) decimals++;
  }
  const show = (v: number | null) => (v === null ? '—' : text(v * scale, decimals));
  const direction = m.before === null ? 'appeared' : m.after === null ? 'vanished' : m.after > m.before ? 'up' : 'down';
  return { scenario: info.scenario, label: info.label, unit, before: show(m.before), after: show(m.after), direction };
}
