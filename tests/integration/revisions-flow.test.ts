/** Revisions: submit, decide (four-eyes), every illegal transition, immutability and tamper detection, review queue. */
import { createHash } from 'node:crypto';
import { eq, sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { canonicalJson } from '../../shared/canonical-json';
import { revisions } from '../../api/db/schema/index';
import { startTestApp, type TestApp } from './support/test-app';
import { approvedRevision, mailArrives, reviewCast, savedStudy, studyDocument, submitted, type ReviewCast } from './support/revision-setup';

let t: TestApp;
let c: ReviewCast;

beforeAll(async () => {
  t = startTestApp();
  c = await reviewCast(t, 'Revisions: harbour ferry desk');
});
afterAll(() => t.close());

describe('POST /api/studies/:id/revisions', () => {
  it('freezes the document, every block with inputs and outputs and the engine version, hashed over canonical JSON', async () => {
    const study = await savedStudy(c.consultant, c.engagementId);
    const rev = await submitted(c.consultant, study.id);
    expect(rev).toMatchObject({ number: 1, status: 'in_review', submittedById: c.ids.consultant, openThreads: 0, release: null });
    const detail = (await c.partner.get(`/api/revisions/${rev.id}`)).body.revision;
    const current = (await c.consultant.get(`/api/studies/${study.id}`)).body.study;
    expect(detail.snapshot.document).toEqual(current.document);
    expect(detail.snapshot.blocks).toEqual(current.blocks);
    expect(detail.snapshot.blocks['desk-peak'].resolvedSpec).toMatchObject({ model: 'M/M/c', arrivalRate: 30, serviceRate: 12, servers: 3 });
    expect(detail.snapshot).toMatchObject({ number: 1, study: { id: study.id, title: 'Ferry desk capacity' }, engineVersion: current.blocks['desk-peak'].engineVersion });
    // The hash is SHA-256 over keys-sorted, whitespace-free JSON (our canonical form), recomputed here independently.
    expect(detail.sha256).toBe(createHash('sha256').update(canonicalJson(detail.snapshot)).digest('hex'));
    expect(detail.integrity).toEqual({ ok: true, storedSha256: detail.sha256, computedSha256: detail.sha256 });
    expect(current.status).toBe('in_review');
  });

  it('e-mails the partners of the engagement (not the submitter) through the outbox', async () => {
    const study = await savedStudy(c.partner, c.engagementId, 'Partner-written study');
    await submitted(c.partner, study.id);
    const mails = await mailArrives(c.emails.otherPartner, /Review requested: Partner-written study/);
    expect(mails).toHaveLength(1);
    expect(mails[0]!.text).toContain('/revisions/');
  });

  it('refuses a second submission while a revision is in review (409)', async () => {
    const study = await savedStudy(c.consultant, c.engagementId, 'Twice');
    await submitted(c.consultant, study.id);
    const res = await c.consultant.post(`/api/studies/${study.id}/revisions`, {});
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/Revision 1 of this study is still in review/);
  });

  it('refuses a stale studyVersion (409) so the consultant submits what they saw', async () => {
    const study = await savedStudy(c.consultant, c.engagementId, 'Stale view');
    const res = await c.consultant.post(`/api/studies/${study.id}/revisions`, { studyVersion: study.version - 1 });
    expect(res.status).toBe(409);
    expect(res.body.error.issues).toEqual([{ path: 'studyVersion', message: `The study is now at version ${study.version}` }]);
  });
});

describe('POST /api/revisions/:id/decision', () => {
  it('applies the four-eyes rule: a partner cannot decide on a revision they submitted', async () => {
    const study = await savedStudy(c.partner, c.engagementId, 'Own work');
    const rev = await submitted(c.partner, study.id);
    const res = await c.partner.post(`/api/revisions/${rev.id}/decision`, { decision: 'approve' });
    expect(res.status).toBe(403);
    expect(res.body.error.message).toMatch(/submitted revision 1 yourself.*four-eyes/);
    expect((await c.otherPartner.post(`/api/revisions/${rev.id}/decision`, { decision: 'approve' })).status).toBe(200);
  });

  it('needs a reason to send a revision back', async () => {
    const rev = await submitted(c.consultant, (await savedStudy(c.consultant, c.engagementId, 'No reason')).id);
    const res = await c.partner.post(`/api/revisions/${rev.id}/decision`, { decision: 'request-changes', reason: '  ' });
    expect(res.status).toBe(400);
    expect(res.body.error.issues[0].path).toBe('reason');
  });

  it('sends back with a reason: study editable again, the writers are told, and a new revision can follow', async () => {
    const study = await savedStudy(c.consultant, c.engagementId, 'Sent back');
    const rev = await submitted(c.consultant, study.id);
    const res = await c.partner.post(`/api/revisions/${rev.id}/decision`, { decision: 'request-changes', reason: 'Check the peak arrival rate against the turnstile counts.' });
    expect(res.status).toBe(200);
    expect(res.body.revision).toMatchObject({ status: 'changes_requested', decidedById: c.ids.partner, decisionReason: 'Check the peak arrival rate against the turnstile counts.' });
    const s = (await c.consultant.get(`/api/studies/${study.id}`)).body.study;
    expect(s.status).toBe('changes_requested');
    expect((await c.consultant.put(`/api/studies/${study.id}/document`, { document: studyDocument(4), baseVersion: s.version })).status).toBe(200);
    const mails = await mailArrives(c.emails.consultant, /Changes requested: Sent back/);
    expect(mails[0]!.text).toContain('turnstile counts');
    expect((await submitted(c.consultant, study.id)).number).toBe(2);
  });

  it('lets exactly one of two simultaneous decisions win; the other gets 409', async () => {
    const rev = await submitted(c.consultant, (await savedStudy(c.consultant, c.engagementId, 'Race')).id);
    const [a, b] = await Promise.all([
      c.partner.post(`/api/revisions/${rev.id}/decision`, { decision: 'approve' }),
      c.otherPartner.post(`/api/revisions/${rev.id}/decision`, { decision: 'request-changes', reason: 'Not yet.' }),
    ]);
    expect([a.status, b.status].sort()).toEqual([200, 409]);
  });
});

