/** Release through outages: storage down (recorded failed, retried later) and SMTP down (mail waits in the outbox). */
import { and, eq } from 'drizzle-orm';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { auditEntries, mailOutbox, releases } from '../../api/db/schema/index';
import { loadConfig } from '../../api/config';
import { signedIn, startTestApp, type TestApp } from './support/test-app';
import { mailFor } from './support/mailbox';
import { approvedRevision, mailArrives, reviewCast, savedStudy, type ReviewCast } from './support/revision-setup';

let t: TestApp;
let broken: TestApp;
let c: ReviewCast;
const smtpAccepts = (accept: boolean) => fetch(`${process.env.MAIL_FAKE_URL}/control`, { method: 'POST', body: JSON.stringify({ accept }) });

beforeAll(async () => {
  t = startTestApp();
  // Same database, but object storage at a port where nothing listens.
  broken = startTestApp({ s3: { ...loadConfig().s3, endpoint: 'http://127.0.0.1:9' } });
  c = await reviewCast(t, 'Outages: ferry pier kiosk');
});
afterEach(() => smtpAccepts(true));
afterAll(async () => {
  await broken.close();
  await t.close();
});

describe('release while object storage is down', () => {
  it('records the release as failed with the reason, keeps the revision approved, and a retry succeeds', async () => {
    const study = await savedStudy(c.consultant, c.engagementId, 'Kiosk, storage outage');
    const id = await approvedRevision(c, study.id);
    const partner = await signedIn(broken.app, c.emails.otherPartner);
    const failed = await partner.post(`/api/revisions/${id}/release`);
    expect(failed.status).toBe(503);
    expect(failed.body.error).toMatchObject({ code: 'release_failed', message: expect.stringMatching(/could not be stored.*stays approved/) });

    const after = (await c.partner.get(`/api/revisions/${id}`)).body.revision;
    expect(after).toMatchObject({ status: 'approved', releasedAt: null, release: { status: 'failed', attempts: 1, fileSha256: null } });
    expect(after.release.lastError).toMatch(/ECONNREFUSED|connect/i);
    expect((await c.consultant.get(`/api/studies/${study.id}`)).body.study.status).toBe('approved');
    expect((await c.client.get(`/api/revisions/${id}`)).status).toBe(404);
    expect((await c.client.get('/api/deliverables')).body.deliverables).toEqual([]);
    const audit = await t.ctx.db.select().from(auditEntries).where(eq(auditEntries.action, 'release_failed'));
    expect(audit.some((a) => (a.detail as { revisionId?: number }).revisionId === id)).toBe(true);

    const retried = await c.otherPartner.post(`/api/revisions/${id}/release`);
    expect(retried.status).toBe(200);
    expect(retried.body.revision).toMatchObject({ status: 'released', release: { status: 'released', attempts: 2, lastError: null } });
    expect((await c.client.get('/api/deliverables')).body.deliverables.map((d: { revisionId: number }) => d.revisionId)).toEqual([id]);
  });
});

describe('release while the SMTP relay is down', () => {
  it('releases anyway; the mail waits in the outbox and arrives after the relay returns', async () => {
    const study = await savedStudy(c.consultant, c.engagementId, 'Kiosk, mail outage');
    const id = await approvedRevision(c, study.id);
    await smtpAccepts(false);
    const res = await c.otherPartner.post(`/api/revisions/${id}/release`);
    expect(res.status).toBe(200);
    await t.ctx.outbox.kick();
    const key = `released:${id}:${c.emails.client}`;
    const [held] = await t.ctx.db.select().from(mailOutbox).where(eq(mailOutbox.dedupeKey, key));
    expect(held).toMatchObject({ status: 'pending' });
    expect((await mailFor(c.emails.client)).filter((m) => m.subject.includes('Kiosk, mail outage'))).toHaveLength(0);

    await smtpAccepts(true);
    // Make the retry due now instead of waiting out the backoff. The test server's own outbox
    // drains the same table and may hold the row's lease for a moment, so poll.
    let status = 'pending';
    for (let i = 0; i < 100 && status !== 'sent'; i++) {
      await t.ctx.db.update(mailOutbox).set({ nextAttemptAt: new Date() }).where(and(eq(mailOutbox.dedupeKey, key), eq(mailOutbox.status, 'pending')));
      await t.ctx.outbox.kick();
      status = (await t.ctx.db.select().from(mailOutbox).where(eq(mailOutbox.dedupeKey, key)))[0]!.status;
      if (status !== 'sent') await new Promise((r) => setTimeout(r, 100));
    }
    expect(status).toBe('sent');
    await mailArrives(c.emails.client, /^Released: Kiosk, mail outage, revision 1$/);
    expect((await mailFor(c.emails.client)).filter((m) => m.subject === 'Released: Kiosk, mail outage, revision 1')).toHaveLength(1);
    expect(await t.ctx.db.select().from(releases).where(eq(releases.revisionId, id))).toEqual([expect.objectContaining({ status: 'released', attempts: 1 })]);
  });
});
