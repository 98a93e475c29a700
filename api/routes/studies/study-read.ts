import { eq, sql } from 'drizzle-orm';
import { LRUCache } from 'lru-cache';
import type { SessionUser } from '../../../shared/schemas/auth';
import type { AppContext } from '../../context';
import type { Db } from '../../db/client';
import { preparedPer } from '../../db/prepared';
import { studies } from '../../db/schema/index';
import { readStudyBlockResults, type Tx } from './block-rows';
import { studySummary } from './studies.service';
import { loadStudyHeadFor, type StudyHead } from './study-access';

/**
 * Opening a study is the most frequent large answer of the API: its document and every block's
 * stored results, tens of kilobytes that the server would otherwise read, decode and encode again
 * on each request. They change only with the study's `version` (a save) or `resultsVersion` (an
 * assumption edit recomputing its blocks), so their JSON text is kept per process under those two
 * numbers. The head (status, names, access and the two numbers) is read on every request.
 * Bounded by characters kept; a study's document is at most a few MB.
 */
const CACHE_CHARS = 64 * 1024 * 1024;
const cacheOf = preparedPer((_db: Db) => new LRUCache<string, string>({ maxSize: CACHE_CHARS, sizeCalculation: (text) => Math.max(1, text.length) }));

const stateKey = (s: StudyHead): string => `${s.id}:${s.version}:${s.resultsVersion}`;

/** `"document":…,"blocks":…` of the study as stored in the reader's snapshot. */
async function readBody(tx: Tx, studyId: number): Promise<string> {
  // The document column holds JSON text as the save wrote it: passed through as text (mysql2
  // would decode a JSON column), not decoded and encoded again.
  const [row] = await tx.select({ document: sql<string>`cast(${studies.document} as char)` }).from(studies).where(eq(studies.id, studyId));
  const blocks = await readStudyBlockResults(tx, studyId);
  return `"document":${row!.document},"blocks":${JSON.stringify(Object.fromEntries(blocks.map((b) => [b.blockId, b])))}`;
}

/**
 * The JSON text of `{ study: StudyDetail }` for GET /api/studies/:id. On a miss the head is read
 * again with the body in one snapshot, so an answer never pairs one version's number with another
 * version's text even when a save lands meanwhile.
 */
export async function readStudyJson(ctx: AppContext, user: SessionUser, studyId: number): Promise<string> {
  const cache = cacheOf(ctx.db);
  let loaded = await loadStudyHeadFor(ctx.db, user, studyId);
  let body = cache.get(stateKey(loaded.study));
  if (body === undefined) {
    [loaded, body] = await ctx.db.transaction(
      async (tx) => {
        const head = await loadStudyHeadFor(tx, user, studyId);
        return [head, await readBody(tx, studyId)] as const;
      },
      { isolationLevel: 'repeatable read', withConsistentSnapshot: true },
    );
    cache.set(stateKey(loaded.study), body);
  }
  const head = JSON.stringify({ ...studySummary(loaded), safetyCritical: loaded.engagement.safetyCritical, engagementName: loaded.engagement.name });
  return `{"study":${head.slice(0, -1)},${body}}}`;
}
