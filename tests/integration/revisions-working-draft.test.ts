/** The working draft stays editable whatever its latest revision's state; the revision does not move. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp, type TestApp } from './support/test-app';
import { approvedRevision, reviewCast, savedStudy, studyDocument, submitted, type ReviewCast } from './support/revision-setup';

let t: TestApp;
let c: ReviewCast;
beforeAll(async () => {
  t = startTestApp();
  c = await reviewCast(t, 'Revisions: working draft');
});
afterAll(() => t.close());

describe('PUT /api/studies/:id/document after a submission', () => {
  it('saves the draft while revision 1 is in review, and revision 1 keeps its snapshot and hash', async () => {
    const study = await savedStudy(c.consultant, c.engagementId, 'Draft during review', 3);
    const rev = await submitted(c.consultant, study.id);
    const before = (await c.partner.get(`/api/revisions/${rev.id}`)).body.revision;
    const current = (await c.consultant.get(`/api/studies/${study.id}`)).body.study;
    const saved = await c.consultant.put(`/api/studies/${study.id}/document`, { document: studyDocument(4), baseVersion: current.version });
    expect(saved.status).toBe(200);
    const after = (await c.partner.get(`/api/revisions/${rev.id}`)).body.revision;
    expect(after.sha256).toBe(before.sha256);
    expect(after.integrity.ok).toBe(true);
    expect(after.snapshot.blocks['desk-peak'].resolvedSpec.servers).toBe(3);
  });

  it('lets revision 2 follow an approved revision 1 once the draft has changed', async () => {
    const study = await savedStudy(c.consultant, c.engagementId, 'Second revision', 3);
    await approvedRevision(c, study.id);
    const current = (await c.consultant.get(`/api/studies/${study.id}`)).body.study;
    expect((await c.consultant.put(`/api/studies/${study.id}/document`, { document: studyDocument(5), baseVersion: current.version })).status).toBe(200);
  });
});
