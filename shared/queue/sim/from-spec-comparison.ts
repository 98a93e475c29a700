import { MODEL_CATALOG } from '../catalog';
import type { QueueMeasures } from '../result';
import type { Estimate } from './estimate';
import type { SimulationEstimates } from './summarise';

/** One measure: the analytic value and whether it lies inside the simulation's 95 % interval. */
export interface MeasureComparison {
  /** Name of the analytic measure ("Wq", "probBlock", …). */
  measure: string;
  /** Its label as the editor shows it. */
  label: string;
  /** The analytic engine's value, in the spec's time unit. */
  analytic: number;
  mean: number;
  lower: number;
  upper: number;
  halfWidth: number;
  inside: boolean;
}

export interface SimulationComparison {
  /** Whether the analytic method is exact for the model (false for Allen–Cunneen and Kingman). */
  formulaExact: boolean;
  measures: MeasureComparison[];
  /** Every compared measure lies inside its interval. */
  allInside: boolean;
}

/**
 * Analytic measures and the simulation estimate of the same quantity. Both sides use the same
 * definitions (checked in analytic-cross-check.test.ts): waits and probabilities over admitted
 * customers, lengths and utilisation as time averages, throughput as customers served per unit.
 */
const PAIRS: readonly (readonly [keyof QueueMeasures, keyof SimulationEstimates])[] = [
  ['Wq', 'wq'],
  ['W', 'w'],
  ['Lq', 'lq'],
  ['L', 'l'],
  ['probWait', 'probWait'],
  ['serviceLevel', 'serviceLevel'],
  ['probBlock', 'probBlock'],
  ['probAbandon', 'probAbandon'],
  ['serverUtilization', 'utilisation'],
  ['effectiveArrivalRate', 'throughput'],
];

const LABELS = new Map<string, string>(MODEL_CATALOG.flatMap((entry) => entry.measures.map((m) => [m.name, m.label] as const)));

/** Rounding slack, so an exact 0 against an interval [0, 0] counts as inside. */
const inInterval = (x: number, e: Pick<Estimate, 'lower' | 'upper'>): boolean => {
  const slack = 1e-9 * Math.max(1, Math.abs(x));
  return x >= e.lower - slack && x <= e.upper + slack;
};

/**
 * Says, per measure both sides report, whether the analytic value lies inside the simulation's
 * 95 % confidence interval. Pure. A 95 % interval misses an exact value about one time in twenty
 * by design, so one miss among many measures is not proof the formula is wrong; a miss on an
 * approximate formula (G/G/c) says the approximation is off by more than the simulation's noise.
 * Both arguments must use the same time unit.
 */
export function compareWithAnalytic(
  analytic: QueueMeasures & { method?: { exact: boolean } },
  simulation: { estimates: Partial<Record<keyof SimulationEstimates, Estimate | undefined>> },
): SimulationComparison {
  const measures: MeasureComparison[] = [];
  for (const [name, key] of PAIRS) {
    const exact = analytic[name];
    const est = simulation.estimates[key];
    if (typeof exact !== 'number' || !Number.isFinite(exact) || !est) continue;
    measures.push({
      measure: name,
      label: LABELS.get(name) ?? name,
      analytic: exact,
      mean: est.mean,
      lower: est.lower,
      upper: est.upper,
      halfWidth: est.halfWidth,
      inside: inInterval(exact, est),
    });
  }
  return { formulaExact: analytic.method?.exact ?? true, measures, allInside: measures.every((m) => m.inside) };
}
