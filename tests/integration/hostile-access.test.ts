/**
 * Hostile access: forged ids of another engagement's objects (directly in the path, and nested in
 * bodies), cross-site requests, planted session ids and password guessing.
 *
 * Already covered elsewhere, not repeated here:
 * - every role × route on a member's and a non-member's engagement: authorisation-matrix.test.ts,
 *   studies-authorisation.test.ts, revisions-authorisation.test.ts, datasets-authorisation.test.ts
 *   (including "same body as a missing id" for engagements, studies, assumptions, revisions, comments);
 * - the CSRF header on sign-in, a new session id at every sign-in: auth.test.ts;
 * - 429 with the clear message after repeated failures, and the right password refused during the
 *   lockout: auth.test.ts ("sign-in rate limit").
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CSRF_HEADER, CSRF_HEADER_VALUE } from '../../shared/api-error';
import { SESSION_COOKIE } from '../../api/app';
import { agent, makeEngagement, makeUser, PASSWORD, signedIn, startTestApp, type Agent, type TestApp } from './support/test-app';
import { EVENT_MAPPING, upload, waitForFit } from './datasets-helpers';
import { savedStudy, submitted } from './support/revision-setup';
import { deskBlock, doc } from './support/study-fixtures';

let t: TestApp;
beforeAll(() => {
  t = startTestApp();
});
afterAll(() => t.close());

const MISSING = 999_999_999;
const CSV = 'arrived_at,service_start,service_end,channel\n' + Array.from({ length: 40 }, (_, i) => `2026-01-05T09:${String(i).padStart(2, '0')}:00Z,2026-01-05T09:${String(i).padStart(2, '0')}:10Z,2026-01-05T09:${String(i + 3).padStart(2, '0')}:00Z,desk\n`).join('');

describe('forged ids of another engagement', () => {
  let consultant: Agent;
  let partner: Agent;
  const mine = { engagement: 0, study: 0, inReview: 0, dataset: 0, comment: 0 };
  const theirs = { engagement: 0, study: 0, inReview: 0, released: 0, dataset: 0, assumption: 0, comment: 0, memberId: 0 };

  beforeAll(async () => {
    const c = await makeUser(t.ctx, 'consultant');
    const p = await makeUser(t.ctx, 'partner');
    const oc = await makeUser(t.ctx, 'consultant');
    const op = await makeUser(t.ctx, 'partner');
    theirs.memberId = oc.id;
    mine.engagement = await makeEngagement(t.ctx, [c.id, p.id], 'Forged ids: mine');
    theirs.engagement = await makeEngagement(t.ctx, [oc.id, op.id], 'Forged ids: theirs');
    consultant = await signedIn(t.app, c.email);
    partner = await signedIn(t.app, p.email);
    const outsider = await signedIn(t.app, oc.email);
    const outsidePartner = await signedIn(t.app, op.email);

    mine.study = (await savedStudy(consultant, mine.engagement, 'My ferry desk')).id;
    mine.inReview = (await submitted(consultant, mine.study)).id;
    mine.comment = (await partner.post(`/api/revisions/${mine.inReview}/comments`, { body: 'Mine' })).body.comment.id;
    mine.dataset = (await upload(consultant, mine.engagement, CSV)).body.dataset.id;
    await consultant.put(`/api/datasets/${mine.dataset}/mapping`, EVENT_MAPPING);
    expect((await waitForFit(consultant, mine.dataset)).status).toBe('fitted');

    theirs.study = (await savedStudy(outsider, theirs.engagement, 'Their ferry desk')).id;
    theirs.inReview = (await submitted(outsider, theirs.study)).id;
    theirs.comment = (await outsidePartner.post(`/api/revisions/${theirs.inReview}/comments`, { body: 'Theirs' })).body.comment.id;
    const other = (await savedStudy(outsider, theirs.engagement, 'Their released desk')).id;
    theirs.released = (await submitted(outsider, other)).id;
    await outsidePartner.post(`/api/revisions/${theirs.released}/decision`, { decision: 'approve' });
    expect((await outsidePartner.post(`/api/revisions/${theirs.released}/release`)).status).toBe(200);
    theirs.dataset = (await upload(outsider, theirs.engagement, CSV)).body.dataset.id;
    theirs.assumption = (await outsider.post(`/api/engagements/${theirs.engagement}/assumptions`, { name: 'Their arrivals', value: 20, unit: 'per_hour', sourceKind: 'client' })).body.assumption.id;
  }, 120_000);

  type Call = (id: number) => [method: 'get' | 'post' | 'put' | 'delete', path: string, body?: object];
  const routes: [string, 'consultant' | 'partner', Call][] = [
    ['GET dataset', 'consultant', (id) => ['get', `/api/datasets/${id}`]],
    ['GET dataset fit', 'consultant', (id) => ['get', `/api/datasets/${id}/fit`]],
    ['PUT dataset mapping', 'consultant', (id) => ['put', `/api/datasets/${id}/mapping`, EVENT_MAPPING]],
    ['POST dataset assumptions', 'consultant', (id) => ['post', `/api/datasets/${id}/assumptions`, { assumptions: [{ name: 'x', value: 1, unit: 'per_hour' }] }]],
    ['POST dataset staffing block', 'consultant', (id) => ['post', `/api/datasets/${id}/staffing-block`, { studyId: 1, serviceRate: 10 }]],
    ['DELETE dataset', 'consultant', (id) => ['delete', `/api/datasets/${id}`]],
    ['GET study revisions', 'consultant', (id) => ['get', `/api/studies/${id}/revisions`]],
    ['POST study revision', 'consultant', (id) => ['post', `/api/studies/${id}/revisions`]],
    ['GET revision pdf', 'consultant', (id) => ['get', `/api/revisions/${id}/pdf`]],
    ['POST revision release', 'partner', (id) => ['post', `/api/revisions/${id}/release`]],
    ['POST revision decision', 'partner', (id) => ['post', `/api/revisions/${id}/decision`, { decision: 'approve' }]],
    ['GET revision comments', 'partner', (id) => ['get', `/api/revisions/${id}/comments`]],
    ['POST revision comment', 'partner', (id) => ['post', `/api/revisions/${id}/comments`, { body: 'Intruder' }]],
    ['GET engagement datasets', 'consultant', (id) => ['get', `/api/engagements/${id}/datasets`]],
    ['GET engagement members', 'consultant', (id) => ['get', `/api/engagements/${id}/members`]],
  ];
  const theirIdFor = (name: string): number =>
    name.includes('dataset') && !name.includes('engagement')
      ? theirs.dataset
      : name.startsWith('GET engagement')
        ? theirs.engagement
        : name.includes('study')
          ? theirs.study
          : name.includes('pdf') || name.includes('release')
            ? theirs.released
            : theirs.inReview;

  it.each(routes)('%s answers 404 with the same body as a missing id', async (name, who, call) => {
    const a = who === 'partner' ? partner : consultant;
    const send = async (id: number) => {
      const [method, path, body] = call(id);
      const res = method === 'get' || method === 'delete' ? await a[method](path) : await a[method](path, body);
      return { status: res.status, body: res.body };
    };
    const forged = await send(theirIdFor(name));
    expect(forged.status).toBe(404);
    expect(forged).toEqual(await send(MISSING));
  });

  it('answers non-numeric and out-of-range ids like a missing id', async () => {
    const missing = await consultant.get(`/api/studies/${MISSING}`);
    for (const id of ['1%20OR%201%3D1', '-1', '0', '0x10', '1e3', '00042', '%D9%A3', '12345678901', '1.0', '%2e%2e']) {
      const res = await consultant.get(`/api/studies/${id}`);
      expect({ id, status: res.status, body: res.body }).toEqual({ id, status: 404, body: missing.body });
    }
  });

  it('compares my revision with theirs exactly as with a missing one', async () => {
    const forged = await partner.get(`/api/revisions/${mine.inReview}/compare/${theirs.inReview}`);
    const missing = await partner.get(`/api/revisions/${mine.inReview}/compare/${MISSING}`);
    expect(forged.status).toBe(404);
    expect(forged.body).toEqual(missing.body);
  });

  it('refuses their comment as the parent of a reply exactly as a missing one', async () => {
    const forged = await partner.post(`/api/revisions/${mine.inReview}/comments`, { parentId: theirs.comment, body: 'Reply' });
    const missing = await partner.post(`/api/revisions/${mine.inReview}/comments`, { parentId: MISSING, body: 'Reply' });
    expect(forged.status).toBe(400);
    expect(forged.body).toEqual(missing.body);
  });

  it('resolves a model block linked to their assumption exactly as one linked to a missing id, without their value', async () => {
    const save = async (assumption: number, title: string) => {
      const created = await consultant.post(`/api/engagements/${mine.engagement}/studies`, { title, templateKey: null });
      const res = await consultant.put(`/api/studies/${created.body.study.id}/document`, { baseVersion: 1, document: doc(deskBlock('linked', { arrivalRate: { assumption } })) });
      expect(res.status).toBe(200);
      return res.body.study.blocks.linked as { status: string; error: unknown; resolvedSpec: unknown; assumptionIds: number[] };
    };
    const forged = await save(theirs.assumption, 'Forged link');
    const missing = await save(MISSING, 'Missing link');
    expect(forged.status).toBe('error');
    expect(forged.assumptionIds).toEqual([]);
    expect({ error: forged.error, resolvedSpec: forged.resolvedSpec }).toEqual({ error: missing.error, resolvedSpec: missing.resolvedSpec });
    expect(JSON.stringify(forged)).not.toContain('Their arrivals');
  });

  it('refuses their member as an assumption owner exactly as a missing person', async () => {
    const body = (ownerId: number) => ({ name: `Owner probe ${ownerId}`, value: 1, unit: 'number', sourceKind: 'other', ownerId });
    const forged = await consultant.post(`/api/engagements/${mine.engagement}/assumptions`, body(theirs.memberId));
    const missing = await consultant.post(`/api/engagements/${mine.engagement}/assumptions`, body(MISSING));
    expect(forged.status).toBe(400);
    expect(forged.body).toEqual(missing.body);
  });

  it('refuses a staffing block from my dataset into their study exactly as into a missing study', async () => {
    const forged = await consultant.post(`/api/datasets/${mine.dataset}/staffing-block`, { studyId: theirs.study, serviceRate: 10 });
    const missing = await consultant.post(`/api/datasets/${mine.dataset}/staffing-block`, { studyId: MISSING, serviceRate: 10 });
    expect(forged.status).toBe(404);
    expect(forged.body).toEqual(missing.body);
  });

  it('lists no deliverables of theirs when their engagement id is asked for', async () => {
    const res = await consultant.get(`/api/deliverables?engagementId=${theirs.engagement}`);
    expect(res.status).toBe(200);
    expect(res.body.deliverables).toEqual([]);
  });
});

describe('cross-site requests', () => {
  let consultant: Agent;
  let admin: Agent;
  let engagementId = 0;
  let studyId = 0;
  let assumptionId = 0;

  beforeAll(async () => {
    const c = await makeUser(t.ctx, 'consultant');
    engagementId = await makeEngagement(t.ctx, [c.id], 'CSRF: ferry desk');
    consultant = await signedIn(t.app, c.email);
    admin = await signedIn(t.app, (await makeUser(t.ctx, 'admin')).email);
    studyId = (await savedStudy(consultant, engagementId, 'CSRF target')).id;
    assumptionId = (await consultant.post(`/api/engagements/${engagementId}/assumptions`, { name: 'CSRF arrivals', value: 10, unit: 'per_hour', sourceKind: 'client' })).body.assumption.id;
  });

  const state = async () => ({
    study: (await consultant.get(`/api/studies/${studyId}`)).body.study.version as number,
    assumptions: ((await consultant.get(`/api/engagements/${engagementId}/assumptions`)).body.assumptions as { id: number; value: number }[]).map((a) => [a.id, a.value]),
    engagement: (await admin.get(`/api/engagements/${engagementId}`)).body.engagement.description as string,
  });
  const newAssumption = { name: 'Forged', value: 99, unit: 'per_hour', sourceKind: 'client' };

  it.each([
    ['no header (a cross-site form or image)', {} as Record<string, string>],
    ['a wrong header value', { [CSRF_HEADER]: '0' }],
    ['the header and a foreign Origin', { [CSRF_HEADER]: CSRF_HEADER_VALUE, Origin: 'https://evil.example.test' }],
    ['the header and Origin "null" (sandboxed frame)', { [CSRF_HEADER]: CSRF_HEADER_VALUE, Origin: 'null' }],
    ['the header and a look-alike Origin', { [CSRF_HEADER]: CSRF_HEADER_VALUE, Origin: `${new URL(process.env.PUBLIC_URL ?? 'http://localhost:3000').origin}.evil.example.test` }],
  ])('refuses every write with %s: 403 csrf_failed, nothing changed', async (_what, headers) => {
    const before = await state();
    const answers = await Promise.all([
      consultant.raw.put(`/api/studies/${studyId}/document`).set(headers).send({ document: doc(), baseVersion: before.study }),
      consultant.raw.post(`/api/engagements/${engagementId}/assumptions`).set(headers).send(newAssumption),
      consultant.raw.patch(`/api/assumptions/${assumptionId}`).set(headers).send({ value: 1, version: 1 }),
      consultant.raw.delete(`/api/assumptions/${assumptionId}`).set(headers),
      admin.raw.patch(`/api/engagements/${engagementId}`).set(headers).send({ description: 'Forged' }),
    ]);
    for (const res of answers) {
      expect(res.status).toBe(403);
      expect(res.body.error.code).toBe('csrf_failed');
    }
    expect(await state()).toEqual(before);
  });

  it('refuses a form-encoded post (what a cross-site form sends)', async () => {
    const before = await state();
    const res = await consultant.raw.post(`/api/engagements/${engagementId}/assumptions`).type('form').send('name=Forged&value=99&unit=per_hour&sourceKind=client');
    expect(res.status).toBe(403);
    expect(await state()).toEqual(before);
  });

  it('keeps the person signed in when a cross-site page tries to sign them out', async () => {
    expect((await consultant.raw.post('/api/auth/sign-out').set('Origin', 'https://evil.example.test')).status).toBe(403);
    expect((await consultant.get('/api/auth/me')).status).toBe(200);
  });

  it('grants no CORS preflight, so a foreign script cannot add the header', async () => {
    const res = await consultant.raw
      .options(`/api/engagements/${engagementId}/assumptions`)
      .set('Origin', 'https://evil.example.test')
      .set('Access-Control-Request-Method', 'POST')
      .set('Access-Control-Request-Headers', CSRF_HEADER);
    expect(res.headers['access-control-allow-origin']).toBeUndefined();
    expect(res.headers['access-control-allow-headers']).toBeUndefined();
  });

  it('accepts the app’s own Origin with the header', async () => {
    const res = await consultant.raw
      .post(`/api/engagements/${engagementId}/assumptions`)
      .set(CSRF_HEADER, CSRF_HEADER_VALUE)
      .set('Origin', new URL(t.ctx.config.publicUrl).origin)
      .send({ ...newAssumption, name: 'Same-origin' });
    expect(res.status).toBe(201);
  });
});

const cookieOf = (res: { headers: Record<string, unknown> }): string | undefined =>
  ([] as string[]).concat((res.headers['set-cookie'] as string[] | undefined) ?? []).find((c) => c.startsWith(`${SESSION_COOKIE}=`))?.split(';')[0];
const meWith = (cookie: string) => agent(t.app).raw.get('/api/auth/me').set('Cookie', cookie);
const signInWith = (email: string, cookie: string, password = PASSWORD) =>
  agent(t.app).raw.post('/api/auth/sign-in').set(CSRF_HEADER, CSRF_HEADER_VALUE).set('Cookie', cookie).send({ email, password });

describe('session fixation', () => {
  it('does not sign in the session id an attacker planted (one of their own sessions)', async () => {
    const attacker = await makeUser(t.ctx, 'client');
    const victim = await makeUser(t.ctx, 'partner');
    const planted = cookieOf(await agent(t.app).post('/api/auth/sign-in', { email: attacker.email, password: PASSWORD }))!;
    expect((await meWith(planted)).body.user.email).toBe(attacker.email);

    const res = await signInWith(victim.email, planted);
    expect(res.status).toBe(200);
    const issued = cookieOf(res)!;
    expect(issued).toBeDefined();
    expect(issued).not.toBe(planted);
    expect((await meWith(issued)).body.user.email).toBe(victim.email);
    // The planted id is not elevated to the victim (it no longer signs anyone in).
    const replay = await meWith(planted);
    expect(replay.status).toBe(401);
  });

  it('ignores a forged or unsigned session id and issues its own', async () => {
    const victim = await makeUser(t.ctx, 'consultant');
    const forged = `${SESSION_COOKIE}=s%3Aattacker-chosen-id.forgedsignature`;
    const res = await signInWith(victim.email, forged);
    expect(res.status).toBe(200);
    const issued = cookieOf(res)!;
    expect(issued).not.toBe(forged);
    expect((await meWith(forged)).status).toBe(401);
    // The real id without its signature is refused too.
    const unsigned = `${SESSION_COOKIE}=${decodeURIComponent(issued.split('=')[1]!).replace(/^s:/, '').split('.')[0]}`;
    expect((await meWith(unsigned)).status).toBe(401);
    expect((await meWith(issued)).status).toBe(200);
  });

  it('ends the session for every copy of the cookie at sign-out', async () => {
    const u = await makeUser(t.ctx, 'consultant');
    const a = agent(t.app);
    const cookie = cookieOf(await a.post('/api/auth/sign-in', { email: u.email, password: PASSWORD }))!;
    expect((await a.post('/api/auth/sign-out')).status).toBe(204);
    expect((await meWith(cookie)).status).toBe(401);
  });
});

describe('password guessing', () => {
  const limited = (perAccount: number, perAddress: number, windowMs = 60_000) => startTestApp({ signInLimit: { windowMs, perAccount, perAddress } });

  it('counts one account whatever the case and spacing of the address, and ignores a forged X-Forwarded-For', async () => {
    const app = limited(3, 100);
    try {
      const u = await makeUser(app.ctx, 'consultant');
      const a = agent(app.app);
      const variants = [u.email.toUpperCase(), ` ${u.email} `, u.email];
      for (const [i, email] of variants.entries()) {
        const res = await a.raw.post('/api/auth/sign-in').set(CSRF_HEADER, CSRF_HEADER_VALUE).set('X-Forwarded-For', `203.0.113.${i + 1}`).send({ email, password: 'wrong-password-x' });
        expect(res.status).toBe(401);
      }
      const res = await a.raw.post('/api/auth/sign-in').set(CSRF_HEADER, CSRF_HEADER_VALUE).set('X-Forwarded-For', '198.51.100.7').send({ email: u.email, password: PASSWORD });
      expect(res.status).toBe(429);
      expect(res.body.error.message).toMatch(/Too many sign-in attempts/);
      expect(res.body.error.message).not.toMatch(/account|exist/i);
    } finally {
      await app.close();
    }
  });

  it('answers an unknown address exactly like a known one, before and after the lockout', async () => {
    const app = limited(2, 100);
    try {
      const u = await makeUser(app.ctx, 'partner');
      const a = agent(app.app);
      const attempts = async (email: string) => {
        const out = [];
        for (let i = 0; i < 3; i++) {
          const r = await a.post('/api/auth/sign-in', { email, password: 'wrong-password-y' });
          out.push({ status: r.status, body: r.body });
        }
        return out;
      };
      expect(await attempts(u.email)).toEqual(await attempts(`nobody-${Date.now()}@example.test`));
    } finally {
      await app.close();
    }
  });

  it('limits one address spraying many accounts', async () => {
    const app = limited(100, 4);
    try {
      const a = agent(app.app);
      const answers = [];
      for (let i = 0; i < 6; i++) answers.push((await a.post('/api/auth/sign-in', { email: `spray-${i}-${Date.now()}@example.test`, password: 'guess-1234' })).status);
      expect(answers).toEqual([401, 401, 401, 401, 429, 429]);
    } finally {
      await app.close();
    }
  });

  it('lets the right password in again once the window has passed', async () => {
    const app = limited(2, 100, 1_000);
    try {
      const u = await makeUser(app.ctx, 'client');
      const a = agent(app.app);
      for (let i = 0; i < 2; i++) await a.post('/api/auth/sign-in', { email: u.email, password: 'wrong-password-z' });
      expect((await a.post('/api/auth/sign-in', { email: u.email, password: PASSWORD })).status).toBe(429);
      await new Promise((r) => setTimeout(r, 1_200));
      expect((await a.post('/api/auth/sign-in', { email: u.email, password: PASSWORD })).status).toBe(200);
    } finally {
      await app.close();
    }
  });
});
