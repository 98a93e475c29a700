/**
 * The two read caches that keep the API fast under load must never serve what changed: the session
 * read cache (api/auth/session-store.ts) and the study text cache (api/routes/studies/study-read.ts).
 * Two apps on one database stand for two server processes.
 */
import { eq } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sessions, studies, users } from '../../api/db/schema/index';
import { CSRF_HEADER, CSRF_HEADER_VALUE } from '../../shared/api-error';
import { deskBlock, doc, paragraph } from './support/study-fixtures';
import { makeEngagement, makeUser, PASSWORD, signedIn, startTestApp, type TestApp } from './support/test-app';

const CACHE_MS = 400;
let one: TestApp;
let other: TestApp;

beforeAll(() => {
  one = startTestApp({ sessionCacheMs: CACHE_MS });
  other = startTestApp({ sessionCacheMs: CACHE_MS });
});
afterAll(async () => {
  await one.close();
  await other.close();
});

async function signInCookie(app: TestApp, email: string): Promise<string> {
  const res = await request(app.app).post('/api/auth/sign-in').set(CSRF_HEADER, CSRF_HEADER_VALUE).send({ email, password: PASSWORD });
  expect(res.status).toBe(200);
  return (res.headers['set-cookie'] as unknown as string[])[0]!.split(';')[0]!;
}
/** The session id inside a signed `sojourn.sid=s%3A<id>.<signature>` cookie. */
const sidOf = (cookie: string): string => decodeURIComponent(cookie.split('=')[1]!).slice(2).split('.')[0]!;
const me = (app: TestApp, cookie: string) => request(app.app).get('/api/auth/me').set('cookie', cookie);

/** Asks every 20 ms until `refused` holds; the milliseconds it took. */
async function msUntil(refused: () => Promise<boolean>, limitMs = 5_000): Promise<number> {
  const start = Date.now();
  while (!(await refused())) {
    if (Date.now() - start > limitMs) throw new Error(`still served after ${limitMs} ms`);
    await new Promise((r) => setTimeout(r, 20));
  }
  return Date.now() - start;
}

describe('session read cache', () => {
  it('forgets a session signed out in the same process at once', async () => {
    const u = await makeUser(one.ctx, 'consultant');
    const cookie = await signInCookie(one, u.email);
    expect((await me(one, cookie)).status).toBe(200);
    expect((await request(one.app).post('/api/auth/sign-out').set(CSRF_HEADER, CSRF_HEADER_VALUE).set('cookie', cookie)).status).toBeLessThan(300);
    expect((await me(one, cookie)).status).toBe(401);
  });

  it('lets another process see a sign-out within its cache time, even while the session stays busy', async () => {
    const u = await makeUser(one.ctx, 'consultant');
    const cookie = await signInCookie(one, u.email);
    // Busy in the other process: its entry is refreshed in the background, never older than CACHE_MS.
    for (let i = 0; i < 15; i++) {
      expect((await me(other, cookie)).status).toBe(200);
      await new Promise((r) => setTimeout(r, 40));
    }
    await request(one.app).post('/api/auth/sign-out').set(CSRF_HEADER, CSRF_HEADER_VALUE).set('cookie', cookie);
    expect(await msUntil(async () => (await me(other, cookie)).status === 401)).toBeLessThan(CACHE_MS + 150);
  });

  it('sees a person deactivated outside the app (no process told) within its cache time', async () => {
    const u = await makeUser(one.ctx, 'consultant');
    const cookie = await signInCookie(one, u.email);
    for (let i = 0; i < 10; i++) expect((await me(one, cookie)).status).toBe(200);
    await one.ctx.db.update(users).set({ status: 'deactivated' }).where(eq(users.id, u.id));
    expect(await msUntil(async () => (await me(one, cookie)).status === 401)).toBeLessThan(CACHE_MS + 150);
  });

  it('extends the stored expiry of a session in use, after answering', async () => {
    const u = await makeUser(one.ctx, 'consultant');
    const cookie = await signInCookie(one, u.email);
    const sid = sidOf(cookie);
    const soon = Math.round(Date.now() / 1000) + 120;
    await one.ctx.db.update(sessions).set({ expires: soon }).where(eq(sessions.sessionId, sid));
    expect((await me(other, cookie)).status).toBe(200);
    const stored = async () => (await one.ctx.db.select({ expires: sessions.expires }).from(sessions).where(eq(sessions.sessionId, sid)))[0]!.expires;
    // The cookie lives 12 hours from its last use; so does the stored session.
    await msUntil(async () => (await stored()) > soon + 11 * 3600);
  });

  it('refuses a session removed from the database within its cache time', async () => {
    const u = await makeUser(one.ctx, 'consultant');
    const cookie = await signInCookie(one, u.email);
    expect((await me(one, cookie)).status).toBe(200);
    const sid = sidOf(cookie);
    await one.ctx.db.delete(sessions).where(eq(sessions.sessionId, sid));
    expect(await msUntil(async () => (await me(one, cookie)).status === 401)).toBeLessThan(CACHE_MS + 150);
  });
});

