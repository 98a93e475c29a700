import type { RevisionStatus } from '#shared/schemas/revisions';
import { StatusBadge, type StatusTone } from '../../../components/ui/status-badge';

/** Our words for each state of a revision; the word carries the meaning, the tint only helps. */
export const REVISION_STATUS_WORDS: Record<RevisionStatus, string> = {
  in_review: 'In review',
  changes_requested: 'Changes requested',
  approved: 'Signed off',
  released: 'Released',
};

const TONES: Record<RevisionStatus, StatusTone> = {
  in_review: 'accent',
  changes_requested: 'warn',
  approved: 'ok',
  released: 'ok',
};

export function RevisionStatusBadge({ status }: { status: RevisionStatus }) {
  return <StatusBadge tone={TONES[status]}>{REVISION_STATUS_WORDS[status]}</StatusBadge>;
}
