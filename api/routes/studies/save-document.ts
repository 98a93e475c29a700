import { and, eq, sql } from 'drizzle-orm';
import type { SessionUser } from '../../../shared/schemas/auth';
import { DOCUMENT_MAX_CHARS, DRAFT_STUDY_STATUSES, type SaveDocument, type StudyDetail } from '../../../shared/schemas/studies';
import type { AppContext } from '../../context';
import { studies } from '../../db/schema/index';
import { HttpError } from '../../http-error';
import type { EngagementRow } from '../engagements/engagement-access';
import { replaceStudyBlocks, type ComputedBlock } from './block-rows';
import { computeBlock } from './compute-block';
import { sanitiseDocument, type DocumentBlock } from './document-sanitiser';
import { loadRegister, lockedEntries } from './register';
import type { Register } from './resolve-spec';
import { describeStudy } from './studies.service';
import type { StudyRow } from './study-access';

/** The one 409 body of a stale save: the web client reloads or merges from `N`. */
export const staleVersion = (current: number): HttpError =>
  new HttpError(409, 'conflict', 'Someone saved this study meanwhile. Reload it to see their changes.', [
    { path: 'baseVersion', message: `The study is now at version ${current}` },
  ]);

/**
 * The document's size as stored (JSON characters). A body nested thousands of levels deep parses
 * but overflows the stack when serialised again: that is the client's error (400), not a 500.
 */
function documentChars(document: unknown): number {
  try {
    return JSON.stringify(document).length;
  } catch (err) {
    if (!(err instanceof RangeError)) throw err;
    throw new HttpError(400, 'validation_failed', 'document: is nested too deeply to be a study', [{ path: 'document', message: 'is nested too deeply to be a study' }]);
  }
}

export function assertDraft(study: StudyRow): void {
  if (!(DRAFT_STUDY_STATUSES as readonly string[]).includes(study.status)) {
    throw new HttpError(409, 'conflict', `This study is ${study.status.replace('_', ' ')} and can no longer be edited.`, [{ path: 'status', message: study.status }]);
  }
}

export const computeAll = (blocks: DocumentBlock[], register: Register, at = new Date()): ComputedBlock[] =>
  blocks.map((b) => ({ position: b.position, config: b.config, result: computeBlock(b.blockId, b.config, register, at) }));

/** True when any linked assumption differs from what the computation used. */
function changedSince(computed: ComputedBlock[], used: Register, now: Register): boolean {
  return computed.some((b) => b.result.assumptionIds.some((id) => used.get(id)?.version !== now.get(id)?.version));
}

/**
 * Saves a study's document: sanitise, resolve links, recompute every block (all before the
 * transaction: pure and fast), then in one transaction bump the version only if it is still
 * `baseVersion` (otherwise 409 and nothing is written) and replace the blocks and their links.
 */
export async function saveStudyDocument(ctx: AppContext, study: StudyRow, engagement: EngagementRow, input: SaveDocument, by: SessionUser): Promise<StudyDetail> {
  assertDraft(study);
  if (documentChars(input.document) > DOCUMENT_MAX_CHARS) {
    throw new HttpError(413, 'payload_too_large', `A study document is limited to ${DOCUMENT_MAX_CHARS.toLocaleString('en')} characters.`);
  }
  const clean = sanitiseDocument(input.document);
  const register = await loadRegister(ctx.db, engagement.id);
  let computed = computeAll(clean.blocks, register);

  await ctx.db.transaction(async (tx) => {
    // Assumptions before the study row, the same order an assumption edit takes its locks in.
    const linked = [...new Set(computed.flatMap((b) => b.result.assumptionIds))];
    const fresh = await lockedEntries(tx, engagement.id, linked);
    const [res] = await tx
      .update(studies)
      .set({ document: clean.document, ...(input.title ? { title: input.title } : {}), version: sql`${studies.version} + 1`, updatedBy: by.id, updatedAt: new Date() })
      .where(and(eq(studies.id, study.id), eq(studies.version, input.baseVersion)));
    if (res.affectedRows !== 1) {
      const [now] = await tx.select({ version: studies.version }).from(studies).where(eq(studies.id, study.id));
      throw staleVersion(now?.version ?? input.baseVersion);
    }
    if (changedSince(computed, register, fresh)) computed = computeAll(clean.blocks, await loadRegister(tx, engagement.id));
    await replaceStudyBlocks(tx, study.id, computed);
  });
  return describeStudy(ctx, study.id, engagement, computed.map((b) => b.result));
}
