import { and, eq, sql } from 'drizzle-orm';
import { alias } from 'drizzle-orm/mysql-core';
import type { SessionUser } from '../../../shared/schemas/auth';
import type { Db } from '../../db/client';
import { preparedPer } from '../../db/prepared';
import { engagements, memberships, studies, users } from '../../db/schema/index';
import { forbidden, notFound } from '../../http-error';
import { loadEngagementFor, seesEngagement, type EngagementRow } from '../engagements/engagement-access';

export type StudyRow = typeof studies.$inferSelect;
export type Access = 'read' | 'write';
/** A study as its summary shows it: the row with its author's and last editor's names. */
export interface LoadedStudy {
  study: StudyRow;
  engagement: EngagementRow;
  authorName: string | null;
  updatedByName: string | null;
}

/** The study's author and last editor, joined by name wherever a study is summarised. */
export const author = alias(users, 'author');
export const editor = alias(users, 'editor');

/**
 * Role gate for studies, assumptions and templates: clients never (they see released
 * deliverables only), admins read but do not write, partners and consultants do both. Checked
 * before any lookup so the answer does not depend on whether the id exists.
 */
export function assertStudyRole(user: SessionUser, access: Access): void {
  if (user.role === 'client') throw forbidden('Clients see released deliverables only.');
  if (access === 'write' && user.role === 'admin') throw forbidden('Administrators can read studies but not edit them.');
}

/** The engagement for study work, with the role gate and the member check (404 for non-members). */
export async function loadEngagementForStudies(db: Db, user: SessionUser, engagementId: number, access: Access): Promise<EngagementRow> {
  assertStudyRole(user, access);
  return loadEngagementFor(db, user, engagementId);
}

const studyWithAccess = preparedPer((db: Db) =>
  db
    .select({ study: studies, engagement: engagements, memberId: memberships.userId, authorName: author.name, updatedByName: editor.name })
    .from(studies)
    .innerJoin(engagements, eq(engagements.id, studies.engagementId))
    .leftJoin(memberships, and(eq(memberships.engagementId, studies.engagementId), eq(memberships.userId, sql.placeholder('userId'))))
    .leftJoin(author, eq(author.id, studies.createdBy))
    .leftJoin(editor, eq(editor.id, studies.updatedBy))
    .where(eq(studies.id, sql.placeholder('studyId')))
    .prepare(),
);

/**
 * A study and its engagement; a study of an engagement the user is not in is a 404 like a missing
 * one. One query (engagement, membership and the two names joined in): every read and save of a
 * study runs it, and a read then needs no second look at the study row.
 */
export async function loadStudyFor(db: Db, user: SessionUser, studyId: number, access: Access): Promise<LoadedStudy> {
  assertStudyRole(user, access);
  const [row] = await studyWithAccess(db).execute({ userId: user.id, studyId });
  if (!row || !seesEngagement(user, row.memberId)) throw notFound('That study');
  return { study: row.study, engagement: row.engagement, authorName: row.authorName, updatedByName: row.updatedByName };
}
