import type { ExponentialTest } from '#shared/queue/fit/index';

/** The exponential test in a sentence a client could read. */
export function verdictWords(t: ExponentialTest, scv: number): { tone: 'ok' | 'warn' | 'danger'; text: string } {
  const p = t.pValue < 0.001 ? 'p < 0.001' : `p = ${t.pValue.toFixed(3)}`;
  if (t.rejected) {
    return { tone: 'danger', text: `Service times are clearly not exponential (Kolmogorov–Smirnov ${p}, SCV ${scv.toFixed(2)}). Models that use the SCV (M/G/1, G/G/c) or a simulation fit these data better than M/M models.` };
  }
  if (t.lillieforsAdjusted.rejected) {
    return { tone: 'warn', text: `The exponential assumption is doubtful once the estimated mean is allowed for (SCV ${scv.toFixed(2)}); treat M/M results as approximate.` };
  }
  return { tone: 'ok', text: `Nothing in these ${t.sampleSize} service times contradicts an exponential distribution (Kolmogorov–Smirnov ${p}, SCV ${scv.toFixed(2)}); M/M models are reasonable here.` };
}
