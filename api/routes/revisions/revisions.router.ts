import { Router, type Request } from 'express';
import { and, eq } from 'drizzle-orm';
import { createCommentSchema, decisionSchema, submitRevisionSchema, updateCommentSchema } from '../../../shared/schemas/revisions';
import type { AppContext } from '../../context';
import { revisions } from '../../db/schema/index';
import { HttpError, notFound } from '../../http-error';
import { currentUser } from '../../middleware/auth';
import { idParam, parse } from '../../middleware/parse';
import { addComment, listComments, readComment, setResolved } from './comments.service';
import { compareRevisions } from './compare-revisions';
import { decideRevision } from './decide-revision';
import { firmCertificate } from './firm-signer';
import { releaseRevision } from './release-revision';
import { reviewQueue } from './review-queue';
import { assertRevisionRole, loadRevisionFor, loadStudyForRevisions, type RevisionAccess } from './revision-access';
import { describeRevision, listRevisions, summariseRevision } from './revision-view';
import { submitRevision } from './submit-revision';

/** Revisions of a study: submit, list, read, decide, release, compare, comment; and the review queue. */
export function revisionsRouter(ctx: AppContext): Router {
  const r = Router();
  // Load (in the demo: make, once) the firm certificate at start, so the first release does not
  // pay for it and a missing production certificate shows up in the log right away.
  firmCertificate(ctx.config.signing).catch((err: unknown) => console.warn(`[api] signing certificate: ${(err as Error).message}`));
  const revision = (req: Request, access: RevisionAccess, param = req.params.id) => loadRevisionFor(ctx.db, currentUser(req), idParam(param, 'That revision'), access);

  r.post('/studies/:id/revisions', async (req, res) => {
    const user = currentUser(req);
    assertRevisionRole(user, 'submit');
    const { study, engagement } = await loadStudyForRevisions(ctx.db, user, idParam(req.params.id, 'That study'));
    const id = await submitRevision(ctx, study, engagement, parse(submitRevisionSchema, req.body), user, req.ip);
    res.status(201).json({ revision: await summariseRevision(ctx, user, id) });
  });
  r.get('/studies/:id/revisions', async (req, res) => {
    const user = currentUser(req);
    const { study } = await loadStudyForRevisions(ctx.db, user, idParam(req.params.id, 'That study'));
    // Clients see released revisions only; everything else about a study stays with the firm.
    const where = user.role === 'client' ? and(eq(revisions.studyId, study.id), eq(revisions.status, 'released')) : eq(revisions.studyId, study.id);
    res.json({ revisions: await listRevisions(ctx, user, where) });
  });
  r.get('/review-queue', async (req, res) => {
    res.json({ revisions: await reviewQueue(ctx, currentUser(req)) });
  });
  r.get('/revisions/:id', async (req, res) => {
    const rc = await revision(req, 'read');
    res.json({ revision: await describeRevision(ctx, currentUser(req), rc.revision.id) });
  });
  r.post('/revisions/:id/decision', async (req, res) => {
    const rc = await revision(req, 'decide');
    await decideRevision(ctx, rc, parse(decisionSchema, req.body), currentUser(req), req.ip);
    res.json({ revision: await summariseRevision(ctx, currentUser(req), rc.revision.id) });
  });
  r.post('/revisions/:id/release', async (req, res) => {
    const rc = await revision(req, 'decide');
    await releaseRevision(ctx, rc, currentUser(req), req.ip);
    res.json({ revision: await summariseRevision(ctx, currentUser(req), rc.revision.id) });
  });
  r.get('/revisions/:a/compare/:b', async (req, res) => {
    const a = await revision(req, 'review', req.params.a);
    const b = await revision(req, 'review', req.params.b);
    if (a.study.id !== b.study.id) throw new HttpError(400, 'validation_failed', 'Only revisions of the same study can be compared.');
    res.json({ comparison: compareRevisions(a.revision, b.revision) });
  });
  r.get('/revisions/:id/comments', async (req, res) => {
    const rc = await revision(req, 'review');
    res.json({ comments: await listComments(ctx, rc.revision.id) });
  });
  r.post('/revisions/:id/comments', async (req, res) => {
    const rc = await revision(req, 'comment');
    res.status(201).json({ comment: await addComment(ctx, rc, parse(createCommentSchema, req.body), currentUser(req)) });
  });
  r.patch('/comments/:id', async (req, res) => {
    const user = currentUser(req);
    assertRevisionRole(user, 'comment');
    const id = idParam(req.params.id, 'That comment');
    const comment = await readComment(ctx, id);
    // The comment's revision decides access; a comment of an engagement you are not in is a 404.
    const rc = await loadRevisionFor(ctx.db, user, comment.revisionId, 'comment').catch((err: unknown) => {
      throw err instanceof HttpError && err.status === 404 ? notFound('That comment') : err;
    });
    res.json({ comment: await setResolved(ctx, rc, comment, parse(updateCommentSchema, req.body).resolved, user) });
  });
  return r;
}
