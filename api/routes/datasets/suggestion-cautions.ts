import type { FitWarning } from '../../../shared/queue/fit/index';
import type { DatasetFit } from '../../../shared/schemas/datasets';

type Code = FitWarning['code'];

/**
 * Which of the fit's warnings travel with each kind of value it suggests (fitSuggestions' keys).
 * The average arrival rate carries "demand varies" (sizing on it under-staffs the busy hours); the
 * busiest hour's rate already answers that. "Few arrivals per interval" concerns the profile's
 * interval rates, not these averages over many intervals. Service values carry the exponential
 * verdict and the sample size. A value typed in by hand, or of an unknown key, carries none.
 */
const CARRIED: Record<string, { from: 'demand' | 'service'; codes: Code[] }> = {
  arrival_rate_mean: { from: 'demand', codes: ['small_sample', 'variable_demand'] },
  arrival_rate_busiest_hour: { from: 'demand', codes: ['small_sample'] },
  service_time_mean: { from: 'service', codes: ['small_sample', 'not_exponential', 'exponential_doubtful'] },
  service_time_scv: { from: 'service', codes: ['small_sample'] },
};

export function suggestionCautions(fit: DatasetFit, key: string | undefined): FitWarning[] {
  const rule = key ? CARRIED[key] : undefined;
  if (!rule) return [];
  const warnings = rule.from === 'demand' ? fit.demand.warnings : (fit.service?.warnings ?? []);
  return warnings.filter((w) => rule.codes.includes(w.code));
}
