/**
 * The process killed in the middle of a release. The real server (a child process) releases with
 * object storage that accepts the upload and never answers, so the release hangs inside the PUT;
 * the child is killed with SIGKILL. A new server (real storage) records the release as
 * interrupted within a few seconds: never half-done (no released status, no deliverable, no mail,
 * revision still approved); releasing again then succeeds with exactly one mail per recipient.
 */
import { createHash } from 'node:crypto';
import { HeadObjectCommand } from '@aws-sdk/client-s3';
import { and, eq, like } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { auditEntries, mailOutbox, releases, revisions, studies } from '../../api/db/schema/index';
import { loadConfig } from '../../api/config';
import { INTERRUPTED_REASON, sweepInterruptedReleases } from '../../api/routes/revisions/release-sweeper';
import { httpSession } from './support/http-session';
import { mailFor } from './support/mailbox';
import { approvedRevision, mailArrives, reviewCast, savedStudy, type ReviewCast } from './support/revision-setup';
import { startServerProcess, type ServerProcess } from './support/server-process';
import { silentStorage, type BrokenStorage } from './support/storage-outages';
import { PASSWORD, signedIn, startTestApp, type TestApp } from './support/test-app';

let t: TestApp;
let c: ReviewCast;
let hung: BrokenStorage;
const servers: ServerProcess[] = [];
const apps: TestApp[] = [];
const title = 'Ferry terminal, interrupted release';

beforeAll(async () => {
  t = startTestApp();
  c = await reviewCast(t, 'Faults: ferry terminal');
  hung = await silentStorage();
});
afterAll(async () => {
  for (const s of servers) await s.stop();
  for (const a of apps) await a.close();
  await hung.close();
  await t.close();
});

async function state(revisionId: number) {
  const [rev] = await t.ctx.db.select({ status: revisions.status, releasedAt: revisions.releasedAt, studyStatus: studies.status }).from(revisions).innerJoin(studies, eq(studies.id, revisions.studyId)).where(eq(revisions.id, revisionId));
  const [rel] = await t.ctx.db.select().from(releases).where(eq(releases.revisionId, revisionId));
  const mails = await t.ctx.db.select().from(mailOutbox).where(like(mailOutbox.dedupeKey, `released:${revisionId}:%`));
  return { rev: rev!, rel, mails };
}

/** Never half-done: whatever the release row says, the revision and the mails agree with it. */
function expectConsistent(s: Awaited<ReturnType<typeof state>>): void {
  if (s.rel?.status === 'released') {
    expect(s.rev.status).toBe('released');
    expect(s.rel.fileSha256).toMatch(/^[0-9a-f]{64}$/);
  } else {
    expect(s.rev).toMatchObject({ status: 'approved', releasedAt: null, studyStatus: 'approved' });
    expect(s.rel?.fileSha256 ?? null).toBeNull();
    expect(s.mails).toEqual([]);
  }
}

const objectExists = (key: string) =>
  t.ctx.storage.client.send(new HeadObjectCommand({ Bucket: t.ctx.storage.bucket, Key: key })).then(
    () => true,
    (err: { name?: string }) => (err.name === 'NotFound' ? false : Promise.reject(err)),
  );

