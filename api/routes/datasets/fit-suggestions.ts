import type { AssumptionSuggestion, DatasetFit } from '../../../shared/schemas/datasets';

const sig = (v: number, digits = 4): number => Number(v.toPrecision(digits));

/**
 * The values a fit proposes for the register, named after the dataset so that several datasets
 * can feed one engagement. The user edits names, values and units before anything is saved.
 */
export function fitSuggestions(fit: DatasetFit, datasetName: string): AssumptionSuggestion[] {
  const from = datasetName.replace(/\.(csv|tsv|txt)$/i, '').slice(0, 60);
  const out: AssumptionSuggestion[] = [];
  const d = fit.demand;
  out.push({
    key: 'arrival_rate_mean',
    name: `Arrival rate, average (${from})`,
    value: sig(d.overall.ratePerHour),
    unit: 'per_hour',
    notes: `Over ${sig(d.hoursObserved, 3)} observed hours; 95 % interval ${sig(d.overall.lowerPerHour, 3)}–${sig(d.overall.upperPerHour, 3)} per hour (exact Poisson).`,
  });
  const busiest = d.profile.byHour.reduce((a, b) => (b.ratePerHour > a.ratePerHour ? b : a));
  if (busiest.ratePerHour > 0) {
    out.push({
      key: 'arrival_rate_busiest_hour',
      name: `Arrival rate, busiest hour (${from})`,
      value: sig(busiest.ratePerHour),
      unit: 'per_hour',
      notes: `Mean rate from ${String(busiest.hour).padStart(2, '0')}:00 to ${String(busiest.hour + 1).padStart(2, '0')}:00 over ${sig(busiest.hoursObserved, 3)} observed hours.`,
    });
  }
  if (fit.service) {
    const s = fit.service;
    out.push({
      key: 'service_time_mean',
      name: `Service time, mean (${from})`,
      value: sig(s.meanSeconds / 60),
      unit: 'minutes',
      notes: `${s.count} services; 95 % interval ${sig(s.meanInterval.lower / 60, 3)}–${sig(s.meanInterval.upper / 60, 3)} minutes.`,
    });
    out.push({
      key: 'service_time_scv',
      name: `Service time SCV (${from})`,
      value: sig(s.scv, 3),
      unit: 'number',
      notes: `Squared coefficient of variation; 1 for exponential service times. ${s.goodnessOfFit.rejected ? 'The exponential assumption is rejected.' : 'The exponential assumption is not rejected.'}`,
    });
  }
  if (fit.handling) {
    out.push({
      key: 'handling_time_mean',
      name: `Handling time, mean (${from})`,
      value: sig(fit.handling.meanSeconds / 60),
      unit: 'minutes',
      notes: `Arrival-weighted mean over ${fit.handling.intervals} intervals.`,
    });
  }
  return out;
}
