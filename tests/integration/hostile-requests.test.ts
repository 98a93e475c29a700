/**
 * Hostile request bodies and queries: oversized JSON, absurd nesting, prototype keys, and SQL
 * metacharacters in text fields and in the one free-text filter (the audit search). The 413 of a
 * study document over DOCUMENT_MAX_CHARS is in studies.test.ts; uploads in hostile-upload.test.ts.
 */
import { sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CSRF_HEADER, CSRF_HEADER_VALUE } from '../../shared/api-error';
import { SQL_PAYLOADS } from './support/hostile-payloads';
import { makeEngagement, makeUser, signedIn, startTestApp, type Agent, type TestApp } from './support/test-app';
import { doc, paragraph } from './support/study-fixtures';

let t: TestApp;
let admin: Agent;
let consultant: Agent;
let engagementId = 0;

beforeAll(async () => {
  t = startTestApp();
  admin = await signedIn(t.app, (await makeUser(t.ctx, 'admin')).email);
  const c = await makeUser(t.ctx, 'consultant');
  engagementId = await makeEngagement(t.ctx, [c.id], 'Hostile requests: ferry terminal');
  consultant = await signedIn(t.app, c.email);
});
afterAll(() => t.close());

const assumptionCount = async () => (await consultant.get(`/api/engagements/${engagementId}/assumptions`)).body.assumptions.length as number;

