/** Release: the signed PDF on S3, its text and signature, presigned downloads, one release under concurrency. */
import { createHash } from 'node:crypto';
import { and, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { auditEntries, releases } from '../../api/db/schema/index';
import { startTestApp, type TestApp } from './support/test-app';
import { mailFor } from './support/mailbox';
import { download, pdfsig, pdfText } from './support/pdf-tools';
import { approvedRevision, mailArrives, reviewCast, savedStudy, type ReviewCast } from './support/revision-setup';

let t: TestApp;
let c: ReviewCast;
let studyId = 0;
let revisionId = 0;
let results: Record<string, number> = {};
let pdf: Buffer = Buffer.alloc(0);
let revisionSha = '';

const sha = (b: Buffer): string => createHash('sha256').update(b).digest('hex');

beforeAll(async () => {
  t = startTestApp();
  c = await reviewCast(t, 'Release: ferry terminal');
  const study = await savedStudy(c.consultant, c.engagementId, 'Ferry desk, released');
  studyId = study.id;
  results = study.blocks['desk-peak']!.result;
  revisionId = await approvedRevision(c, study.id);
  const res = await c.otherPartner.post(`/api/revisions/${revisionId}/release`);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  revisionSha = res.body.revision.sha256;
  const link = await c.client.get(`/api/revisions/${revisionId}/pdf`);
  expect(link.status).toBe(200);
  const got = await download(link.body.url);
  expect(got.status).toBe(200);
  pdf = got.body;
});
afterAll(() => t.close());

describe('POST /api/revisions/:id/release', () => {
  it('stores the signed PDF under the engagement, study and revision, then marks revision and study released', async () => {
    const rev = (await c.partner.get(`/api/revisions/${revisionId}`)).body.revision;
    expect(rev).toMatchObject({ status: 'released', release: { status: 'released', attempts: 1, lastError: null, fileSha256: sha(pdf), fileSize: pdf.length } });
    expect(rev.releasedAt).toBe(rev.release.releasedAt);
    const [row] = await t.ctx.db.select().from(releases).where(eq(releases.revisionId, revisionId));
    expect(row!.s3Key).toBe(`engagements/${c.engagementId}/studies/${studyId}/revisions/1.pdf`);
    expect((await c.consultant.get(`/api/studies/${studyId}`)).body.study.status).toBe('released');
  });

  it('prints the numbers the API computed and the revision SHA-256 (pdftotext)', () => {
    const text = pdfText(pdf);
    expect(text).toContain('Ferry desk, released');
    // ρ = 5/6 prints as a percentage with one decimal; Lq (a count below 100) with two decimals.
    expect(text).toContain((results.rho! * 100).toFixed(1));
    expect(text).toContain(results.Lq!.toFixed(2));
    expect(text.replace(/\s+/g, '')).toContain(revisionSha);
  });

  it('carries a signature that pdfsig finds valid, and invalid after a one-byte change', () => {
    expect(pdfsig(pdf)).toMatch(/Signature is Valid/);
    const changed = Buffer.from(pdf);
    const at = Math.floor(changed.length / 3);
    changed[at] = changed[at]! ^ 0x01;
    const report = pdfsig(changed);
    expect(report).not.toMatch(/Signature is Valid/);
    expect(report).toMatch(/Invalid|Mismatch/i);
  });

  it('e-mails the client and the submitter once, with a link to the deliverables', async () => {
    const [mail] = await mailArrives(c.emails.client, /Released: Ferry desk, released/);
    expect(mail!.text).toContain('/deliverables');
    await mailArrives(c.emails.consultant, /Released: Ferry desk, released/);
  });

  it('refuses a second release and any decision on a released revision with 409', async () => {
    const again = await c.partner.post(`/api/revisions/${revisionId}/release`);
    expect(again.status).toBe(409);
    expect(again.body.error.message).toMatch(/is released\. It can no longer be changed/);
    expect((await c.partner.post(`/api/revisions/${revisionId}/decision`, { decision: 'approve' })).status).toBe(409);
  });

  it('makes one PDF and one e-mail per recipient when partners release at the same moment', async () => {
    const study = await savedStudy(c.consultant, c.engagementId, 'Concurrent release');
    const id = await approvedRevision(c, study.id);
    const answers = await Promise.all([c.partner, c.otherPartner, c.partner, c.otherPartner].map((a) => a.post(`/api/revisions/${id}/release`)));
    expect(answers.map((r) => r.status).sort()).toEqual([200, 409, 409, 409]);
    const rows = await t.ctx.db.select().from(releases).where(eq(releases.revisionId, id));
    expect(rows).toEqual([expect.objectContaining({ status: 'released', attempts: 1 })]);
    await mailArrives(c.emails.client, /Released: Concurrent release/);
    await t.ctx.outbox.kick();
    expect((await mailFor(c.emails.client)).filter((m) => /Released: Concurrent release/.test(m.subject))).toHaveLength(1);
  });
});

describe('GET /api/revisions/:id/pdf', () => {
  it('issues a short-lived presigned link that downloads exactly the stored file, and audits it', async () => {
    const res = await c.partner.get(`/api/revisions/${revisionId}/pdf`);
    expect(res.body).toMatchObject({ url: expect.stringContaining(process.env.S3_ENDPOINT!), fileName: 'Ferry desk, released - revision 1.pdf' });
    expect(new Date(res.body.expiresAt).getTime() - Date.now()).toBeLessThanOrEqual(60_000);
    expect(res.body.url).toContain('X-Amz-Expires=60');
    expect(sha((await download(res.body.url)).body)).toBe(sha(pdf));
    const audit = await t.ctx.db.select().from(auditEntries).where(and(eq(auditEntries.action, 'deliverable_downloaded'), eq(auditEntries.engagementId, c.engagementId)));
    expect(audit.length).toBeGreaterThanOrEqual(2);
  });

  it('answers 409 for a revision that is not released', async () => {
    const id = await approvedRevision(c, (await savedStudy(c.consultant, c.engagementId, 'Not yet released')).id);
    expect((await c.partner.get(`/api/revisions/${id}/pdf`)).status).toBe(409);
  });

  it('makes links that stop working after their lifetime (1 s here; s3rver answers 403)', async () => {
    const short = startTestApp({ deliverableLinkSeconds: 1 });
    try {
      const { signedIn } = await import('./support/test-app');
      const client = await signedIn(short.app, c.emails.client);
      const res = await client.get(`/api/revisions/${revisionId}/pdf`);
      expect(res.body.url).toContain('X-Amz-Expires=1');
      await new Promise((r) => setTimeout(r, 2_100));
      expect((await download(res.body.url)).status).toBe(403);
    } finally {
      await short.close();
    }
  });
});
