import type { SimulationComparison } from '#shared/queue/sim/from-spec-comparison';
import { Table, Td, Th } from '../../../components/ui/table';
import { intervalDecimals } from './interval-decimals';

const numberFormats = new Map<number, Intl.NumberFormat>();
function fmt(value: number, decimals: number): string {
  let f = numberFormats.get(decimals);
  if (!f) {
    f = new Intl.NumberFormat('en-GB', { minimumFractionDigits: decimals, maximumFractionDigits: decimals });
    numberFormats.set(decimals, f);
  }
  return f.format(value);
}

/**
 * Per measure: the formula's value, the simulated mean, its 95 % interval and a verdict in plain
 * words. Each row is shown to the precision its interval supports.
 */
export function SimulationComparisonTable({ comparison }: { comparison: SimulationComparison }) {
  return (
    <Table caption="Formula values against the simulation, with 95 % confidence intervals">
      <thead>
        <tr>
          <Th>Measure</Th>
          <Th num>Formula</Th>
          <Th num>Simulated mean</Th>
          <Th num>95 % interval</Th>
          <Th>Verdict</Th>
        </tr>
      </thead>
      <tbody>
        {comparison.measures.map((m) => {
          const d = intervalDecimals(m.halfWidth, m.mean);
          return (
            <tr key={m.measure}>
              <Td>{m.label}</Td>
              <Td num>{fmt(m.analytic, d)}</Td>
              <Td num>{fmt(m.mean, d)}</Td>
              <Td num>
                {fmt(m.lower, d)} to {fmt(m.upper, d)}
              </Td>
              <Td className={m.inside ? 'text-ok' : 'font-medium text-warn'}>
                {m.inside ? 'inside the interval' : 'outside — the formula may not apply here'}
              </Td>
            </tr>
          );
        })}
      </tbody>
    </Table>
  );
}
