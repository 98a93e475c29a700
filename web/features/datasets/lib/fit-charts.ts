import type { DemandProfile, ServiceHistogram } from '#shared/queue/fit/index';

const FONT = 'Inter, system-ui, sans-serif';
const ACCENT = '#1e5a5f';
const DAYS = ['Sun', 'Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat'];
const base = { $schema: 'https://vega.github.io/schema/vega-lite/v6.json', config: { font: FONT, axis: { labelColor: '#55524c', titleColor: '#55524c', gridColor: '#eeece6' }, view: { stroke: null } } };

/** Mean arrivals per hour for each hour of the day, with hours never observed left out. */
export function hourProfileSpec(profile: DemandProfile) {
  return {
    ...base,
    width: 560,
    height: 200,
    data: { values: profile.byHour.filter((c) => c.hoursObserved > 0).map((c) => ({ hour: `${String(c.hour).padStart(2, '0')}:00`, rate: c.ratePerHour })) },
    mark: { type: 'bar', color: ACCENT },
    encoding: {
      x: { field: 'hour', type: 'ordinal', title: 'Hour of day', axis: { labelAngle: -45 } },
      y: { field: 'rate', type: 'quantitative', title: 'Arrivals per hour' },
    },
  };
}

/** Hour of day × day of week: where the demand sits in the week. */
export function weekHeatSpec(profile: DemandProfile) {
  return {
    ...base,
    width: 560,
    height: 170,
    data: { values: profile.byWeekdayHour.filter((c) => c.hoursObserved > 0).map((c) => ({ day: DAYS[c.weekday], order: (c.weekday + 6) % 7, hour: c.hour, rate: c.ratePerHour })) },
    mark: { type: 'rect' },
    encoding: {
      x: { field: 'hour', type: 'ordinal', title: 'Hour of day' },
      y: { field: 'day', type: 'ordinal', title: null, sort: { field: 'order' } },
      color: { field: 'rate', type: 'quantitative', title: 'Per hour', scale: { scheme: 'teals' } },
    },
  };
}

/** Service-time density as bars with the fitted exponential density as a line over them (minutes). */
export function histogramSpec(h: ServiceHistogram) {
  const rows = h.bins.map((b) => ({ from: b.fromSeconds / 60, to: b.toSeconds / 60, mid: (b.fromSeconds + b.toSeconds) / 120, observed: b.density * 60, exponential: b.exponentialDensity * 60 }));
  return {
    ...base,
    width: 560,
    height: 220,
    data: { values: rows },
    layer: [
      {
        mark: { type: 'rect', color: '#9fbfc1' },
        encoding: { x: { field: 'from', type: 'quantitative', title: 'Service time (minutes)' }, x2: { field: 'to' }, y: { field: 'observed', type: 'quantitative', title: 'Density (per minute)' } },
      },
      { mark: { type: 'line', color: '#9c2429', strokeWidth: 2 }, encoding: { x: { field: 'mid', type: 'quantitative' }, y: { field: 'exponential', type: 'quantitative' } } },
    ],
  };
}
