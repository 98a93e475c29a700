import type { StudyStatus } from '#shared/schemas/studies';
import { StatusBadge, type StatusTone } from '../../../components/ui/status-badge';
import { REVISION_STATUS_WORDS } from '../../revisions/components/revision-status-badge';

/**
 * Where a study's latest revision stands. One set of words for the list, the editor and the
 * reader, the same as the revisions' own, so a state is never called two things.
 */
export const STUDY_STATUS_WORDS: Record<StudyStatus, string> = { draft: 'Draft', ...REVISION_STATUS_WORDS };

const TONES: Record<StudyStatus, StatusTone> = { draft: 'quiet', in_review: 'accent', changes_requested: 'warn', approved: 'ok', released: 'ok' };

export function StudyStatusBadge({ status }: { status: StudyStatus }) {
  return <StatusBadge tone={TONES[status]}>{STUDY_STATUS_WORDS[status]}</StatusBadge>;
}
