import { and, eq, inArray, sql } from 'drizzle-orm';
import { DRAFT_STUDY_STATUSES } from '../../../shared/schemas/studies';
import type { Db } from '../../db/client';
import { assumptions, studies, studyBlockAssumptions, studyBlocks } from '../../db/schema/index';
import type { Tx } from '../studies/block-rows';

/**
 * Blocks linking the assumption of the row being selected, counted over draft studies only: a
 * column of the register's own query (by the assumption index), not a second query.
 */
export const usageCount = sql<number>`(select count(*) from ${studyBlockAssumptions} inner join ${studies} on ${studies.id} = ${studyBlockAssumptions.studyId} where ${studyBlockAssumptions.assumptionId} = ${assumptions.id} and ${inArray(studies.status, [...DRAFT_STUDY_STATUSES])})`.mapWith(Number);

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
