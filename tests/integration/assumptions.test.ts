/** The assumption register: links, unit conversion, propagation of changes, refusal to delete. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeEngagement, makeUser, signedIn, startTestApp, type Agent, type TestApp } from './support/test-app';
import { deskBlock, doc, paragraph } from './support/study-fixtures';

let t: TestApp;
let consultant: Agent;
let engagementId = 0;

beforeAll(async () => {
  t = startTestApp();
  const c = await makeUser(t.ctx, 'consultant');
  engagementId = await makeEngagement(t.ctx, [c.id], 'Assumptions: bicycle repair shop');
  consultant = await signedIn(t.app, c.email);
});
afterAll(() => t.close());

let counter = 0;
async function assumption(body: Record<string, unknown>): Promise<{ id: number; version: number }> {
  const res = await consultant.post(`/api/engagements/${engagementId}/assumptions`, { name: `Assumption ${++counter}`, sourceKind: 'client', ...body });
  expect(res.status).toBe(201);
  return res.body.assumption;
}

async function studyWith(title: string, content: unknown[]): Promise<{ id: number; body: Record<string, unknown> }> {
  const created = await consultant.post(`/api/engagements/${engagementId}/studies`, { title, templateKey: null });
  const saved = await consultant.put(`/api/studies/${created.body.study.id}/document`, { baseVersion: 1, document: doc(...content) });
  expect(saved.status).toBe(200);
  return { id: created.body.study.id, body: saved.body.study };
}

describe('assumption links in model blocks', () => {
  it('converts the assumption into the block unit, a duration feeding a rate by its reciprocal', async () => {
    const arrivals = await assumption({ value: 0.5, unit: 'per_minute' });
    const repair = await assumption({ value: 15, unit: 'minutes' });
    const { body } = await studyWith('Workshop', [deskBlock('bench-1', { arrivalRate: { assumption: arrivals.id }, serviceRate: { assumption: repair.id }, servers: 10 })]);
    const block = (body.blocks as Record<string, { resolvedSpec: Record<string, number>; assumptionIds: number[] }>)['bench-1'];
    // 0.5 per minute = 30 per hour; 15 minutes per repair = 4 per hour (unit arithmetic).
    expect(block.resolvedSpec).toMatchObject({ arrivalRate: 30, serviceRate: 4 });
    expect(block.assumptionIds).toEqual([arrivals.id, repair.id].sort((a, b) => a - b));
  });

  it('gives the block an error naming the input when the dimension cannot fit, and still saves', async () => {
    const cost = await assumption({ value: 40, unit: 'currency_per_hour' });
    const { body } = await studyWith('Wrong unit', [deskBlock('bench-2', { arrivalRate: { assumption: cost.id } })]);
    const block = (body.blocks as Record<string, { status: string; error: { message: string; issues: { path: string }[] } }>)['bench-2'];
    expect(block.status).toBe('error');
    expect(block.error.issues[0].path).toBe('arrivalRate');
    expect(block.error.message).toMatch(/Arrival rate/);
  });
});

describe('PATCH /api/assumptions/:id', () => {
  it('recomputes every block using it in draft studies and lists the numbers that moved', async () => {
    const arrivals = await assumption({ value: 30, unit: 'per_hour' });
    const a = await studyWith('Shop A', [deskBlock('shop-a', { arrivalRate: { assumption: arrivals.id } }), deskBlock('shop-a-fixed')]);
    const b = await studyWith('Shop B', [deskBlock('shop-b', { arrivalRate: { assumption: arrivals.id }, servers: 4 })]);
    const list = await consultant.get(`/api/engagements/${engagementId}/assumptions`);
    expect(list.body.assumptions.find((x: { id: number }) => x.id === arrivals.id).usageCount).toBe(2);

    const res = await consultant.patch(`/api/assumptions/${arrivals.id}`, { value: 24, version: arrivals.version });
    expect(res.status).toBe(200);
    expect(res.body.assumption).toMatchObject({ value: 24, version: arrivals.version + 1, usageCount: 2 });
    const moved = res.body.moved as { studyId: number; blockId: string; measure: string; before: number; after: number; studyTitle: string; blockTitle: string }[];
    expect(new Set(moved.map((m) => m.blockId))).toEqual(new Set(['shop-a', 'shop-b']));
    // ρ = λ/(cμ): 30/36 → 24/36 with c = 3, μ = 12 (definition; from memory).
    const rho = moved.find((m) => m.blockId === 'shop-a' && m.measure === 'rho')!;
    expect(rho).toMatchObject({ studyId: a.id, studyTitle: 'Shop A', blockTitle: 'Front desk at peak' });
    expect(rho.before).toBeCloseTo(30 / 36, 12);
    expect(rho.after).toBeCloseTo(24 / 36, 12);

    const reread = await consultant.get(`/api/studies/${b.id}`);
    expect(reread.body.study.blocks['shop-b'].resolvedSpec.arrivalRate).toBe(24);
    // The document did not change, so its version did not either.
    expect(reread.body.study.version).toBe(2);
  });

  it('answers a stale edit with 409 and the current version', async () => {
    const x = await assumption({ value: 1, unit: 'number' });
    expect((await consultant.patch(`/api/assumptions/${x.id}`, { notes: 'checked', version: x.version })).status).toBe(200);
    const stale = await consultant.patch(`/api/assumptions/${x.id}`, { value: 2, version: x.version });
    expect(stale.status).toBe(409);
    expect(stale.body.error.issues).toEqual([{ path: 'version', message: `The assumption is now at version ${x.version + 1}` }]);
  });

  it('reports invalid fields by path and refuses a duplicate name', async () => {
    const x = await assumption({ value: 1, unit: 'number', name: 'Spare parts per repair' });
    const bad = await consultant.patch(`/api/assumptions/${x.id}`, { value: 'lots', unit: 'per_week' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(['unit', 'value', 'version']);
    const dup = await consultant.post(`/api/engagements/${engagementId}/assumptions`, { name: 'Spare parts per repair', value: 2, unit: 'number', sourceKind: 'judgement' });
    expect(dup.status).toBe(409);
    expect(dup.body.error.issues[0].path).toBe('name');
  });
});

describe('DELETE /api/assumptions/:id', () => {
  it('refuses while a block uses it, naming the study and the block, and deletes once unlinked', async () => {
    const x = await assumption({ value: 20, unit: 'per_hour' });
    const s = await studyWith('Weekend shop', [paragraph('Saturday'), deskBlock('weekend', { arrivalRate: { assumption: x.id } })]);
    const refused = await consultant.delete(`/api/assumptions/${x.id}`);
    expect(refused.status).toBe(409);
    expect(refused.body.error.code).toBe('conflict');
    expect(refused.body.error.issues).toEqual([{ path: 'usedBy.0', message: 'Weekend shop — Front desk at peak' }]);

    expect((await consultant.put(`/api/studies/${s.id}/document`, { baseVersion: 2, document: doc(deskBlock('weekend')) })).status).toBe(200);
    expect((await consultant.delete(`/api/assumptions/${x.id}`)).status).toBe(204);
    const list = await consultant.get(`/api/engagements/${engagementId}/assumptions`);
    expect(list.body.assumptions.some((a: { id: number }) => a.id === x.id)).toBe(false);
  });
});
