import { Link } from 'react-router-dom';
import type { RevisionSummary } from '#shared/schemas/revisions';
import { paths } from '../../../app/paths';
import { Table, Td, Th } from '../../../components/ui/table';
import { formatDate } from '../../../lib/format-date';
import { RevisionStatusBadge } from './revision-status-badge';

interface RevisionTableProps {
  revisions: RevisionSummary[];
  caption: string;
  /** The review queue names the study; a study's own list does not need to. */
  showStudy?: boolean;
  /** Picked revisions for comparing, with the way to pick; absent where comparing makes no sense. */
  picked?: readonly number[];
  onPick?: (id: number, on: boolean) => void;
}

/** Revisions with who submitted and who decided, and the reason when changes were requested. */
// Numeric headers force right alignment: the shared header's text-left outranks the .num rule.
export function RevisionTable({ revisions, caption, showStudy = false, picked, onPick }: RevisionTableProps) {
  return (
    <Table caption={caption}>
      <thead>
        <tr>
          {onPick && <Th className="w-12">Compare</Th>}
          {showStudy && <Th>Study</Th>}
          <Th num className="text-right!">Revision</Th>
          <Th>Status</Th>
          <Th>Submitted</Th>
          <Th>Decision</Th>
          <Th>
            <span className="sr-only">Open</span>
          </Th>
        </tr>
      </thead>
      <tbody>
        {revisions.map((r) => (
          <tr key={r.id}>
            {onPick && (
              <Td>
                <input
                  type="checkbox"
                  className="size-4 accent-accent"
                  checked={picked?.includes(r.id) ?? false}
                  onChange={(e) => onPick(r.id, e.target.checked)}
                  aria-label={`Compare revision ${r.number}`}
                />
              </Td>
            )}
            {showStudy && (
              <Td className="font-serif font-medium">
                {r.studyTitle}
                <span className="block font-sans text-xs text-ink-faint">{r.engagementName}</span>
              </Td>
            )}
            <Td num className="font-semibold">
              {r.number}
            </Td>
            <Td>
              <RevisionStatusBadge status={r.status} />
              {r.openThreads > 0 && <span className="mt-1 block text-xs text-ink-soft">{r.openThreads === 1 ? '1 open comment thread' : `${r.openThreads} open comment threads`}</span>}
            </Td>
            <Td className="whitespace-nowrap text-ink-soft">
              {formatDate(r.submittedAt)}
              {r.submittedByName && <span className="block text-xs text-ink-faint">by {r.submittedByName}</span>}
            </Td>
            <Td className="max-w-xs text-ink-soft">
              {r.decidedAt ? (
                <>
                  <span className="whitespace-nowrap">{formatDate(r.decidedAt)}</span>
                  {r.decidedByName && <span className="block text-xs text-ink-faint">by {r.decidedByName}</span>}
                  {r.status === 'changes_requested' && r.decisionReason && (
                    <span className="mt-1 block text-sm whitespace-pre-line text-ink">“{r.decisionReason}”</span>
                  )}
                </>
              ) : (
                <span className="text-ink-faint">Not decided yet</span>
              )}
            </Td>
            <Td className="text-right whitespace-nowrap">
              <Link to={paths.revision(r.id)} className="text-sm font-medium" aria-label={`Open revision ${r.number}${showStudy ? ` of ${r.studyTitle}` : ''}`}>
                Open
              </Link>
            </Td>
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
