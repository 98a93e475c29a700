import { desc, eq } from 'drizzle-orm';
import type { StudyBlockResult } from '../../../shared/schemas/model-block';
import type { StudyDetail, StudySummary } from '../../../shared/schemas/studies';
import type { AppContext } from '../../context';
import { studies } from '../../db/schema/index';
import type { EngagementRow } from '../engagements/engagement-access';
import { readStudyBlockResults } from './block-rows';
import { author, editor, type LoadedStudy, type StudyHead } from './study-access';

const summaryQuery = (ctx: Pick<AppContext, 'db'>) =>
  ctx.db
    .select({ s: studies, authorName: author.name, updatedByName: editor.name })
    .from(studies)
    .leftJoin(author, eq(author.id, studies.createdBy))
    .leftJoin(editor, eq(editor.id, studies.updatedBy));

const toSummary = ({ s, authorName, updatedByName }: { s: StudyHead; authorName: string | null; updatedByName: string | null }): StudySummary => ({
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

export const studySummary = (l: LoadedStudy<StudyHead>): StudySummary => toSummary({ s: l.study, authorName: l.authorName, updatedByName: l.updatedByName });

/**
 * A study with its document and the server's results per block, after a change (the read of an
 * unchanged study is study-read.ts). `blocks` may be passed when the caller has just computed them.
 */
export async function describeStudy(ctx: Pick<AppContext, 'db'>, studyId: number, engagement: EngagementRow, blocks?: StudyBlockResult[]): Promise<StudyDetail> {
  const [row] = await summaryQuery(ctx).where(eq(studies.id, studyId));
  const results = blocks ?? (await readStudyBlockResults(ctx.db, studyId));
  return {
    ...toSummary(row!),
    document: row!.s.document as StudyDetail['document'],
    blocks: Object.fromEntries(results.map((b) => [b.blockId, b])),
    safetyCritical: engagement.safetyCritical,
    engagementName: engagement.name,
  };
}
