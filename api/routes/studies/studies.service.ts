import { desc, eq } from 'drizzle-orm';
import type { StudyBlockResult } from '../../../shared/schemas/model-block';
import type { StudyDetail, StudySummary } from '../../../shared/schemas/studies';
import type { AppContext } from '../../context';
import { studies } from '../../db/schema/index';
import type { EngagementRow } from '../engagements/engagement-access';
import { readStudyBlockResults } from './block-rows';
import { author, editor, type LoadedStudy, type StudyRow } from './study-access';

const summaryQuery = (ctx: AppContext) =>
  ctx.db
    .select({ s: studies, authorName: author.name, updatedByName: editor.name })
    .from(studies)
    .leftJoin(author, eq(author.id, studies.createdBy))
    .leftJoin(editor, eq(editor.id, studies.updatedBy));

const toSummary = ({ s, authorName, updatedByName }: { s: StudyRow; authorName: string | null; updatedByName: string | null }): StudySummary => ({
  id: s.id,
  engagementId: s.engagementId,
  title: s.title,
  status: s.status,
  templateKey: s.templateKey,
  authorName,
  updatedAt: s.updatedAt.toISOString(),
  updatedByName,
  version: s.version,
});

/** Studies of an engagement, most recently edited first. */
export async function listStudies(ctx: AppContext, engagementId: number): Promise<StudySummary[]> {
  const rows = await summaryQuery(ctx).where(eq(studies.engagementId, engagementId)).orderBy(desc(studies.updatedAt), desc(studies.id));
  return rows.map(toSummary);
}

/**
 * A study with its document and the server's results per block. `blocks` may be passed when the
 * caller has just computed them (a save), and `loaded` when the caller has just read the study
 * with loadStudyFor (a read), each saving a query.
 */
export async function describeStudy(ctx: AppContext, studyId: number, engagement: EngagementRow, blocks?: StudyBlockResult[], loaded?: LoadedStudy): Promise<StudyDetail> {
  const row = loaded ? { s: loaded.study, authorName: loaded.authorName, updatedByName: loaded.updatedByName } : (await summaryQuery(ctx).where(eq(studies.id, studyId)))[0];
  const results = blocks ?? (await readStudyBlockResults(ctx.db, studyId));
  return {
    ...toSummary(row!),
    document: row!.s.document as StudyDetail['document'],
    blocks: Object.fromEntries(results.map((b) => [b.blockId, b])),
    safetyCritical: engagement.safetyCritical,
    engagementName: engagement.name,
  };
}
