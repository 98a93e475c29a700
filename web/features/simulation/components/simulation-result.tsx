import type { SimulationComparison } from '#shared/queue/sim/from-spec-comparison';
import type { SimulationJob } from '#shared/queue/sim/from-spec-job';
import { Banner } from '../../../components/ui/banner';
import { SimulationComparisonTable } from './simulation-comparison-table';

const count = new Intl.NumberFormat('en-GB');

interface SimulationResultProps {
  result: NonNullable<SimulationJob['result']>;
  comparison: SimulationComparison;
  /** Focused when the run finishes, so keyboard and screen-reader users land on the outcome. */
  headingId: string;
}

function summary(c: SimulationComparison): string {
  const n = c.measures.length;
  if (n === 0) return 'This model reports no measure the simulation estimates, so there is nothing to compare.';
  const outside = c.measures.filter((m) => !m.inside).length;
  if (outside === 0) return n === 1 ? 'The formula value lies inside its interval.' : `All ${n} formula values lie inside their intervals.`;
  return `${outside} of ${n} formula values lie outside their intervals.`;
}

/** The finished check: one sentence of outcome, what was simulated, the simulator's cautions, the table. */
export function SimulationResult({ result, comparison, headingId }: SimulationResultProps) {
  const missed = comparison.measures.some((m) => !m.inside);
  return (
    <div className="space-y-3">
      <h4 id={headingId} tabIndex={-1} className="font-semibold text-ink focus:outline-none">
        {summary(comparison)}
      </h4>
      <p className="text-sm text-ink-soft">
        Simulated {count.format(result.customers)} customers of {result.model} in {result.estimates.wq.samples} independent replications (seed{' '}
        {result.seed}).
        {missed &&
          (comparison.formulaExact
            ? ' A 95 % interval misses a correct value about one time in twenty, so run again with a new seed before drawing conclusions from a single miss.'
            : ' The formula for this model is an approximation: a miss shows how far it is from the simulated queue.')}
      </p>
      {result.warnings.length > 0 && (
        <Banner tone="warn" title="Read these figures with care">
          <ul className="list-disc pl-5">
            {result.warnings.map((w) => (
              <li key={w.code}>{w.message}</li>
            ))}
          </ul>
        </Banner>
      )}
      {comparison.measures.length > 0 && <SimulationComparisonTable comparison={comparison} />}
    </div>
  );
}
