import type { MovedNumber } from '#shared/schemas/revisions';
import { Table, Td, Th } from '../../../components/ui/table';

const number = new Intl.NumberFormat('en-GB', { maximumSignificantDigits: 6 });
const percent = new Intl.NumberFormat('en-GB', { style: 'percent', maximumFractionDigits: 1, signDisplay: 'exceptZero' });
const signed = new Intl.NumberFormat('en-GB', { maximumSignificantDigits: 6, signDisplay: 'exceptZero' });

const show = (n: number | null, f: Intl.NumberFormat = number) => (n === null ? '—' : f.format(n));

/** Every model output that moved between the two revisions: block, measure, before, after, change. */
// Numeric headers force right alignment: the shared header's text-left outranks the .num rule.
export function MovedNumbersTable({ rows, caption }: { rows: MovedNumber[]; caption: string }) {
  return (
    <Table caption={caption}>
      <thead>
        <tr>
          <Th>Model block</Th>
          <Th>Measure</Th>
          <Th num className="text-right!">Before</Th>
          <Th num className="text-right!">After</Th>
          <Th num className="text-right!">Change</Th>
          <Th num className="text-right!">Relative</Th>
        </tr>
      </thead>
      <tbody>
        {rows.map((m) => (
          <tr key={`${m.blockId}-${m.measure}`}>
            <Td className="font-serif">{m.blockTitle}</Td>
            <th scope="row" className="border-b border-rule px-4 py-3 text-left align-top font-normal">
              {m.measure}
            </th>
            <Td num>{show(m.before)}</Td>
            <Td num>{show(m.after)}</Td>
            <Td num className="font-semibold">
              {show(m.change, signed)}
            </Td>
            <Td num className="text-ink-soft">
              {show(m.relativeChange, percent)}
            </Td>
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
