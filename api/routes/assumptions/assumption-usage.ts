import { and, count, eq, inArray, sql } from 'drizzle-orm';
import { DRAFT_STUDY_STATUSES } from '../../../shared/schemas/studies';
import type { Db } from '../../db/client';
import { preparedPer } from '../../db/prepared';
import { studies, studyBlockAssumptions, studyBlocks } from '../../db/schema/index';
import type { Tx } from '../studies/block-rows';

/** Blocks linking each assumption of an engagement, counted over draft studies only. */
const usageOf = preparedPer((db: Db) =>
  db
    .select({ id: studyBlockAssumptions.assumptionId, n: count() })
    .from(studyBlockAssumptions)
    .innerJoin(studies, eq(studies.id, studyBlockAssumptions.studyId))
    .where(and(eq(studies.engagementId, sql.placeholder('engagementId')), inArray(studies.status, [...DRAFT_STUDY_STATUSES])))
    .groupBy(studyBlockAssumptions.assumptionId)
    .prepare(),
);

export async function usageCounts(db: Db, engagementId: number): Promise<Map<number, number>> {
  const rows = await usageOf(db).execute({ engagementId });
  return new Map(rows.map((r) => [r.id, Number(r.n)]));
}

export interface BlockUse {
  studyId: number;
  studyTitle: string;
  studyStatus: string;
  blockId: string;
  blockTitle: string;
}

/** Every block (in any study) that links the assumption, in study and document order. */
export async function blocksUsing(db: Db | Tx, assumptionId: number): Promise<BlockUse[]> {
  const rows = await db
    .select({
      studyId: studies.id,
      studyTitle: studies.title,
      studyStatus: studies.status,
      blockId: studyBlocks.blockId,
      title: studyBlocks.title,
      config: studyBlocks.config,
    })
    .from(studyBlockAssumptions)
    .innerJoin(studyBlocks, and(eq(studyBlocks.studyId, studyBlockAssumptions.studyId), eq(studyBlocks.blockId, studyBlockAssumptions.blockId)))
    .innerJoin(studies, eq(studies.id, studyBlockAssumptions.studyId))
    .where(eq(studyBlockAssumptions.assumptionId, assumptionId))
    .orderBy(studies.title, studies.id, studyBlocks.position);
  return rows.map((r) => ({ studyId: r.studyId, studyTitle: r.studyTitle, studyStatus: r.studyStatus, blockId: r.blockId, blockTitle: blockTitle(r.title, r.config) }));
}

/** A block's title, or its model when it has none, so a list of uses is never a list of blanks. */
export function blockTitle(title: string, config: Record<string, unknown>): string {
  if (title) return title;
  const model = (config.spec as { model?: unknown } | undefined)?.model;
  return typeof model === 'string' ? `Untitled ${model} block` : 'Untitled model block';
}
