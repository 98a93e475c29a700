import type { RevisionStatus } from '../../../shared/schemas/revisions';
import { conflict, type HttpError } from '../../http-error';

const SAID: Record<RevisionStatus, string> = {
  in_review: 'in review',
  changes_requested: 'sent back for changes',
  approved: 'approved',
  released: 'released',
};

/**
 * The 409 of an illegal transition, naming where the revision is and what the move needs:
 * in review → changes requested | approved → released, and nothing else.
 */
export function illegalTransition(number: number, status: RevisionStatus, attempted: 'approve' | 'request-changes' | 'release' | 'comment'): HttpError {
  const needs: Record<typeof attempted, string> = {
    approve: 'Only a revision in review can be approved.',
    'request-changes': 'Only a revision in review can be sent back for changes.',
    release: 'Only an approved revision can be released.',
    comment: 'Approved and released revisions are closed to comments.',
  };
  const immutable = status === 'approved' || status === 'released' ? ' It can no longer be changed.' : '';
  return conflict(`Revision ${number} is ${SAID[status]}.${immutable} ${needs[attempted]}`);
}