describe('study text cache', () => {
  let consultantId: number;
  let engagementId: number;
  let email: string;

  beforeAll(async () => {
    const u = await makeUser(one.ctx, 'consultant');
    consultantId = u.id;
    email = u.email;
    engagementId = await makeEngagement(one.ctx, [consultantId], 'Read cache: ferry terminal');
  });

  async function newStudy(app: TestApp) {
    const a = await signedIn(app.app, email);
    const created = await a.post(`/api/engagements/${engagementId}/studies`, { title: 'Ticket windows' });
    expect(created.status).toBe(201);
    return { a, id: created.body.study.id as number, version: created.body.study.version as number };
  }

  it('serves a save made through another process, and the same answer as before caching', async () => {
    const { a, id, version } = await newStudy(one);
    const b = await signedIn(other.app, email);
    const saved = await a.put(`/api/studies/${id}/document`, { baseVersion: version, document: doc(paragraph('First draft'), deskBlock('ferry-desk')) });
    expect(saved.status).toBe(200);
    // The other process caches this state…
    const first = await b.get(`/api/studies/${id}`);
    expect(first.body.study).toEqual(saved.body.study);
    // …and a save through the first process is what it serves next.
    const again = await a.put(`/api/studies/${id}/document`, { baseVersion: saved.body.study.version, document: doc(paragraph('Second draft'), deskBlock('ferry-desk', { servers: 4 })) });
    expect(again.status).toBe(200);
    const second = await b.get(`/api/studies/${id}`);
    expect(second.body.study).toEqual(again.body.study);
    expect(JSON.stringify(second.body.study.document)).toContain('Second draft');
    expect(second.body.study.blocks['ferry-desk'].resolvedSpec.servers).toBe(4);
  });

  it('serves the new numbers after an assumption edit recomputes the study, without a new version', async () => {
    const { a, id, version } = await newStudy(one);
    const b = await signedIn(other.app, email);
    const made = await a.post(`/api/engagements/${engagementId}/assumptions`, { name: `Crossings per hour ${id}`, value: 30, unit: 'per_hour', sourceKind: 'judgement' });
    expect(made.status).toBe(201);
    const saved = await a.put(`/api/studies/${id}/document`, { baseVersion: version, document: doc(deskBlock('ferry-desk', { arrivalRate: { assumption: made.body.assumption.id } })) });
    expect(saved.status).toBe(200);
    for (const app of [a, b]) expect((await app.get(`/api/studies/${id}`)).body.study.blocks['ferry-desk'].resolvedSpec.arrivalRate).toBe(30);

    expect((await b.patch(`/api/assumptions/${made.body.assumption.id}`, { value: 24, version: made.body.assumption.version })).status).toBe(200);
    for (const app of [a, b]) {
      const read = (await app.get(`/api/studies/${id}`)).body.study;
      expect(read.version).toBe(saved.body.study.version);
      expect(read.blocks['ferry-desk'].resolvedSpec.arrivalRate).toBe(24);
    }
  });

  it('reads the head fresh: a title, status or name change shows although the text is cached', async () => {
    const { a, id } = await newStudy(one);
    expect((await a.get(`/api/studies/${id}`)).body.study.authorName).toBe('Test consultant');
    await one.ctx.db.update(users).set({ name: 'Renamed consultant' }).where(eq(users.id, consultantId));
    await one.ctx.db.update(studies).set({ status: 'in_review' }).where(eq(studies.id, id));
    const read = (await a.get(`/api/studies/${id}`)).body.study;
    expect(read).toMatchObject({ authorName: 'Renamed consultant', status: 'in_review' });
    await one.ctx.db.update(users).set({ name: 'Test consultant' }).where(eq(users.id, consultantId));
  });
});
