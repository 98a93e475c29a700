/** Review threads on sections and blocks, and the comparison of two revisions. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { COMMENT_MAX } from '../../shared/schemas/revisions';
import { startTestApp, type TestApp } from './support/test-app';
import { reviewCast, savedStudy, studyDocument, submitted, type ReviewCast } from './support/revision-setup';

let t: TestApp;
let c: ReviewCast;
let rev1 = 0;
let rev2 = 0;

beforeAll(async () => {
  t = startTestApp();
  c = await reviewCast(t, 'Review: museum ticket hall');
  const study = await savedStudy(c.consultant, c.engagementId, 'Ticket hall');
  rev1 = (await submitted(c.consultant, study.id)).id;
  await c.partner.post(`/api/revisions/${rev1}/decision`, { decision: 'request-changes', reason: 'Try four agents.' });
  const s = (await c.consultant.get(`/api/studies/${study.id}`)).body.study;
  const changed = studyDocument(4, 'The ticket hall serves walk-in visitors at the opening hour.');
  expect((await c.consultant.put(`/api/studies/${study.id}/document`, { document: changed, baseVersion: s.version })).status).toBe(200);
  rev2 = (await submitted(c.consultant, study.id)).id;
});
afterAll(() => t.close());

describe('comments on a revision', () => {
  it('keeps threads on a section and a block, with replies, and returns bodies as plain text', async () => {
    const root = await c.partner.post(`/api/revisions/${rev2}/comments`, { anchorType: 'section', anchorId: 'sect-peak', body: 'Where does <b>30 per hour</b> come from?' });
    expect(root.status).toBe(201);
    expect(root.body.comment).toMatchObject({ anchorType: 'section', anchorId: 'sect-peak', parentId: null, body: 'Where does <b>30 per hour</b> come from?', resolvedAt: null });
    const reply = await c.consultant.post(`/api/revisions/${rev2}/comments`, { parentId: root.body.comment.id, body: 'Turnstile counts, week 12.' });
    expect(reply.body.comment).toMatchObject({ parentId: root.body.comment.id, anchorType: 'section', anchorId: 'sect-peak' });
    const block = await c.partner.post(`/api/revisions/${rev2}/comments`, { anchorType: 'block', anchorId: 'desk-peak', body: 'Add a chart.' });
    expect(block.status).toBe(201);
    const list = (await c.consultant.get(`/api/revisions/${rev2}/comments`)).body.comments;
    expect(list.map((x: { id: number }) => x.id)).toEqual([root.body.comment.id, reply.body.comment.id, block.body.comment.id]);
    expect((await c.partner.get(`/api/revisions/${rev2}`)).body.revision.openThreads).toBe(2);
  });

  it('resolves and reopens a thread by its first comment only', async () => {
    const root = (await c.partner.post(`/api/revisions/${rev2}/comments`, { body: 'General remark.' })).body.comment;
    const reply = (await c.consultant.post(`/api/revisions/${rev2}/comments`, { parentId: root.id, body: 'Noted.' })).body.comment;
    expect((await c.consultant.patch(`/api/comments/${reply.id}`, { resolved: true })).status).toBe(409);
    const done = await c.consultant.patch(`/api/comments/${root.id}`, { resolved: true });
    expect(done.body.comment).toMatchObject({ resolvedAt: expect.any(String), resolvedByName: 'Test consultant' });
    expect((await c.partner.patch(`/api/comments/${root.id}`, { resolved: false })).body.comment.resolvedAt).toBeNull();
  });

  it('refuses anchors that are not in the revision, empty and over-long bodies', async () => {
    const bad = await c.partner.post(`/api/revisions/${rev2}/comments`, { anchorType: 'block', anchorId: 'no-such-block', body: 'x' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues).toEqual([{ path: 'anchorId', message: 'Not in this revision' }]);
    expect((await c.partner.post(`/api/revisions/${rev2}/comments`, { anchorType: 'section', body: 'no anchor' })).status).toBe(400);
    expect((await c.partner.post(`/api/revisions/${rev2}/comments`, { body: '   ' })).status).toBe(400);
    expect((await c.partner.post(`/api/revisions/${rev2}/comments`, { body: 'x'.repeat(COMMENT_MAX + 1) })).status).toBe(400);
  });

  it('keeps comments from clients (403), even on their own engagement', async () => {
    expect((await c.client.get(`/api/revisions/${rev2}/comments`)).status).toBe(403);
    expect((await c.client.post(`/api/revisions/${rev2}/comments`, { body: 'hello' })).status).toBe(403);
  });
});

describe('GET /api/revisions/:a/compare/:b', () => {
  it('shows word-level text changes per section and every model output that moved', async () => {
    const res = await c.partner.get(`/api/revisions/${rev1}/compare/${rev2}`);
    expect(res.status).toBe(200);
    const cmp = res.body.comparison;
    expect(cmp.from).toMatchObject({ id: rev1, number: 1, status: 'changes_requested' });
    expect(cmp.to).toMatchObject({ id: rev2, number: 2, status: 'in_review' });
    const peak = cmp.sections.find((s: { sectionId: string }) => s.sectionId === 'sect-peak');
    expect(peak.change).toBe('changed');
    expect(peak.parts).toEqual(
      expect.arrayContaining([
        { kind: 'removed', text: 'passengers' },
        { kind: 'added', text: 'visitors' },
      ]),
    );
    expect(cmp.sections.find((s: { sectionId: string }) => s.sectionId === 'sect-rec').change).toBe('unchanged');
    // ρ = λ/(cμ): 30/36 with three agents, 30/48 with four (definition; from memory).
    const rho = cmp.movedNumbers.find((m: { measure: string }) => m.measure === 'rho');
    expect(rho).toMatchObject({ blockId: 'desk-peak', blockTitle: 'Front desk at peak' });
    expect(rho.before).toBeCloseTo(30 / 36, 12);
    expect(rho.after).toBeCloseTo(30 / 48, 12);
    expect(rho.change).toBeCloseTo(30 / 48 - 30 / 36, 12);
    expect(rho.relativeChange).toBeCloseTo(-0.25, 12);
    expect(cmp.movedNumbers.find((m: { measure: string }) => m.measure === 'offeredLoad')).toBeUndefined();
    expect(cmp).toMatchObject({ addedBlocks: [], removedBlocks: [] });
  });

  it('refuses revisions of different studies (400) and clients (403)', async () => {
    const other = await submitted(c.consultant, (await savedStudy(c.consultant, c.engagementId, 'Another')).id);
    expect((await c.partner.get(`/api/revisions/${rev1}/compare/${other.id}`)).status).toBe(400);
    expect((await c.client.get(`/api/revisions/${rev1}/compare/${rev2}`)).status).toBe(403);
  });
});