describe('illegal transitions', () => {
  const cases = [
    ['approve', 'changes_requested', { decision: 'approve' }, /sent back for changes.*Only a revision in review can be approved/],
    ['request changes on', 'changes_requested', { decision: 'request-changes', reason: 'again' }, /Only a revision in review can be sent back/],
    ['approve', 'approved', { decision: 'approve' }, /is approved\. It can no longer be changed/],
    ['request changes on', 'approved', { decision: 'request-changes', reason: 'late' }, /is approved\. It can no longer be changed/],
    ['release', 'in_review', null, /Only an approved revision can be released/],
    ['release', 'changes_requested', null, /Only an approved revision can be released/],
  ] as const;
  it.each(cases)('refuses to %s a revision that is %s with 409', async (_verb, state, body, message) => {
    const study = await savedStudy(c.consultant, c.engagementId, `Transition ${state}`);
    const rev = await submitted(c.consultant, study.id);
    if (state === 'changes_requested') await c.partner.post(`/api/revisions/${rev.id}/decision`, { decision: 'request-changes', reason: 'Redo.' });
    if (state === 'approved') await c.partner.post(`/api/revisions/${rev.id}/decision`, { decision: 'approve' });
    const res = body ? await c.otherPartner.post(`/api/revisions/${rev.id}/decision`, body) : await c.otherPartner.post(`/api/revisions/${rev.id}/release`);
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(message);
  });
});

describe('approved revisions are immutable', () => {
  it('refuses decisions, comments and new submissions once approved, and keeps the approved snapshot when the draft changes', async () => {
    const study = await savedStudy(c.consultant, c.engagementId, 'Frozen');
    const id = await approvedRevision(c, study.id);
    expect((await c.otherPartner.post(`/api/revisions/${id}/decision`, { decision: 'request-changes', reason: 'x' })).status).toBe(409);
    expect((await c.consultant.post(`/api/revisions/${id}/comments`, { body: 'One more thing' })).status).toBe(409);
    const again = await c.consultant.post(`/api/studies/${study.id}/revisions`, {});
    expect(again.status).toBe(409);
    expect(again.body.error.message).toMatch(/approved and waiting to be released/);
    const s = (await c.consultant.get(`/api/studies/${study.id}`)).body.study;
    expect(s.status).toBe('approved');
    // The working draft stays editable (for revision 2); the approved revision itself does not move.
    const before = (await c.partner.get(`/api/revisions/${id}`)).body.revision.sha256;
    expect((await c.consultant.put(`/api/studies/${study.id}/document`, { document: studyDocument(5), baseVersion: s.version })).status).toBe(200);
    const after = (await c.partner.get(`/api/revisions/${id}`)).body.revision;
    expect(after.sha256).toBe(before);
    expect(after.integrity.ok).toBe(true);
  });

  it('reports a tampered snapshot on every read, and refuses to release it', async () => {
    const study = await savedStudy(c.consultant, c.engagementId, 'Tamper target');
    const id = await approvedRevision(c, study.id);
    const [before] = await t.ctx.db.select({ sha256: revisions.sha256 }).from(revisions).where(eq(revisions.id, id));
    await t.ctx.db.execute(sql`update revisions set snapshot = json_set(snapshot, '$.blocks."desk-peak".result.rho', 0.5) where id = ${id}`);
    const res = await c.partner.get(`/api/revisions/${id}`);
    expect(res.status).toBe(200);
    expect(res.body.revision.integrity.ok).toBe(false);
    expect(res.body.revision.integrity.storedSha256).toBe(before!.sha256);
    expect(res.body.revision.integrity.computedSha256).not.toBe(before!.sha256);
    const release = await c.otherPartner.post(`/api/revisions/${id}/release`);
    expect(release.status).toBe(409);
    expect(release.body.error.code).toBe('integrity_failed');
  });
});

describe('GET /api/review-queue', () => {
  it('lists what waits for a partner: in review, in their engagements, submitted by someone else', async () => {
    const mine = await submitted(c.partner, (await savedStudy(c.partner, c.engagementId, 'Queue: partner own')).id);
    const theirs = await submitted(c.consultant, (await savedStudy(c.consultant, c.engagementId, 'Queue: consultant')).id);
    const ids = (await c.partner.get('/api/review-queue')).body.revisions.map((r: { id: number }) => r.id);
    expect(ids).toContain(theirs.id);
    expect(ids).not.toContain(mine.id);
    expect((await c.otherPartner.get('/api/review-queue')).body.revisions.map((r: { id: number }) => r.id)).toEqual(expect.arrayContaining([mine.id, theirs.id]));
    expect((await c.consultant.get('/api/review-queue')).status).toBe(403);
  });
});
