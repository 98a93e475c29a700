import { randomBytes } from 'node:crypto';
import { BLOCK_ID_PATTERN } from '../../../shared/schemas/studies';

/**
 * Hands out stable ids for model blocks or sections within one document: a well-formed id the
 * client generated is kept the first time it is seen; a missing, malformed or repeated one is
 * replaced, so comments, links and revision comparisons always have one target per id.
 */
export function createIdKeeper(): (candidate: unknown) => string {
  const seen = new Set<string>();
  return (candidate) => {
    let id = typeof candidate === 'string' && BLOCK_ID_PATTERN.test(candidate) && !seen.has(candidate) ? candidate : '';
    while (!id || seen.has(id)) id = randomBytes(9).toString('base64url');
    seen.add(id);
    return id;
  };
}
