/**
 * Concurrency: many people pressing save on one study at the same moment, and many partners
 * pressing release on one approved revision. Smaller cases live elsewhere: one stale save in
 * studies.test.ts, a 4-way release in revisions-release.test.ts, a stale assumption edit in
 * assumptions.test.ts. Here the numbers are the ones the issue names: 50 saves, 20 releases.
 */
import { ListObjectsV2Command } from '@aws-sdk/client-s3';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { memberships, releases } from '../../api/db/schema/index';
import { makeEngagement, makeUser, signedIn, startTestApp, type Agent, type TestApp } from './support/test-app';
import { mailFor } from './support/mailbox';
import { approvedRevision, mailArrives, reviewCast, savedStudy } from './support/revision-setup';
import { doc, heading, paragraph } from './support/study-fixtures';

let t: TestApp;
beforeAll(() => {
  t = startTestApp();
});
afterAll(() => t.close());

type Res = { status: number; body: { study?: { version: number; document: unknown }; error?: { code: string; message: string; issues?: { path: string; message: string }[] } } };

/** The version a 409 names ("The study is now at version N"): what the editor keeps to decide. */
const versionIn = (res: Res): number => Number(/version (\d+)/.exec(res.body.error?.issues?.find((i) => i.path === 'baseVersion')?.message ?? '')?.[1]);

describe('50 simultaneous saves of one study', () => {
  const SAVES = 50;
  let writers: Agent[] = [];
  let engagementId = 0;

  beforeAll(async () => {
    // Five people (consultants and partners of the engagement), ten tabs each.
    const people = [...(await Promise.all([1, 2, 3].map(() => makeUser(t.ctx, 'consultant')))), ...(await Promise.all([1, 2].map(() => makeUser(t.ctx, 'partner'))))];
    engagementId = await makeEngagement(t.ctx, people.map((p) => p.id), 'Concurrency: ferry terminal saves');
    writers = await Promise.all(people.map((p) => signedIn(t.app, p.email)));
  });

  const textOf = (i: number) => `Draft ${i}: the ferry desk needs ${i % 7} more agents at the morning peak.`;
  const documentOf = (i: number) => doc(heading('Peak hour', 'sect-peak'), paragraph(textOf(i)));

  it('lets exactly one win; the 49 others get 409 with the winner’s version and nothing of theirs is stored', async () => {
    const created = await writers[0]!.post(`/api/engagements/${engagementId}/studies`, { title: 'Ferry desk, many hands', templateKey: null });
    expect(created.status).toBe(201);
    const id = created.body.study.id as number;

    const answers = (await Promise.all(
      Array.from({ length: SAVES }, (_, i) => writers[i % writers.length]!.put(`/api/studies/${id}/document`, { document: documentOf(i), baseVersion: 1 })),
    )) as unknown as Res[];

    const winners = answers.map((r, i) => ({ r, i })).filter(({ r }) => r.status === 200);
    const losers = answers.map((r, i) => ({ r, i })).filter(({ r }) => r.status !== 200);
    expect(winners).toHaveLength(1);
    expect(losers.map(({ r }) => r.status)).toEqual(Array(SAVES - 1).fill(409));
    const winner = winners[0]!;
    expect(winner.r.body.study!.version).toBe(2);

    for (const { r } of losers) {
      // What the web editor relies on (web/features/study-editor/api/use-autosave.ts): a 409 whose
      // issue is not `status` means "someone saved meanwhile" — it then keeps the typed text in
      // the browser and offers to keep it as a copy or load the newer version.
      expect(r.body.error).toMatchObject({ code: 'conflict', message: expect.stringMatching(/saved this study meanwhile/) });
      expect(r.body.error!.issues!.some((i) => i.path === 'status')).toBe(false);
      expect(versionIn(r)).toBe(2);
    }

    const stored = await writers[1]!.get(`/api/studies/${id}`);
    expect(stored.body.study.version).toBe(2);
    expect(stored.body.study.document).toEqual(winner.r.body.study!.document);
    expect(JSON.stringify(stored.body.study.document)).toContain(textOf(winner.i));
    for (const { i } of losers) expect(JSON.stringify(stored.body.study.document)).not.toContain(textOf(i));
  });

  it('loses no text: every loser keeps its text as a copy at once, or saves it again on the newer version', async () => {
    const created = await writers[0]!.post(`/api/engagements/${engagementId}/studies`, { title: 'Ferry desk, second round', templateKey: null });
    const id = created.body.study.id as number;
    const answers = (await Promise.all(
      Array.from({ length: SAVES }, (_, i) => writers[i % writers.length]!.put(`/api/studies/${id}/document`, { document: documentOf(i), baseVersion: 1 })),
    )) as unknown as Res[];
    const losers = answers.map((r, i) => ({ r, i, by: writers[i % writers.length]! })).filter(({ r }) => r.status === 409);
    expect(losers).toHaveLength(SAVES - 1);

    // "Keep my text as a new copy" (web/features/study-editor/api/study-mutations.ts), all at once:
    // a new study each, then the loser's own document saved into it.
    const copies = await Promise.all(
      losers.map(async ({ i, by }) => {
        const copy = await by.post(`/api/engagements/${engagementId}/studies`, { title: `Ferry desk (my copy ${i})`, templateKey: null });
        expect(copy.status).toBe(201);
        const saved = await by.put(`/api/studies/${copy.body.study.id}/document`, { document: documentOf(i), baseVersion: copy.body.study.version });
        return { i, status: saved.status, text: JSON.stringify(saved.body.study?.document) };
      }),
    );
    for (const c of copies) {
      expect(c.status).toBe(200);
      expect(c.text).toContain(textOf(c.i));
    }

    // Or, one after another, each loser loads the latest version and saves its text on top of it.
    let version = versionIn(losers[0]!.r);
    for (const { i, by } of losers) {
      const latest = await by.get(`/api/studies/${id}`);
      expect(latest.body.study.version).toBe(version);
      const again = await by.put(`/api/studies/${id}/document`, { document: documentOf(i), baseVersion: latest.body.study.version });
      expect(again.status).toBe(200);
      expect(again.body.study.version).toBe(++version);
      expect(JSON.stringify(again.body.study.document)).toContain(textOf(i));
    }
    expect(version).toBe(2 + SAVES - 1);
  });
});

