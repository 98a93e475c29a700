/** Studies: create, read, save with recompute, stale saves, sanitising and validation paths. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeEngagement, makeUser, signedIn, startTestApp, type Agent, type TestApp } from './support/test-app';
import { deskBlock, doc, heading, paragraph } from './support/study-fixtures';

let t: TestApp;
let consultant: Agent;
let engagementId = 0;

beforeAll(async () => {
  t = startTestApp();
  const c = await makeUser(t.ctx, 'consultant');
  engagementId = await makeEngagement(t.ctx, [c.id], 'Studies: harbour ferry desk');
  consultant = await signedIn(t.app, c.email);
});
afterAll(() => t.close());

async function newStudy(title = 'Ferry desk capacity'): Promise<{ id: number; version: number }> {
  const res = await consultant.post(`/api/engagements/${engagementId}/studies`, { title, templateKey: null });
  expect(res.status).toBe(201);
  return res.body.study;
}

describe('POST /api/engagements/:id/studies', () => {
  it('creates a blank draft study at version 1 that the list shows with its author', async () => {
    const study = await newStudy('Blank start');
    expect(study).toMatchObject({ title: 'Blank start', status: 'draft', version: 1, templateKey: null, blocks: {} });
    const list = await consultant.get(`/api/engagements/${engagementId}/studies`);
    expect(list.body.studies.find((s: { id: number }) => s.id === study.id)).toMatchObject({ title: 'Blank start', authorName: 'Test consultant' });
  });

  it('refuses an unknown template key at its path', async () => {
    const res = await consultant.post(`/api/engagements/${engagementId}/studies`, { title: 'X', templateKey: 'no-such-template' });
    expect(res.status).toBe(400);
    expect(res.body.error.issues).toEqual([{ path: 'templateKey', message: 'Unknown template' }]);
  });
});

describe('PUT /api/studies/:id/document', () => {
  it('stores the document, recomputes every block and returns the results with the engine version', async () => {
    const study = await newStudy();
    const res = await consultant.put(`/api/studies/${study.id}/document`, {
      document: doc(heading('Peak hour', 'sect-peak'), deskBlock('desk-peak'), deskBlock('desk-small', { servers: 2 })),
      baseVersion: 1,
      title: 'Ferry desk, peak hour',
    });
    expect(res.status).toBe(200);
    const s = res.body.study;
    expect(s).toMatchObject({ version: 2, title: 'Ferry desk, peak hour' });
    // M/M/c with λ = 30, μ = 12, c = 3: offered load 2.5 erlangs, ρ = 5/6 (definition; from memory).
    expect(s.blocks['desk-peak']).toMatchObject({ status: 'ok', engineVersion: expect.any(String), result: { offeredLoad: 2.5 } });
    expect(s.blocks['desk-peak'].result.rho).toBeCloseTo(5 / 6, 12);
    // c = 2 < 2.5 erlangs is unstable: the save succeeds and the block carries the error.
    expect(s.blocks['desk-small']).toMatchObject({ status: 'error', result: null, error: { code: 'unstable' } });

    const again = await consultant.get(`/api/studies/${study.id}`);
    expect(again.body.study.blocks).toEqual(s.blocks);
    expect(again.body.study.document).toEqual(s.document);
  });

  it('answers a stale save with 409 and the current version, writing nothing', async () => {
    const study = await newStudy();
    expect((await consultant.put(`/api/studies/${study.id}/document`, { document: doc(paragraph('first')), baseVersion: 1 })).status).toBe(200);
    const stale = await consultant.put(`/api/studies/${study.id}/document`, { document: doc(paragraph('second')), baseVersion: 1 });
    expect(stale.status).toBe(409);
    expect(stale.body).toEqual({
      error: { code: 'conflict', message: expect.any(String), issues: [{ path: 'baseVersion', message: 'The study is now at version 2' }] },
    });
    const now = await consultant.get(`/api/studies/${study.id}`);
    expect(JSON.stringify(now.body.study.document)).toContain('first');
  });

  it('drops scripts, javascript: links, unknown attributes and unknown nodes', async () => {
    const study = await newStudy();
    const res = await consultant.put(`/api/studies/${study.id}/document`, {
      baseVersion: 1,
      document: doc(
        { type: 'paragraph', attrs: { onclick: 'alert(1)' }, content: [{ type: 'text', text: 'Queue<script>alert(1)</script> at the ferry' }] },
        paragraph('click', [{ type: 'link', attrs: { href: 'javascript:alert(document.cookie)', onmouseover: 'x' } }]),
        { type: 'iframe', attrs: { src: 'https://example.test' } },
        { type: 'htmlBlock', content: [{ type: 'text', text: '<img src=x onerror=alert(1)>' }] },
        { ...deskBlock('desk-xss'), attrs: { ...deskBlock('desk-xss').attrs, onload: 'alert(1)' } },
      ),
    });
    expect(res.status).toBe(200);
    const stored = JSON.stringify((await consultant.get(`/api/studies/${study.id}`)).body.study.document);
    for (const bad of ['<script', 'alert(1)', 'javascript:', 'onclick', 'onmouseover', 'onload', 'iframe', 'htmlBlock', 'onerror']) expect(stored).not.toContain(bad);
    expect(stored).toContain('Queue at the ferry');
    expect(stored).toContain('desk-xss');
  });

  it('replaces missing and duplicate block ids', async () => {
    const study = await newStudy();
    const res = await consultant.put(`/api/studies/${study.id}/document`, { baseVersion: 1, document: doc(deskBlock('same-id'), deskBlock('same-id'), deskBlock('')) });
    const ids = Object.keys(res.body.study.blocks);
    expect(ids).toHaveLength(3);
    expect(ids).toContain('same-id');
  });

  it('reports invalid block configs with the dotted path of each field', async () => {
    const study = await newStudy();
    const res = await consultant.put(`/api/studies/${study.id}/document`, {
      baseVersion: 1,
      document: doc(paragraph('intro'), paragraph('more'), paragraph('text'), deskBlock('desk-bad', { servers: 'three' }), deskBlock('desk-bad2', {}, { timeUnit: 'fortnight' })),
    });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(res.body.error.issues).toEqual(
      expect.arrayContaining([
        { path: 'document.content.3.attrs.config.spec.servers', message: expect.any(String) },
        { path: 'document.content.4.attrs.config.timeUnit', message: expect.any(String) },
      ]),
    );
  });

  it('reports request fields by name and refuses oversized documents with 413', async () => {
    const study = await newStudy();
    const missing = await consultant.put(`/api/studies/${study.id}/document`, { document: doc() });
    expect(missing.status).toBe(400);
    expect(missing.body.error.issues.map((i: { path: string }) => i.path)).toContain('baseVersion');
    const huge = await consultant.put(`/api/studies/${study.id}/document`, { baseVersion: 1, document: doc(paragraph('x'.repeat(2_100_000))) });
    expect(huge.status).toBe(413);
    expect(huge.body.error.code).toBe('payload_too_large');
  });
});

describe('POST /api/compute', () => {
  it('answers one spec with its result and an array with errors in place', async () => {
    const one = await consultant.post('/api/compute', { model: 'M/M/1', arrivalRate: 3, serviceRate: 4 });
    expect(one.status).toBe(200);
    // M/M/1: L = ρ/(1 − ρ) = 3 at ρ = 0.75 (textbook formula; from memory).
    expect(one.body.L).toBeCloseTo(3, 12);
    const many = await consultant.raw.post('/api/compute').set('x-sojourn-csrf', '1').send([{ model: 'M/M/1', arrivalRate: 3, serviceRate: 4 }, { model: 'M/M/1', arrivalRate: 5, serviceRate: 4 }, { model: 'nope' }]);
    expect(many.status).toBe(200);
    expect(many.body[0].rho).toBe(0.75);
    expect(many.body[1].error.code).toBe('unstable');
    expect(many.body[2].error.code).toBe('invalid_input');
  });

  it('answers a single invalid spec with the error body', async () => {
    const res = await consultant.post('/api/compute', { model: 'M/M/c', arrivalRate: 1, serviceRate: 1 });
    expect(res.status).toBe(422);
    expect(res.body.error.issues.map((i: { path: string }) => i.path)).toContain('servers');
  });
});
