import type { TimeUnit } from '#shared/units/units';
import { ScrollRegion } from '../components/ui/scroll-region';
import { alignDecimals } from './decimal-align';
import { formatMeasureRow } from './format-measure';

interface Interval {
  index: number;
  arrivalRate: number;
  servers: number;
  achieved: number;
  rho: number;
}

/** Interval-by-interval staffing: one row per interval, servers and what they achieve. */
export function IntervalTable({ intervals, timeUnit, criterion }: { intervals: readonly Interval[]; timeUnit: TimeUnit; criterion: unknown }) {
  const rates = formatMeasureRow('arrivalRate', 'rate', intervals.map((i) => i.arrivalRate), timeUnit);
  const achieved = formatMeasureRow('achieved', criterion === 'meanWait' ? 'duration' : 'probability', intervals.map((i) => i.achieved), timeUnit);
  const rho = formatMeasureRow('rho', 'ratio', intervals.map((i) => i.rho), timeUnit);
  const cols = [alignDecimals(rates.texts), alignDecimals(achieved.texts), alignDecimals(rho.texts)];
  return (
    <ScrollRegion label="Servers per interval" className="mt-4 overflow-x-auto">
      <table className="results-table w-full border-collapse font-sans text-sm">
        <caption className="pb-1 text-left text-xs font-semibold text-ink-soft">Servers per interval</caption>
        <thead>
          <tr className="border-b border-rule-strong text-xs text-ink-soft">
            <th scope="col" className="num py-2 pr-4 font-semibold">Interval</th>
            <th scope="col" className="num py-2 pr-4 font-semibold">Arrivals ({rates.unit})</th>
            <th scope="col" className="num py-2 pr-4 font-semibold">Servers</th>
            <th scope="col" className="num py-2 pr-4 font-semibold">Achieved ({achieved.unit})</th>
            <th scope="col" className="num py-2 font-semibold">Utilisation (%)</th>
          </tr>
        </thead>
        <tbody>
          {intervals.map((iv, r) => (
            <tr key={iv.index} className="border-b border-rule last:border-b-0">
              <th scope="row" className="num py-1 pr-4 font-normal">{iv.index + 1}</th>
              <td className="num py-1 pr-4 whitespace-pre">{cols[0][r]}</td>
              <td className="num py-1 pr-4">{iv.servers}</td>
              <td className="num py-1 pr-4 whitespace-pre">{cols[1][r]}</td>
              <td className="num py-1 whitespace-pre">{cols[2][r]}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollRegion>
  );
}
