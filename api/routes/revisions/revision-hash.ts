import { createHash } from 'node:crypto';
import { canonicalJson } from '../../../shared/canonical-json';
import type { RevisionSnapshot } from '../../../shared/schemas/revisions';

/** SHA-256 (hex) of the canonical JSON of a snapshot: the revision's identity, printed on the sign-off page. */
export function revisionSha256(snapshot: RevisionSnapshot): string {
  return createHash('sha256').update(canonicalJson(snapshot), 'utf8').digest('hex');
}