describe('oversized bodies', () => {
  it('answers 413 with the one error body naming the limit on an ordinary JSON route, storing nothing', async () => {
    const before = await assumptionCount();
    const res = await consultant.post(`/api/engagements/${engagementId}/assumptions`, { name: 'Huge', value: 1, unit: 'number', sourceKind: 'other', notes: 'x'.repeat(3 * 1024 * 1024) });
    expect(res.status).toBe(413);
    expect(res.headers['content-type']).toMatch(/application\/json/);
    expect(res.body).toEqual({ error: { code: 'payload_too_large', message: 'The request body is too large (at most 2 MB here).' } });
    expect(await assumptionCount()).toBe(before);
  });

  it('answers 413 before anything else, also to a sign-in attempt', async () => {
    const res = await consultant.post('/api/auth/sign-in', { email: 'someone@example.test', password: 'p'.repeat(3 * 1024 * 1024) });
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('payload_too_large');
  });

  it('answers 413 on a study save above the document route’s 8 MB, leaving the study as it was', async () => {
    const created = await consultant.post(`/api/engagements/${engagementId}/studies`, { title: 'Oversized save', templateKey: null });
    const id = created.body.study.id as number;
    const res = await consultant.put(`/api/studies/${id}/document`, { baseVersion: 1, document: doc(...Array.from({ length: 90 }, () => paragraph('y'.repeat(100_000)))) });
    expect(res.status).toBe(413);
    expect(res.body.error).toEqual({ code: 'payload_too_large', message: 'The request body is too large (at most 8 MB here).' });
    expect((await consultant.get(`/api/studies/${id}`)).body.study.version).toBe(1);
  });

  it('refuses a text field over its limit with 400 naming the field (not a truncated save)', async () => {
    const res = await consultant.post(`/api/engagements/${engagementId}/assumptions`, { name: 'n'.repeat(121), value: 1, unit: 'number', sourceKind: 'other', notes: 'z'.repeat(501) });
    expect(res.status).toBe(400);
    expect(res.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(['name', 'notes']);
  });

  it.each([
    [100, /nested more than 40 levels deep/],
    // Deep enough that serialising it again would overflow the stack (it was a 500 before).
    [5_000, /nested too deeply/],
  ])('refuses a document nested %i levels deep with 400 naming where, not a crash', async (depth, message) => {
    const created = await consultant.post(`/api/engagements/${engagementId}/studies`, { title: `Deep nesting ${depth}`, templateKey: null });
    // Written as text: a JSON serialiser on this side would itself run out of stack.
    const body = `{"baseVersion":1,"document":{"type":"doc","content":[${'{"type":"blockquote","content":['.repeat(depth)}{"type":"paragraph"}${']}'.repeat(depth)}]}}`;
    const res = await consultant.raw.put(`/api/studies/${created.body.study.id}/document`).set(CSRF_HEADER, CSRF_HEADER_VALUE).set('Content-Type', 'application/json').send(body);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(res.body.error.issues[0]).toEqual({ path: expect.stringMatching(/^document/), message: expect.stringMatching(message) });
    expect((await consultant.get(`/api/studies/${created.body.study.id}`)).body.study.version).toBe(1);
  });

  it('is not polluted by __proto__ and constructor keys in a body', async () => {
    const body = JSON.parse('{"name":"Proto probe","value":1,"unit":"number","sourceKind":"other","__proto__":{"polluted":"yes","isAdmin":true},"constructor":{"prototype":{"polluted":"yes"}}}');
    const res = await consultant.post(`/api/engagements/${engagementId}/assumptions`, body);
    expect(res.status).toBe(201);
    expect(res.body.assumption).not.toHaveProperty('polluted');
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
    expect((await consultant.get('/api/auth/me')).body.user.role).toBe('consultant');
  });
});

describe('SQL metacharacters', () => {
  it.each(SQL_PAYLOADS.map((p) => [p]))('stores %s verbatim in text fields and reads it back', async (p) => {
    const e = await admin.post('/api/engagements', { name: p, clientName: p, description: p });
    expect(e.status).toBe(201);
    expect((await admin.get(`/api/engagements/${e.body.engagement.id}`)).body.engagement).toMatchObject({ name: p, clientName: p, description: p });
    const a = await consultant.post(`/api/engagements/${engagementId}/assumptions`, { name: `A ${p}`, value: 1, unit: 'number', sourceKind: 'other', sourceDetail: p, notes: p });
    expect(a.status).toBe(201);
    expect(a.body.assumption).toMatchObject({ name: `A ${p}`, sourceDetail: p, notes: p });
    const s = await consultant.post(`/api/engagements/${engagementId}/studies`, { title: p, templateKey: null });
    expect(s.body.study.title).toBe(p);
    const saved = await consultant.put(`/api/studies/${s.body.study.id}/document`, { baseVersion: 1, document: doc(paragraph(p)) });
    expect(saved.body.study.document.content[0].content[0].text).toBe(p);
  });

  it('leaves every table in place', async () => {
    const [rows] = (await t.ctx.db.execute(sql`select count(*) as n from studies`)) as unknown as [{ n: number }[]];
    expect(Number(rows[0]!.n)).toBeGreaterThan(0);
    expect((await consultant.get(`/api/engagements/${engagementId}/studies`)).status).toBe(200);
  });

  describe('the audit search treats them literally', () => {
    const stamp = Date.now().toString(36);
    // Pairs: the first name holds the metacharacter; the second is what it would match as a wildcard.
    const names = {
      percent: [`Quay ${stamp} 100% load`, `Quay ${stamp} 1000 load`],
      underscore: [`Quay ${stamp} desk_a`, `Quay ${stamp} deskXa`],
      backslash: [`Quay ${stamp} back\\slash`, `Quay ${stamp} backslash`],
      quote: [`Quay ${stamp} O'Brien's berth`, `Quay ${stamp} OBriens berth`],
      drop: [`Quay ${stamp} x'; DROP TABLE audit_entries; --`, `Quay ${stamp} x DROP TABLE audit_entries`],
    };
    const search = async (q: string) =>
      ((await admin.get(`/api/audit?action=engagement_created&q=${encodeURIComponent(q)}`)).body.entries as { subject: string }[]).map((e) => e.subject).sort();

    beforeAll(async () => {
      for (const [first, second] of Object.values(names)) {
        expect((await admin.post('/api/engagements', { name: first, clientName: 'Quay client' })).status).toBe(201);
        expect((await admin.post('/api/engagements', { name: second, clientName: 'Quay client' })).status).toBe(201);
      }
    });

    it.each([
      ['%', `${stamp} 100%`, 'percent'],
      ['_', `${stamp} desk_a`, 'underscore'],
      ['\\', `${stamp} back\\slash`, 'backslash'],
      ["'", `${stamp} O'Brien`, 'quote'],
      ["'; DROP TABLE", `${stamp} x'; DROP TABLE audit_entries; --`, 'drop'],
    ] as const)('%s finds only the entry that holds it', async (_c, q, key) => {
      expect(await search(q)).toEqual([names[key][0]]);
    });

    it('a lone wildcard or quote is a literal character, not "everything" or a syntax error', async () => {
      const res = await admin.get(`/api/audit?q=${encodeURIComponent(`${stamp}%_'\\"`)}`);
      expect(res.status).toBe(200);
      expect(res.body.entries).toEqual([]);
      expect(await search(stamp)).toHaveLength(10);
    });

    it('refuses metacharacters in numeric and closed filters with 400 naming the parameter', async () => {
      for (const [param, value] of [
        ['limit', '1; DROP TABLE users'],
        ['actorId', "1' OR '1'='1"],
        ['engagementId', '1 OR 1=1'],
        ['action', "sign_in' OR 1=1 --"],
        ['from', "2026-01-01' --"],
      ]) {
        const res = await admin.get(`/api/audit?${param}=${encodeURIComponent(value!)}`);
        expect(res.status, param).toBe(400);
        expect(res.body.error.issues[0].path, param).toBe(param);
      }
      // The deliverables filter ignores anything that is not an id (clients see only their own anyway).
      expect((await consultant.get(`/api/deliverables?engagementId=${encodeURIComponent('1 OR 1=1')}`)).status).toBe(200);
    });
  });
});
