/** What clients see (released revisions of their own engagements only) and POST /api/verify. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CSRF_HEADER, CSRF_HEADER_VALUE } from '../../shared/api-error';
import { agent, makeEngagement, makeUser, signedIn, startTestApp, type Agent, type TestApp } from './support/test-app';
import { download } from './support/pdf-tools';
import { approvedRevision, reviewCast, savedStudy, submitted, type ReviewCast } from './support/revision-setup';

let t: TestApp;
let c: ReviewCast;
let outsider: Agent;
let released = 0;
let unreleased = 0;
let studyId = 0;
let pdf: Buffer = Buffer.alloc(0);

const verify = (a: Agent, body: Buffer) => a.raw.post('/api/verify').set(CSRF_HEADER, CSRF_HEADER_VALUE).set('Content-Type', 'application/pdf').send(body);

beforeAll(async () => {
  t = startTestApp();
  c = await reviewCast(t, 'Delivery: lighthouse visitor centre');
  const other = await makeUser(t.ctx, 'client');
  await makeEngagement(t.ctx, [other.id], 'Delivery: unrelated engagement');
  outsider = await signedIn(t.app, other.email);
  const study = await savedStudy(c.consultant, c.engagementId, 'Visitor centre');
  studyId = study.id;
  released = await approvedRevision(c, study.id);
  expect((await c.partner.post(`/api/revisions/${released}/release`)).status).toBe(200);
  pdf = (await download((await c.client.get(`/api/revisions/${released}/pdf`)).body.url)).body;
  unreleased = (await submitted(c.consultant, (await savedStudy(c.consultant, c.engagementId, 'Draft-only study')).id)).id;
});
afterAll(() => t.close());

describe('client deliverables', () => {
  it('lists released revisions of the client’s engagements with date and approver', async () => {
    const res = await c.client.get('/api/deliverables');
    expect(res.body.deliverables).toEqual([
      expect.objectContaining({ revisionId: released, studyId, studyTitle: 'Visitor centre', number: 1, approverName: 'Test partner', fileSize: pdf.length, releasedAt: expect.any(String), approvedAt: expect.any(String) }),
    ]);
  });

  it('lets the client read a released revision without the firm’s review details', async () => {
    const res = await c.client.get(`/api/revisions/${released}`);
    expect(res.status).toBe(200);
    expect(res.body.revision).toMatchObject({ status: 'released', openThreads: 0, canDecide: false, canRelease: false, integrity: { ok: true } });
    const list = await c.client.get(`/api/studies/${studyId}/revisions`);
    expect(list.body.revisions.map((r: { id: number }) => r.id)).toEqual([released]);
  });

  it('hides unreleased revisions from the client: 404 on the revision and its PDF', async () => {
    expect((await c.client.get(`/api/revisions/${unreleased}`)).status).toBe(404);
    expect((await c.client.get(`/api/revisions/${unreleased}/pdf`)).status).toBe(404);
  });

  it('gives a client of another engagement 404 on revision and PDF, and an empty deliverables list', async () => {
    const missing = (await outsider.get('/api/revisions/999999999')).body;
    expect((await outsider.get(`/api/revisions/${released}`)).body).toEqual(missing);
    expect((await outsider.get(`/api/revisions/${released}/pdf`)).status).toBe(404);
    expect((await outsider.get(`/api/studies/${studyId}/revisions`)).status).toBe(404);
    expect((await outsider.get('/api/deliverables')).body.deliverables).toEqual([]);
  });
});

describe('POST /api/verify', () => {
  it('confirms an unmodified deliverable with its revision, approver and dates to a member', async () => {
    const res = await verify(c.client, pdf);
    expect(res.status).toBe(200);
    expect(res.body.result).toMatchObject({
      authentic: true,
      verdict: 'authentic',
      detailsWithheld: false,
      signature: { signed: true, valid: true, integrityOk: true },
      deliverable: { revisionId: released, approverName: 'Test partner' },
    });
    expect(res.body.result.message).toMatch(/Unmodified deliverable: “Visitor centre”, revision 1/);
  });

  it('tells a client of another engagement only that it is a genuine deliverable of the firm', async () => {
    const res = await verify(outsider, pdf);
    expect(res.body.result).toMatchObject({ authentic: true, verdict: 'authentic', deliverable: null, detailsWithheld: true, message: 'This is an unmodified deliverable of this firm.' });
    expect(JSON.stringify(res.body)).not.toContain('Visitor centre');
  });

  it('rejects a copy with one byte changed', async () => {
    const changed = Buffer.from(pdf);
    const at = Math.floor(changed.length / 2);
    changed[at] = changed[at]! ^ 0x01;
    const res = await verify(c.client, changed);
    expect(res.body.result).toMatchObject({ authentic: false, verdict: 'signature_invalid', deliverable: null });
  });

  it('says an unsigned PDF is not a deliverable, and accepts the file as a form upload too', async () => {
    const plain = Buffer.from('%PDF-1.4\n1 0 obj << /Type /Catalog >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n');
    const res = await c.client.raw.post('/api/verify').set(CSRF_HEADER, CSRF_HEADER_VALUE).attach('file', plain, { filename: 'plain.pdf', contentType: 'application/pdf' });
    expect(res.status).toBe(200);
    expect(res.body.result).toMatchObject({ authentic: false, verdict: 'unsigned', signature: { signed: false } });
  });

  it('needs a file (400) and a signed-in user (401)', async () => {
    expect((await c.client.post('/api/verify', {})).status).toBe(400);
    expect((await verify(agent(t.app), pdf)).status).toBe(401);
  });
});