describe('the server killed in the middle of a release', () => {
  it('records the release as interrupted after a restart, never half-done, and a second release succeeds once', { timeout: 120_000 }, async () => {
    const study = await savedStudy(c.consultant, c.engagementId, title);
    const id = await approvedRevision(c, study.id);
    const key = `engagements/${c.engagementId}/studies/${study.id}/revisions/1.pdf`;

    // A 5 s lease: short for the test, long enough for a first (cold) render on a loaded machine.
    const first = await startServerProcess({ S3_ENDPOINT: hung.endpoint, RELEASE_LEASE_MS: '5000' });
    servers.push(first);
    const partner = httpSession(first.url);
    await partner.signIn(c.emails.partner, PASSWORD);
    const answer = partner.post(`/api/revisions/${id}/release`).catch((err: Error) => err);
    // The PDF is rendered and signed; the process now waits inside the upload.
    await hung.received(`PUT /${t.ctx.storage.bucket}/${key}`);
    const inFlight = (await state(id)).rel;
    expect(inFlight, `${JSON.stringify(inFlight)}\n${first.output()}`).toMatchObject({ status: 'releasing', attempts: 1 });

    await first.kill();
    const killedAt = Date.now();
    expect(await answer).toBeInstanceOf(Error);
    const afterKill = await state(id);
    expectConsistent(afterKill);
    expect(afterKill.rel).toMatchObject({ status: 'releasing' });

    // A new server with the real storage, as an operator's restart would bring back.
    // Its own lease of 10 s means a sweep every 2.5 s, and slack for its own release below.
    const second = await startServerProcess({ RELEASE_LEASE_MS: '10000' });
    servers.push(second);
    const restartedAt = Date.now();
    let s = await state(id);
    while (s.rel?.status === 'releasing' && Date.now() - killedAt < 20_000) {
      expectConsistent(s);
      await new Promise((r) => setTimeout(r, 200));
      s = await state(id);
    }
    const settledMs = Date.now() - killedAt;
    if (process.env.FAULTS_DEBUG) console.log(`interrupted release recorded ${settledMs} ms after the kill, ${Date.now() - restartedAt} ms after the restart`);
    expectConsistent(s);
    expect(s.rel).toMatchObject({ status: 'failed', attempts: 1, lastError: INTERRUPTED_REASON, leaseUntil: null });
    // Within one lease (5 s) of the last renewal plus one sweep (2.5 s) after the restart.
    expect(settledMs).toBeLessThan(20_000);
    expect(Date.now() - restartedAt).toBeLessThan(8_500);
    expect(await objectExists(key)).toBe(false);
    expect((await c.client.get('/api/deliverables')).body.deliverables).toEqual([]);
    const audit = await t.ctx.db.select().from(auditEntries).where(and(eq(auditEntries.action, 'release_failed'), eq(auditEntries.engagementId, c.engagementId)));
    expect(audit.map((a) => a.detail)).toEqual([{ revisionId: id, attempt: 1, reason: INTERRUPTED_REASON, interrupted: true }]);

    // What the partner sees on the revision: failed, with the reason, releasable again.
    const again = httpSession(second.url);
    await again.signIn(c.emails.partner, PASSWORD);
    const view = (await again.get(`/api/revisions/${id}`)).body.revision as Record<string, unknown>;
    expect(view).toMatchObject({ status: 'approved', canRelease: true, release: { status: 'failed', lastError: INTERRUPTED_REASON } });

    const released = await again.post(`/api/revisions/${id}/release`);
    expect(released.status, released.text).toBe(200);
    expect(released.body.revision).toMatchObject({ status: 'released', release: { status: 'released', attempts: 2, lastError: null } });
    const done = await state(id);
    expectConsistent(done);
    expect(await objectExists(key)).toBe(true);

    // The client gets the signed PDF it was told about, and one mail; so does the submitter.
    const link = await c.client.get(`/api/revisions/${id}/pdf`);
    expect(link.status, JSON.stringify(link.body)).toBe(200);
    const pdf = Buffer.from(await (await fetch(link.body.url)).arrayBuffer());
    expect(createHash('sha256').update(pdf).digest('hex')).toBe(done.rel!.fileSha256);
    const subject = `Released: ${title}, revision 1`;
    await mailArrives(c.emails.client, new RegExp(`^${subject}$`));
    await mailArrives(c.emails.consultant, new RegExp(`^${subject}$`));
    // Give a late duplicate (from either server's outbox) the time to show up before counting.
    await new Promise((r) => setTimeout(r, 2_500));
    expect((await mailFor(c.emails.client)).filter((m) => m.subject === subject)).toHaveLength(1);
    expect((await mailFor(c.emails.consultant)).filter((m) => m.subject === subject)).toHaveLength(1);
  });
});

describe('a release that is slow but alive', () => {
  it('keeps its claim past the lease by renewing it, and writes nothing once the claim is lost', { timeout: 60_000 }, async () => {
    const study = await savedStudy(c.consultant, c.engagementId, 'Ferry terminal, slow store');
    const id = await approvedRevision(c, study.id);
    const key = `engagements/${c.engagementId}/studies/${study.id}/revisions/1.pdf`;
    // A 4 s lease renewed every 1.3 s (rendering blocks the event loop for a moment on a loaded
    // machine), and a store that takes the upload and never answers.
    const slow = startTestApp({ releaseLeaseMs: 4_000, s3: { ...loadConfig().s3, endpoint: hung.endpoint } });
    apps.push(slow);
    const partner = await signedIn(slow.app, c.emails.otherPartner);
    const answer = partner.post(`/api/revisions/${id}/release`).then((r) => r);
    await hung.received(`PUT /${t.ctx.storage.bucket}/${key}`);

    // Well past one lease length the claim is still held, so a sweep leaves it alone.
    await new Promise((r) => setTimeout(r, 9_000));
    expect(await sweepInterruptedReleases(t.ctx, { asAnotherProcess: true })).toBe(0);
    const held = (await state(id)).rel;
    expect(held, JSON.stringify(held)).toMatchObject({ status: 'releasing', attempts: 1 });

    // As if the process stalled past its lease: the sweep records it interrupted, the next renewal
    // finds the claim gone and aborts the upload, and the attempt writes nothing of its own.
    await t.ctx.db.update(releases).set({ leaseUntil: new Date(Date.now() - 1_000) }).where(eq(releases.revisionId, id));
    expect(await sweepInterruptedReleases(t.ctx, { asAnotherProcess: true })).toBe(1);
    const res = await answer;
    expect(res.status).toBe(503);
    expect(res.body.error.message).toMatch(/lost its claim/);
    const s = await state(id);
    expectConsistent(s);
    expect(s.rel).toMatchObject({ status: 'failed', attempts: 1, lastError: INTERRUPTED_REASON });
  });
});
