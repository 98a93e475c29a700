import { Link } from 'react-router-dom';
import type { Deliverable } from '#shared/schemas/revisions';
import { paths } from '../../../app/paths';
import { Button } from '../../../components/ui/button';
import { Table, Td, Th } from '../../../components/ui/table';
import { formatDate } from '../../../lib/format-date';
import { useDownloadPdf } from '../api/use-download-pdf';

const kib = new Intl.NumberFormat('en-GB', { maximumFractionDigits: 0 });

interface DeliverableTableProps {
  deliverables: Deliverable[];
  caption: string;
  showEngagement?: boolean;
}

/** Released, signed reports: which study and revision, when released, who signed off; download each. */
// Numeric headers force right alignment: the shared header's text-left outranks the .num rule.
export function DeliverableTable({ deliverables, caption, showEngagement = false }: DeliverableTableProps) {
  const download = useDownloadPdf();
  const sorted = [...deliverables].sort((a, b) => b.releasedAt.localeCompare(a.releasedAt));
  return (
    <div className="flex flex-col gap-3">
      {download.isError && (
        <p role="alert" className="rounded-md border border-danger/40 bg-danger-tint px-4 py-3 text-sm text-danger">
          The download link could not be made: {download.error.message}
        </p>
      )}
      <Table caption={caption}>
        <thead>
          <tr>
            <Th>Study</Th>
            <Th num className="text-right!">Revision</Th>
            <Th>Released</Th>
            <Th>Signed off by</Th>
            <Th num className="text-right!">Size, KiB</Th>
            <Th>
              <span className="sr-only">Download</span>
            </Th>
          </tr>
        </thead>
        <tbody>
          {sorted.map((d) => (
            <tr key={d.revisionId}>
              <Td className="font-serif font-medium">
                {d.studyTitle}
                {showEngagement && <span className="block font-sans text-xs font-normal text-ink-faint">{d.engagementName}</span>}
              </Td>
              <Td num>{d.number}</Td>
              <Td className="whitespace-nowrap">{formatDate(d.releasedAt)}</Td>
              <Td>
                {d.approverName ?? '—'}
                {d.approvedAt && <span className="block text-xs text-ink-faint">{formatDate(d.approvedAt)}</span>}
              </Td>
              <Td num className="text-ink-soft">
                {kib.format(d.fileSize / 1024)}
              </Td>
              <Td className="text-right whitespace-nowrap">
                <Button
                  size="sm"
                  variant="primary"
                  busy={download.isPending && download.variables === d.revisionId}
                  onClick={() => download.mutate(d.revisionId)}
                  aria-label={`Download PDF of ${d.studyTitle}, revision ${d.number}`}
                >
                  Download PDF
                </Button>
              </Td>
            </tr>
          ))}
        </tbody>
      </Table>
      <p className="text-sm text-ink-soft">
        Received a copy by other means? <Link to={paths.verify}>Verify a copy</Link> to check it is unmodified and signed by the firm.
      </p>
    </div>
  );
}
