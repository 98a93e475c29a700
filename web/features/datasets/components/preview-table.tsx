import { ScrollRegion } from '../../../components/ui/scroll-region';

/** The first rows as the server read them, with the mapped columns highlighted. */
export function PreviewTable({ header, rows, highlighted }: { header: string[]; rows: string[][]; highlighted: Set<string> }) {
  return (
    <ScrollRegion label="First rows of the file" className="max-h-80 overflow-auto rounded-md border border-rule">
      <table className="w-full text-xs">
        <caption className="sr-only">First rows of the file</caption>
        <thead className="sticky top-0 bg-paper text-left">
          <tr>
            <th className="px-2 py-1.5 font-medium text-ink-faint">Row</th>
            {header.map((h, i) => (
              <th key={i} className={`px-2 py-1.5 font-semibold whitespace-nowrap ${highlighted.has(h) ? 'bg-accent-tint text-accent-strong' : ''}`}>
                {h || <span className="text-ink-faint italic">(unnamed)</span>}
              </th>
            ))}
          </tr>
        </thead>
        <tbody className="font-mono">
          {rows.map((r, i) => (
            <tr key={i} className="border-t border-rule">
              <td className="px-2 py-1 text-ink-faint tabular-nums">{i + 2}</td>
              {header.map((h, j) => (
                <td key={j} className={`px-2 py-1 whitespace-nowrap ${highlighted.has(h) ? 'bg-accent-tint/50' : ''}`}>
                  {r[j] ?? ''}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollRegion>
  );
}
