import type { StudyStatus } from '#shared/schemas/studies';
import { StatusBadge, type StatusTone } from '../../../components/ui/status-badge';

const LOOK: Record<StudyStatus, { label: string; tone: StatusTone }> = {
  draft: { label: 'Draft', tone: 'quiet' },
  in_review: { label: 'With the partner', tone: 'accent' },
  changes_requested: { label: 'Changes asked for', tone: 'warn' },
  approved: { label: 'Signed off', tone: 'ok' },
  released: { label: 'Released to client', tone: 'ok' },
};

/** Where a study stands in its review, in words a consultant uses. */
export function StudyStatusBadge({ status }: { status: StudyStatus }) {
  const { label, tone } = LOOK[status];
  return <StatusBadge tone={tone}>{label}</StatusBadge>;
}
