import { and, asc, eq } from 'drizzle-orm';
import { alias } from 'drizzle-orm/mysql-core';
import type { SessionUser } from '../../../shared/schemas/auth';
import type { CreateComment, RevisionComment } from '../../../shared/schemas/revisions';
import type { AppContext } from '../../context';
import { revisionComments, users } from '../../db/schema/index';
import { HttpError, notFound } from '../../http-error';
import type { RevisionContext } from './revision-access';
import { illegalTransition } from './revision-state';
import { sectionOutline } from './section-outline';

const author = alias(users, 'author');
const resolver = alias(users, 'resolver');
type CommentRow = typeof revisionComments.$inferSelect;

const query = (ctx: AppContext) =>
  ctx.db
    .select({ c: revisionComments, authorName: author.name, resolvedByName: resolver.name })
    .from(revisionComments)
    .leftJoin(author, eq(author.id, revisionComments.authorId))
    .leftJoin(resolver, eq(resolver.id, revisionComments.resolvedBy));

const toComment = ({ c, authorName, resolvedByName }: { c: CommentRow; authorName: string | null; resolvedByName: string | null }): RevisionComment => ({
  id: c.id,
  revisionId: c.revisionId,
  anchorType: c.anchorType,
  anchorId: c.anchorId,
  parentId: c.parentId,
  authorId: c.authorId,
  authorName,
  body: c.body,
  createdAt: c.createdAt.toISOString(),
  resolvedAt: c.resolvedAt ? c.resolvedAt.toISOString() : null,
  resolvedByName,
});

/** Every comment of a revision, oldest first; replies carry their thread's first comment as parentId. */
export async function listComments(ctx: AppContext, revisionId: number): Promise<RevisionComment[]> {
  return (await query(ctx).where(eq(revisionComments.revisionId, revisionId)).orderBy(asc(revisionComments.createdAt), asc(revisionComments.id))).map(toComment);
}

export async function readComment(ctx: AppContext, id: number): Promise<RevisionComment> {
  const [row] = await query(ctx).where(eq(revisionComments.id, id));
  if (!row) throw notFound('That comment');
  return toComment(row);
}

/** Comments belong to the review: open while a revision is in review or sent back, closed once it is approved. */
export function assertOpenForComments(rc: RevisionContext): void {
  if (rc.revision.status === 'approved' || rc.revision.status === 'released') throw illegalTransition(rc.revision.number, rc.revision.status, 'comment');
}

function assertAnchor(rc: RevisionContext, input: CreateComment): void {
  const { snapshot } = rc.revision;
  const ok =
    input.anchorType === 'general' ||
    (input.anchorType === 'section' && sectionOutline(snapshot.document).some((s) => s.sectionId !== null && s.sectionId === input.anchorId)) ||
    (input.anchorType === 'block' && input.anchorId !== null && Object.hasOwn(snapshot.blocks, input.anchorId));
  if (!ok) throw new HttpError(400, 'validation_failed', `Revision ${rc.revision.number} has no ${input.anchorType} "${input.anchorId}".`, [{ path: 'anchorId', message: 'Not in this revision' }]);
}

/** A new thread on an anchor of the revision, or a reply (which joins the thread of the comment it answers). */
export async function addComment(ctx: AppContext, rc: RevisionContext, input: CreateComment, by: SessionUser): Promise<RevisionComment> {
  assertOpenForComments(rc);
  let anchor = { anchorType: input.anchorType, anchorId: input.anchorType === 'general' ? null : input.anchorId };
  let parentId: number | null = null;
  if (input.parentId !== null) {
    const [parent] = await ctx.db.select().from(revisionComments).where(and(eq(revisionComments.id, input.parentId), eq(revisionComments.revisionId, rc.revision.id)));
    if (!parent) throw new HttpError(400, 'validation_failed', 'The comment you reply to is not on this revision.', [{ path: 'parentId', message: 'Not on this revision' }]);
    parentId = parent.parentId ?? parent.id;
    anchor = { anchorType: parent.anchorType, anchorId: parent.anchorId };
  } else {
    assertAnchor(rc, input);
  }
  const [res] = await ctx.db.insert(revisionComments).values({ revisionId: rc.revision.id, ...anchor, parentId, authorId: by.id, body: input.body, createdAt: new Date() });
  return readComment(ctx, res.insertId);
}

/** Resolves or reopens a thread (its first comment). */
export async function setResolved(ctx: AppContext, rc: RevisionContext, comment: RevisionComment, resolved: boolean, by: SessionUser): Promise<RevisionComment> {
  assertOpenForComments(rc);
  if (comment.parentId !== null) throw new HttpError(409, 'conflict', 'Replies are resolved with their thread: resolve the thread’s first comment.');
  await ctx.db
    .update(revisionComments)
    .set(resolved ? { resolvedAt: new Date(), resolvedBy: by.id } : { resolvedAt: null, resolvedBy: null })
    .where(eq(revisionComments.id, comment.id));
  return readComment(ctx, comment.id);
}
