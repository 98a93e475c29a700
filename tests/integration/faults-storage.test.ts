/**
 * Object storage down. At release: storage that answers every request with 500 (revisions-outages
 * covers a refused connection, faults-release-killed a store that never answers). At download:
 * the API checks the stored PDF before issuing a link, so an unreachable or hung store answers a
 * clear 503 instead of a link that fails in the browser. Nothing is half-stored either way.
 */
import { DeleteObjectCommand, HeadObjectCommand } from '@aws-sdk/client-s3';
import { and, eq, like } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { loadConfig } from '../../api/config';
import { auditEntries, mailOutbox, releases } from '../../api/db/schema/index';
import { approvedRevision, mailArrives, reviewCast, savedStudy, type ReviewCast } from './support/revision-setup';
import { failingStorage, silentStorage, type BrokenStorage } from './support/storage-outages';
import { signedIn, startTestApp, type TestApp } from './support/test-app';
import { mailFor } from './support/mailbox';

let t: TestApp;
let c: ReviewCast;
let failing: BrokenStorage;
let silent: BrokenStorage;
const apps: TestApp[] = [];
/** The same app and database with object storage at another address. */
const withStorage = (endpoint: string): TestApp => {
  const app = startTestApp({ s3: { ...loadConfig().s3, endpoint } });
  apps.push(app);
  return app;
};

beforeAll(async () => {
  t = startTestApp();
  c = await reviewCast(t, 'Faults: harbour car park');
  failing = await failingStorage();
  silent = await silentStorage();
});
afterAll(async () => {
  for (const a of apps) await a.close();
  await failing.close();
  await silent.close();
  await t.close();
});

const objectExists = (key: string) =>
  t.ctx.storage.client.send(new HeadObjectCommand({ Bucket: t.ctx.storage.bucket, Key: key })).then(
    () => true,
    (err: { name?: string }) => (err.name === 'NotFound' ? false : Promise.reject(err)),
  );
const releaseMails = (id: number) => t.ctx.db.select().from(mailOutbox).where(like(mailOutbox.dedupeKey, `released:${id}:%`));
const downloads = (id: number) =>
  t.ctx.db
    .select()
    .from(auditEntries)
    .where(and(eq(auditEntries.action, 'deliverable_downloaded'), eq(auditEntries.engagementId, c.engagementId)))
    .then((rows) => rows.filter((r) => (r.detail as { revisionId?: number }).revisionId === id));

describe('object storage failing at release', () => {
  it('answers 503, stores nothing, queues no mail, and the release succeeds once storage answers', async () => {
    const study = await savedStudy(c.consultant, c.engagementId, 'Car park, storage errors');
    const id = await approvedRevision(c, study.id);
    const key = `engagements/${c.engagementId}/studies/${study.id}/revisions/1.pdf`;
    const partner = await signedIn(withStorage(failing.endpoint).app, c.emails.otherPartner);

    const res = await partner.post(`/api/revisions/${id}/release`);
    expect(res.status).toBe(503);
    expect(res.body.error).toMatchObject({ code: 'release_failed', message: expect.stringMatching(/could not be stored.*stays approved/s) });
    expect(failing.requests.some((l) => l.startsWith(`PUT /${t.ctx.storage.bucket}/${key}`))).toBe(true);
    const after = (await c.partner.get(`/api/revisions/${id}`)).body.revision;
    expect(after).toMatchObject({ status: 'approved', releasedAt: null, release: { status: 'failed', attempts: 1, fileSha256: null } });
    expect(after.release.lastError).toMatch(/internal error/i);
    expect(await objectExists(key)).toBe(false);
    expect(await releaseMails(id)).toEqual([]);
    expect((await c.client.get('/api/deliverables')).body.deliverables).toEqual([]);

    const retried = await c.partner.post(`/api/revisions/${id}/release`);
    expect(retried.status, JSON.stringify(retried.body)).toBe(200);
    expect(await objectExists(key)).toBe(true);
    expect(await releaseMails(id)).toHaveLength(2); // the client and the submitting consultant
    await mailArrives(c.emails.client, /^Released: Car park, storage errors, revision 1$/);
    expect((await mailFor(c.emails.client)).filter((m) => m.subject === 'Released: Car park, storage errors, revision 1')).toHaveLength(1);
  });
});

describe('object storage down at download', () => {
  let id: number;
  let key: string;
  beforeAll(async () => {
    const study = await savedStudy(c.consultant, c.engagementId, 'Car park, download outage');
    id = await approvedRevision(c, study.id);
    key = `engagements/${c.engagementId}/studies/${study.id}/revisions/1.pdf`;
    expect((await c.partner.post(`/api/revisions/${id}/release`)).status).toBe(200);
  });

  it('answers 503 with a plain message when storage refuses connections, and records no download', async () => {
    const client = await signedIn(withStorage('http://127.0.0.1:9').app, c.emails.client);
    const res = await client.get(`/api/revisions/${id}/pdf`);
    expect(res.status).toBe(503);
    expect(res.body).toEqual({ error: { code: 'storage_unavailable', message: expect.stringMatching(/file store is unreachable.*try again/) } });
    expect(await downloads(id)).toEqual([]);
  });

  it('answers 503 within a few seconds when storage accepts connections and never answers', async () => {
    const client = await signedIn(withStorage(silent.endpoint).app, c.emails.client);
    const started = Date.now();
    const res = await client.get(`/api/revisions/${id}/pdf`);
    expect(res.status).toBe(503);
    expect(res.body.error.code).toBe('storage_unavailable');
    // The existence check gives up after 3 s instead of holding the request.
    expect(Date.now() - started).toBeLessThan(10_000);
    expect(await downloads(id)).toEqual([]);
  });

  it('issues a working link again as soon as storage answers', async () => {
    const res = await c.client.get(`/api/revisions/${id}/pdf`);
    expect(res.status).toBe(200);
    const file = await fetch(res.body.url);
    expect(file.status).toBe(200);
    expect(Buffer.from(await file.arrayBuffer()).subarray(0, 5).toString()).toBe('%PDF-');
    expect(await downloads(id)).toHaveLength(1);
  });

  it('says so when the stored PDF has gone missing, instead of a link to nothing', async () => {
    await t.ctx.storage.client.send(new DeleteObjectCommand({ Bucket: t.ctx.storage.bucket, Key: key }));
    const res = await c.client.get(`/api/revisions/${id}/pdf`);
    expect(res.status).toBe(500);
    expect(res.body.error).toMatchObject({ code: 'deliverable_missing', message: expect.stringMatching(/missing from the file store/) });
    expect(await downloads(id)).toHaveLength(1);
    const [row] = await t.ctx.db.select().from(releases).where(eq(releases.revisionId, id));
    expect(row).toMatchObject({ status: 'released' });
  });
});
