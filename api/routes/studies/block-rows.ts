import { createHash } from 'node:crypto';
import { and, eq, inArray, sql } from 'drizzle-orm';
import type { BlockConfig, StudyBlockResult } from '../../../shared/schemas/model-block';
import type { Db } from '../../db/client';
import { preparedPer } from '../../db/prepared';
import { studyBlockAssumptions, studyBlocks } from '../../db/schema/index';

export type StudyBlockRow = typeof studyBlocks.$inferSelect;
/** A transaction or the pool: both run the same queries. */
export type Tx = Parameters<Parameters<Db['transaction']>[0]>[0] | Db;

export interface ComputedBlock {
  position: number;
  config: BlockConfig;
  result: StudyBlockResult;
}

/** Chunked so a study with hundreds of charted blocks stays far below max_allowed_packet. */
const CHUNK = 50;

export function toBlockRow(studyId: number, b: ComputedBlock): typeof studyBlocks.$inferInsert {
  const r = b.result;
  const stored = [b.position, b.config, r.resolvedSpec, r.result, r.error, r.scenarios, r.chart, r.assumptionIds, r.engineVersion];
  return {
    contentHash: createHash('sha256').update(JSON.stringify(stored)).digest('hex'),
    studyId,
    blockId: r.blockId,
    position: b.position,
    title: b.config.title,
    config: b.config as unknown as Record<string, unknown>,
    resolvedSpec: r.resolvedSpec,
    result: r.result,
    error: r.error,
    scenarios: r.scenarios,
    chart: r.chart,
    engineVersion: r.engineVersion,
    computedAt: new Date(r.computedAt),
  };
}

type ResultColumns = Pick<StudyBlockRow, 'blockId' | 'resolvedSpec' | 'result' | 'error' | 'scenarios' | 'chart' | 'engineVersion' | 'computedAt'>;

export function fromBlockRow(row: ResultColumns, assumptionIds: number[]): StudyBlockResult {
  return {
    blockId: row.blockId,
    status: row.error ? 'error' : 'ok',
    resolvedSpec: row.resolvedSpec ?? null,
    result: row.result ?? null,
    error: (row.error as StudyBlockResult['error']) ?? null,
    scenarios: row.scenarios as StudyBlockResult['scenarios'],
    chart: (row.chart as StudyBlockResult['chart']) ?? null,
    assumptionIds,
    engineVersion: row.engineVersion,
    computedAt: row.computedAt.toISOString(),
  };
}

const UPSERT = Object.fromEntries(
  (['position', 'title', 'config', 'resolvedSpec', 'result', 'error', 'scenarios', 'chart', 'engineVersion', 'contentHash', 'computedAt'] as const).map((k) => [
    k,
    sql.raw(`values(\`${studyBlocks[k].name}\`)`),
  ]),
);

/**
 * Makes the stored blocks of a study those given: blocks gone from the document are deleted (their
 * links cascade), and only blocks whose stored computation changed (by content hash) are written
 * with their links. A save that edits text rewrites no block at all.
 */
export async function replaceStudyBlocks(tx: Tx, studyId: number, blocks: ComputedBlock[]): Promise<void> {
  const existing = new Map(
    (await tx.select({ blockId: studyBlocks.blockId, hash: studyBlocks.contentHash }).from(studyBlocks).where(eq(studyBlocks.studyId, studyId))).map((r) => [r.blockId, r.hash]),
  );
  const keep = new Set(blocks.map((b) => b.result.blockId));
  const gone = [...existing.keys()].filter((id) => !keep.has(id));
  for (let i = 0; i < gone.length; i += CHUNK * 4) {
    await tx.delete(studyBlocks).where(and(eq(studyBlocks.studyId, studyId), inArray(studyBlocks.blockId, gone.slice(i, i + CHUNK * 4))));
  }
  const changed = blocks.map((b) => toBlockRow(studyId, b)).filter((row) => existing.get(row.blockId) !== row.contentHash);
  for (let i = 0; i < changed.length; i += CHUNK) {
    await tx.insert(studyBlocks).values(changed.slice(i, i + CHUNK)).onDuplicateKeyUpdate({ set: UPSERT });
  }
  const changedIds = changed.map((r) => r.blockId);
  const rewritten = changedIds.filter((id) => existing.has(id));
  for (let i = 0; i < rewritten.length; i += CHUNK * 4) {
    await tx.delete(studyBlockAssumptions).where(and(eq(studyBlockAssumptions.studyId, studyId), inArray(studyBlockAssumptions.blockId, rewritten.slice(i, i + CHUNK * 4))));
  }
  const ids = new Set(changedIds);
  const links = blocks
    .filter((b) => ids.has(b.result.blockId))
    .flatMap((b) => b.result.assumptionIds.map((assumptionId) => ({ studyId, blockId: b.result.blockId, assumptionId })));
  for (let i = 0; i < links.length; i += CHUNK * 4) await tx.insert(studyBlockAssumptions).values(links.slice(i, i + CHUNK * 4));
}

/**
 * Every block of a study with its links, keyed by blockId, in document order. The links come in
 * the same query (a GROUP_CONCAT per block): reading a study is the API's most frequent request.
 */
const blocksWithLinks = preparedPer((db: Tx) =>
  db
    .select({
      row: studyBlocks,
      links: linksOfBlock,
    })
    .from(studyBlocks)
    .where(eq(studyBlocks.studyId, sql.placeholder('studyId')))
    .orderBy(studyBlocks.position)
    .prepare(),
);

const linkIds = (links: string | null): number[] => (links ? links.split(',').map(Number).sort((a, b) => a - b) : []);
const linksOfBlock = sql<string | null>`(select group_concat(l.assumption_id) from ${studyBlockAssumptions} l where l.study_id = ${studyBlocks}.study_id and l.block_id = ${studyBlocks}.block_id)`;

/** Only what a reader needs (no block config, title or hash): fewer JSON columns to decode. */
const blockResults = preparedPer((db: Tx) =>
  db
    .select({
      blockId: studyBlocks.blockId,
      resolvedSpec: studyBlocks.resolvedSpec,
      result: studyBlocks.result,
      error: studyBlocks.error,
      scenarios: studyBlocks.scenarios,
      chart: studyBlocks.chart,
      engineVersion: studyBlocks.engineVersion,
      computedAt: studyBlocks.computedAt,
      links: linksOfBlock,
    })
    .from(studyBlocks)
    .where(eq(studyBlocks.studyId, sql.placeholder('studyId')))
    .orderBy(studyBlocks.position)
    .prepare(),
);

/** The stored results of every block of a study, in document order. */
export async function readStudyBlockResults(db: Tx, studyId: number): Promise<StudyBlockResult[]> {
  return (await blockResults(db).execute({ studyId })).map((row) => fromBlockRow(row, linkIds(row.links)));
}

export async function readStudyBlocks(db: Tx, studyId: number): Promise<Map<string, { row: StudyBlockRow; result: StudyBlockResult }>> {
  const rows = await blocksWithLinks(db).execute({ studyId });
  return new Map(rows.map(({ row, links }) => [row.blockId, { row, result: fromBlockRow(row, linkIds(links)) }]));
}
