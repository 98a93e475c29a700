import { Link } from 'react-router-dom';
import type { StudySummary } from '#shared/schemas/studies';
import { paths } from '../../../app/paths';
import { Table, Td, Th } from '../../../components/ui/table';
import { formatDate } from '../../../lib/format-date';
import { StudyStatusBadge } from './study-status-badge';

interface StudyListProps {
  studies: StudySummary[];
  /** Writers open the editor from the title; readers (administrators) the reading view. */
  canWrite: boolean;
}

/** The engagement's studies, newest edit first, each with where to write and where to read it. */
export function StudyList({ studies, canWrite }: StudyListProps) {
  const sorted = [...studies].sort((a, b) => b.updatedAt.localeCompare(a.updatedAt));
  return (
    <Table caption="Studies of this engagement">
      <thead>
        <tr>
          <Th>Study</Th>
          <Th>Status</Th>
          <Th>Last edit</Th>
          <Th>Author</Th>
          <Th>
            <span className="sr-only">Open</span>
          </Th>
        </tr>
      </thead>
      <tbody>
        {sorted.map((s) => (
          <tr key={s.id}>
            <Td className="font-serif font-medium">
              <Link to={canWrite ? paths.study(s.id) : paths.studyReader(s.id)} className="underline-offset-4 hover:underline">
                {s.title}
              </Link>
            </Td>
            <Td>
              <StudyStatusBadge status={s.status} />
            </Td>
            <Td className="whitespace-nowrap text-ink-soft">
              {formatDate(s.updatedAt)}
              {s.updatedByName && <span className="block text-xs text-ink-faint">by {s.updatedByName}</span>}
            </Td>
            <Td className="text-ink-soft">{s.authorName ?? '—'}</Td>
            <Td className="text-right whitespace-nowrap">
              {canWrite && (
                <Link to={paths.study(s.id)} className="mr-4 text-sm font-medium" aria-label={`Write ${s.title}`}>
                  Write
                </Link>
              )}
              <Link to={paths.studyReader(s.id)} className="text-sm font-medium" aria-label={`Read ${s.title}`}>
                Read
              </Link>
            </Td>
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
