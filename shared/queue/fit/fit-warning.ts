/** A plain-words caution attached to a fit, for the dataset screen and model blocks. */
export interface FitWarning {
  code: 'small_sample' | 'few_per_interval' | 'variable_demand' | 'short_period' | 'not_exponential' | 'exponential_doubtful';
  message: string;
}
