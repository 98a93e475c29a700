import type { MovedNumber } from '#shared/schemas/assumptions';
import type { TimeUnit } from '#shared/units/units';
import { Table, Td, Th } from '../../../components/ui/table';
import { formatMoved } from '../lib/format-moved';

// "No result" is the block going into error (an unstable queue, say): the study shows why.
const ARROWS = { up: '▲ up', down: '▼ down', appeared: 'computed again', vanished: 'no result now' } as const;

/** One block's moved numbers: measure, before, after and unit, numbers right-aligned. */
export function MovedBlockTable({ title, rows, timeUnit }: { title: string; rows: MovedNumber[]; timeUnit: TimeUnit | null }) {
  return (
    <Table caption={`Numbers that moved in ${title}`}>
      <thead>
        <tr>
          <Th>Measure</Th>
          <Th num>Before</Th>
          <Th num>After</Th>
          <Th>Unit</Th>
          <Th>
            <span className="sr-only">Direction</span>
          </Th>
        </tr>
      </thead>
      <tbody>
        {rows.map((r) => {
          const line = formatMoved(r, timeUnit);
          return (
            <tr key={r.measure}>
              <Td>
                {line.scenario && <span className="mr-1 text-ink-faint">{line.scenario} ·</span>}
                {line.label}
              </Td>
              <Td num className="text-ink-soft">
                {line.before}
              </Td>
              <Td num className="font-semibold">
                {line.after}
              </Td>
              <Td className="text-ink-soft">{line.unit}</Td>
              <Td className="text-xs whitespace-nowrap text-ink-faint">{ARROWS[line.direction]}</Td>
            </tr>
          );
        })}
      </tbody>
    </Table>
  );
}
