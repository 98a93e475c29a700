import { and, eq } from 'drizzle-orm';
import type { SessionUser } from '../../../shared/schemas/auth';
import type { CreateStudy, StudyDetail } from '../../../shared/schemas/studies';
import type { AppContext } from '../../context';
import { assumptions, studies } from '../../db/schema/index';
import { HttpError } from '../../http-error';
import { recordAudit } from '../audit/audit.service';
import type { EngagementRow } from '../engagements/engagement-access';
import { replaceStudyBlocks, type Tx } from './block-rows';
import { sanitiseDocument } from './document-sanitiser';
import { loadRegister } from './register';
import { computeAll } from './save-document';
import { describeStudy } from './studies.service';
import { rewriteTemplateLinks } from './template-links';
import { loadStudyTemplates, type ParsedTemplate } from './template-registry';

const BLANK = { type: 'doc', content: [{ type: 'paragraph' }] };

/** The template's assumptions in the engagement: an existing one of the same name is reused. */
async function ensureAssumptions(tx: Tx, engagementId: number, template: ParsedTemplate, by: SessionUser): Promise<{ idByKey: Map<string, number>; created: string[] }> {
  const idByKey = new Map<string, number>();
  const created: string[] = [];
  for (const a of template.assumptions) {
    const [existing] = await tx.select({ id: assumptions.id }).from(assumptions).where(and(eq(assumptions.engagementId, engagementId), eq(assumptions.name, a.name)));
    if (existing) {
      idByKey.set(a.key, existing.id);
      continue;
    }
    const now = new Date();
    const [res] = await tx.insert(assumptions).values({
      engagementId,
      name: a.name,
      value: a.value,
      unit: a.unit,
      sourceKind: a.sourceKind,
      sourceDetail: a.sourceDetail.slice(0, 500),
      notes: a.notes.slice(0, 500),
      ownerId: by.id,
      createdAt: now,
      updatedAt: now,
    });
    idByKey.set(a.key, res.insertId);
    created.push(a.name);
  }
  return { idByKey, created };
}

/**
 * Creates a study, blank or from a template. From a template, its assumptions join the
 * engagement's register (reusing same-named ones), its links are rewritten to their ids, and the
 * document goes through the same sanitising and recompute as any save, in one transaction.
 */
export async function createStudy(
  ctx: Pick<AppContext, 'db'>,
  engagement: EngagementRow,
  input: CreateStudy,
  by: SessionUser,
  ip?: string,
  templates: Promise<ParsedTemplate[]> = loadStudyTemplates(),
): Promise<StudyDetail> {
  const template = input.templateKey === null ? null : (await templates).find((t) => t.key === input.templateKey);
  if (template === undefined) throw new HttpError(400, 'validation_failed', 'There is no template with that key.', [{ path: 'templateKey', message: 'Unknown template' }]);

  const { studyId, created } = await ctx.db.transaction(async (tx) => {
    const { idByKey, created } = template ? await ensureAssumptions(tx, engagement.id, template, by) : { idByKey: new Map<string, number>(), created: [] };
    const clean = sanitiseDocument(template ? rewriteTemplateLinks(template.document, idByKey) : BLANK);
    const computed = computeAll(clean.blocks, await loadRegister(tx, engagement.id));
    const now = new Date();
    const [res] = await tx.insert(studies).values({
      engagementId: engagement.id,
      title: input.title,
      templateKey: template?.key ?? null,
      document: clean.document,
      createdBy: by.id,
      updatedBy: by.id,
      createdAt: now,
      updatedAt: now,
    });
    await replaceStudyBlocks(tx, res.insertId, computed);
    return { studyId: res.insertId, created };
  });
  await recordAudit(ctx.db, {
    action: 'study_created',
    actor: by,
    engagementId: engagement.id,
    subject: input.title,
    detail: { studyId, templateKey: template?.key ?? null, assumptionsCreated: created },
    ip,
  });
  return describeStudy(ctx, studyId, engagement);
}