describe('20 simultaneous releases of one approved revision', () => {
  it('makes one release, one stored PDF and one e-mail per recipient', async () => {
    const RELEASES = 20;
    const c = await reviewCast(t, 'Concurrency: harbour pilot release');
    // Two more partners of the engagement besides the approver: four people pressing release.
    const extra = await Promise.all([1, 2].map(() => makeUser(t.ctx, 'partner')));
    for (const p of extra) await t.ctx.db.insert(memberships).values({ engagementId: c.engagementId, userId: p.id, addedAt: new Date() });
    const partners = [c.partner, c.otherPartner, ...(await Promise.all(extra.map((p) => signedIn(t.app, p.email))))];
    const secondClient = await makeUser(t.ctx, 'client');
    await t.ctx.db.insert(memberships).values({ engagementId: c.engagementId, userId: secondClient.id, addedAt: new Date() });

    const study = await savedStudy(c.consultant, c.engagementId, 'Pilot boarding, released once');
    const revisionId = await approvedRevision(c, study.id);

    const answers = await Promise.all(Array.from({ length: RELEASES }, (_, i) => partners[i % partners.length]!.post(`/api/revisions/${revisionId}/release`)));
    const statuses = answers.map((r) => r.status);
    expect(statuses.filter((s) => s === 200)).toHaveLength(1);
    expect(statuses.filter((s) => s === 409)).toHaveLength(RELEASES - 1);
    for (const r of answers.filter((a) => a.status === 409)) expect(r.body.error.code).toBe('conflict');

    const rows = await t.ctx.db.select().from(releases).where(eq(releases.revisionId, revisionId));
    expect(rows).toEqual([expect.objectContaining({ status: 'released', attempts: 1 })]);

    const prefix = `engagements/${c.engagementId}/studies/${study.id}/`;
    const listed = await t.ctx.storage.client.send(new ListObjectsV2Command({ Bucket: t.ctx.storage.bucket, Prefix: prefix }));
    expect((listed.Contents ?? []).map((o) => o.Key)).toEqual([`${prefix}revisions/1.pdf`]);
    expect(listed.Contents![0]!.Size).toBe(rows[0]!.fileSize);

    const recipients = [c.emails.client, secondClient.email, c.emails.consultant];
    for (const to of recipients) await mailArrives(to, /Released: Pilot boarding, released once/);
    // Drain whatever is still queued, then count: exactly one message per recipient.
    await t.ctx.outbox.kick();
    await new Promise((r) => setTimeout(r, 500));
    for (const to of recipients) expect((await mailFor(to)).filter((m) => /Released: Pilot boarding, released once/.test(m.subject))).toHaveLength(1);
    for (const to of [c.emails.partner, c.emails.otherPartner]) expect((await mailFor(to)).filter((m) => /Released: Pilot boarding/.test(m.subject))).toHaveLength(0);
  }, 120_000);
});
