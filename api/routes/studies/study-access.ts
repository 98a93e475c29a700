import { and, eq, getTableColumns, sql } from 'drizzle-orm';
import { alias } from 'drizzle-orm/mysql-core';
import type { SessionUser } from '../../../shared/schemas/auth';
import type { Db } from '../../db/client';
import type { Tx } from './block-rows';
import { preparedPer } from '../../db/prepared';
import { engagements, memberships, studies, users } from '../../db/schema/index';
import { forbidden, notFound } from '../../http-error';
import { loadEngagementFor, seesEngagement, type EngagementRow } from '../engagements/engagement-access';

export type StudyRow = typeof studies.$inferSelect;
export type Access = 'read' | 'write';
/** A study as its summary shows it: the row with its author's and last editor's names. */
export interface LoadedStudy<S = StudyRow> {
  study: S;
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

/** The study row without its document: what a cached read needs to know (study-read.ts). */
const { document: _document, ...headColumns } = getTableColumns(studies);
export type StudyHead = Omit<StudyRow, 'document'>;

/** The study (with `columns` of its row), its engagement, the user's membership and the two names. */
const withAccess = <C extends typeof headColumns | typeof studies>(db: Tx, columns: C) =>
  db
    .select({ study: columns, engagement: engagements, memberId: memberships.userId, authorName: author.name, updatedByName: editor.name })
    .from(studies)
    .innerJoin(engagements, eq(engagements.id, studies.engagementId))
    .leftJoin(memberships, and(eq(memberships.engagementId, studies.engagementId), eq(memberships.userId, sql.placeholder('userId'))))
    .leftJoin(author, eq(author.id, studies.createdBy))
    .leftJoin(editor, eq(editor.id, studies.updatedBy))
    .where(eq(studies.id, sql.placeholder('studyId')))
    .prepare();
const studyWithAccess = preparedPer((db: Tx) => withAccess(db, studies));
const headWithAccess = preparedPer((db: Tx) => withAccess(db, headColumns));

type AccessRow<S> = { study: S; engagement: EngagementRow; memberId: number | null; authorName: string | null; updatedByName: string | null };

function loaded<S>(user: SessionUser, row: AccessRow<S> | undefined): LoadedStudy<S> {
  if (!row || !seesEngagement(user, row.memberId)) throw notFound('That study');
  return { study: row.study, engagement: row.engagement, authorName: row.authorName, updatedByName: row.updatedByName };
}

/**
 * A study and its engagement; a study of an engagement the user is not in is a 404 like a missing
 * one. One query (engagement, membership and the two names joined in): every change to a study
 * starts with it.
 */
export async function loadStudyFor(db: Db, user: SessionUser, studyId: number, access: Access): Promise<LoadedStudy> {
  assertStudyRole(user, access);
  return loaded(user, (await studyWithAccess(db).execute({ userId: user.id, studyId }))[0]);
}

/** loadStudyFor without the document, for a read that may find the document in its cache. */
export async function loadStudyHeadFor(db: Tx, user: SessionUser, studyId: number): Promise<LoadedStudy<StudyHead>> {
  assertStudyRole(user, 'read');
  return loaded(user, (await headWithAccess(db).execute({ userId: user.id, studyId }))[0]);
}
