import { and, desc, eq, getTableColumns, inArray, isNull, sql, type SQL } from 'drizzle-orm';
import { alias } from 'drizzle-orm/mysql-core';
import type { SessionUser } from '../../../shared/schemas/auth';
import type { RevisionDetail, RevisionSummary } from '../../../shared/schemas/revisions';
import type { AppContext } from '../../context';
import { engagements, releases, revisionComments, revisions, studies, users } from '../../db/schema/index';
import { notFound } from '../../http-error';
import { revisionSha256 } from './revision-hash';

const submitter = alias(users, 'submitter');
const decider = alias(users, 'decider');
// Lists leave the snapshot (the whole document) out.
const { snapshot: _snapshot, ...listColumns } = getTableColumns(revisions);

const query = (ctx: AppContext) =>
  ctx.db
    .select({ r: listColumns, studyTitle: studies.title, engagementId: studies.engagementId, engagementName: engagements.name, submittedByName: submitter.name, decidedByName: decider.name, rel: releases })
    .from(revisions)
    .innerJoin(studies, eq(studies.id, revisions.studyId))
    .innerJoin(engagements, eq(engagements.id, studies.engagementId))
    .leftJoin(submitter, eq(submitter.id, revisions.submittedBy))
    .leftJoin(decider, eq(decider.id, revisions.decidedBy))
    .leftJoin(releases, eq(releases.revisionId, revisions.id));
type Row = Awaited<ReturnType<ReturnType<typeof query>['where']>>[number];

const iso = (d: Date | null): string | null => (d ? d.toISOString() : null);

function toSummary(row: Row, user: SessionUser, openThreads: number): RevisionSummary {
  const { r, rel } = row;
  const client = user.role === 'client';
  return {
    id: r.id,
    studyId: r.studyId,
    studyTitle: row.studyTitle,
    engagementId: row.engagementId,
    engagementName: row.engagementName,
    number: r.number,
    status: r.status,
    sha256: r.sha256,
    engineVersion: r.engineVersion,
    submittedById: r.submittedBy,
    submittedByName: row.submittedByName,
    submittedAt: r.submittedAt.toISOString(),
    decidedById: r.decidedBy,
    decidedByName: row.decidedByName,
    decidedAt: iso(r.decidedAt),
    decisionReason: client ? null : r.decisionReason,
    releasedAt: iso(r.releasedAt),
    version: r.version,
    release:
      rel && (!client || rel.status === 'released')
        ? { status: rel.status, attempts: rel.attempts, lastError: client ? null : rel.lastError, releasedAt: iso(rel.releasedAt), fileSha256: rel.fileSha256, fileSize: rel.fileSize }
        : null,
    openThreads: client ? 0 : openThreads,
  };
}

async function openThreadCounts(ctx: AppContext, ids: number[]): Promise<Map<number, number>> {
  if (ids.length === 0) return new Map();
  const rows = await ctx.db
    .select({ id: revisionComments.revisionId, n: sql<number>`count(*)` })
    .from(revisionComments)
    .where(and(inArray(revisionComments.revisionId, ids), isNull(revisionComments.parentId), isNull(revisionComments.resolvedAt)))
    .groupBy(revisionComments.revisionId);
  return new Map(rows.map((r) => [r.id, Number(r.n)]));
}

/** Summaries matching `where`, newest first, as `user` may see them. */
export async function listRevisions(ctx: AppContext, user: SessionUser, where: SQL | undefined): Promise<RevisionSummary[]> {
  const rows = await query(ctx).where(where).orderBy(desc(revisions.submittedAt), desc(revisions.id));
  const open = user.role === 'client' ? new Map<number, number>() : await openThreadCounts(ctx, rows.map((r) => r.r.id));
  return rows.map((row) => toSummary(row, user, open.get(row.r.id) ?? 0));
}

export async function summariseRevision(ctx: AppContext, user: SessionUser, id: number): Promise<RevisionSummary> {
  const [s] = await listRevisions(ctx, user, eq(revisions.id, id));
  if (!s) throw notFound('That revision');
  return s;
}

/**
 * One revision with its snapshot. The SHA-256 is recomputed from the stored snapshot on every
 * read and reported next to the stored one: a mismatch is shown, never repaired or hidden.
 */
export async function describeRevision(ctx: AppContext, user: SessionUser, id: number): Promise<RevisionDetail> {
  const summary = await summariseRevision(ctx, user, id);
  const [row] = await ctx.db.select({ snapshot: revisions.snapshot }).from(revisions).where(eq(revisions.id, id));
  const snapshot = row!.snapshot;
  const computed = revisionSha256(snapshot);
  const partner = user.role === 'partner' && summary.submittedById !== user.id;
  return {
    ...summary,
    snapshot,
    integrity: { ok: computed === summary.sha256, storedSha256: summary.sha256, computedSha256: computed },
    canDecide: partner && summary.status === 'in_review',
    canRelease: partner && summary.status === 'approved' && summary.release?.status !== 'releasing',
  };
}
