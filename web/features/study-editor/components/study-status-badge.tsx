import type { StudyDetail } from '#shared/schemas/studies';
import { StatusBadge, type StatusTone } from '../../../components/ui/status-badge';

const LOOK: Record<StudyDetail['status'], { tone: StatusTone; label: string }> = {
  draft: { tone: 'quiet', label: 'Draft' },
  in_review: { tone: 'accent', label: 'In review' },
  changes_requested: { tone: 'warn', label: 'Changes requested' },
  approved: { tone: 'ok', label: 'Approved' },
  released: { tone: 'ok', label: 'Released' },
};

export function StudyStatusBadge({ status }: { status: StudyDetail['status'] }) {
  return <StatusBadge tone={LOOK[status].tone}>{LOOK[status].label}</StatusBadge>;
}
