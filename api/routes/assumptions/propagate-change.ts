import { and, eq, inArray, sql } from 'drizzle-orm';
import type { MovedNumber } from '../../../shared/schemas/assumptions';
import type { BlockConfig } from '../../../shared/schemas/model-block';
import { DRAFT_STUDY_STATUSES } from '../../../shared/schemas/studies';
import { studies, studyBlockAssumptions, studyBlocks } from '../../db/schema/index';
import { readStudyBlocks, toBlockRow, type Tx } from '../studies/block-rows';
import { computeBlock } from '../studies/compute-block';
import { movedMeasures } from '../studies/moved-numbers';
import { loadRegister } from '../studies/register';
import { blockTitle } from './assumption-usage';

/**
 * Recomputes every block that links `assumptionId` in the draft studies of the engagement, inside
 * the transaction that changed the assumption, and lists each number that moved. Study versions
 * are not bumped (the documents did not change, and an open editor's next save must not be
 * refused for it); their results versions are, so no cached read serves the old numbers.
 */
export async function propagateChange(tx: Tx, engagementId: number, assumptionId: number): Promise<MovedNumber[]> {
  const uses = await tx
    .selectDistinct({ studyId: studies.id, title: studies.title })
    .from(studyBlockAssumptions)
    .innerJoin(studies, eq(studies.id, studyBlockAssumptions.studyId))
    .where(and(eq(studyBlockAssumptions.assumptionId, assumptionId), eq(studies.engagementId, engagementId), inArray(studies.status, [...DRAFT_STUDY_STATUSES])))
    .orderBy(studies.title, studies.id);
  if (uses.length === 0) return [];
  const register = await loadRegister(tx, engagementId);
  const moved: MovedNumber[] = [];
  const at = new Date();
  for (const s of uses) {
    // Locks the study row. The assumption row is already locked by the caller's UPDATE; a save
    // locks its assumptions before its study row, so taking the study row here cannot deadlock.
    await tx.update(studies).set({ resultsVersion: sql`${studies.resultsVersion} + 1` }).where(eq(studies.id, s.studyId));
    for (const { row, result: before } of (await readStudyBlocks(tx, s.studyId)).values()) {
      if (!before.assumptionIds.includes(assumptionId)) continue;
      const config = row.config as unknown as BlockConfig;
      const after = computeBlock(row.blockId, config, register, at);
      const { config: _c, position: _p, studyId: _s, blockId: _b, ...changes } = toBlockRow(s.studyId, { position: row.position, config, result: after });
      await tx.update(studyBlocks).set(changes).where(and(eq(studyBlocks.studyId, s.studyId), eq(studyBlocks.blockId, row.blockId)));
      for (const m of movedMeasures(before, after)) {
        moved.push({ studyId: s.studyId, studyTitle: s.title, blockId: row.blockId, blockTitle: blockTitle(row.title, row.config), ...m });
      }
    }
  }
  return moved;
}
