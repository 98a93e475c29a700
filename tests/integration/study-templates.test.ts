/**
 * Creating a study from a template, with a small fixture template (the real ones live in
 * templates/): its assumptions join the register, same-named ones are reused, links become ids.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { studyTemplateSchema } from '../../shared/schemas/studies';
import { createStudy } from '../../api/routes/studies/create-study';
import { loadEngagementFor } from '../../api/routes/engagements/engagement-access';
import { makeEngagement, makeUser, signedIn, startTestApp, type Agent, type TestApp } from './support/test-app';
import { deskBlock, doc, heading } from './support/study-fixtures';

const fixture = studyTemplateSchema.parse({
  key: 'fixture-desk',
  title: 'Fixture: one desk',
  description: 'A desk with two assumptions.',
  assumptions: [
    { key: 'visitors', name: 'Visitors at peak', value: 40, unit: 'per_hour', sourceKind: 'client' },
    { key: 'visit', name: 'Time per visit', value: 5, unit: 'minutes', sourceKind: 'judgement' },
  ],
  document: doc(heading('The desk'), deskBlock('fixture-desk-1', { arrivalRate: { assumption: 'visitors' }, serviceRate: { assumption: 'visit' }, servers: 5 })),
});

let t: TestApp;
let consultant: Agent;
let user: { id: number; email: string; role: 'consultant' };
let engagementId = 0;

beforeAll(async () => {
  t = startTestApp();
  user = (await makeUser(t.ctx, 'consultant')) as typeof user;
  engagementId = await makeEngagement(t.ctx, [user.id], 'Templates: museum ticket desk');
  consultant = await signedIn(t.app, user.email);
});
afterAll(() => t.close());

describe('creating a study from a template', () => {
  it('adds the template assumptions, reuses an existing one by name, and links blocks to their ids', async () => {
    const existing = await consultant.post(`/api/engagements/${engagementId}/assumptions`, { name: 'Time per visit', value: 6, unit: 'minutes', sourceKind: 'dataset' });
    const sessionUser = { id: user.id, email: user.email, name: 'Test consultant', role: user.role };
    const engagement = await loadEngagementFor(t.ctx.db, sessionUser, engagementId);
    const study = await createStudy(t.ctx, engagement, { title: 'From the fixture', templateKey: 'fixture-desk' }, sessionUser, undefined, Promise.resolve([fixture]));

    expect(study).toMatchObject({ templateKey: 'fixture-desk', version: 1, status: 'draft' });
    const register = (await consultant.get(`/api/engagements/${engagementId}/assumptions`)).body.assumptions as { id: number; name: string; value: number; usageCount: number }[];
    expect(register.map((a) => a.name).sort()).toEqual(['Time per visit', 'Visitors at peak']);
    const visitors = register.find((a) => a.name === 'Visitors at peak')!;
    expect(register.find((a) => a.name === 'Time per visit')).toMatchObject({ id: existing.body.assumption.id, value: 6, usageCount: 1 });

    const block = study.blocks['fixture-desk-1'];
    expect(block.assumptionIds.sort((a, b) => a - b)).toEqual([visitors.id, existing.body.assumption.id].sort((a, b) => a - b));
    // 6 minutes per visit (the existing assumption wins) = 10 per hour.
    expect(block.resolvedSpec).toMatchObject({ arrivalRate: 40, serviceRate: 10, servers: 5 });
    expect(JSON.stringify(study.document)).toContain(`"assumption":${visitors.id}`);
  });
});

describe('GET /api/templates and creating from each of them', () => {
  it('lists the templates of templates/ and makes a study from each whose blocks all compute', async () => {
    const list = await consultant.get('/api/templates');
    expect(list.status).toBe(200);
    const templates = list.body.templates as { key: string; blockCount: number; assumptionCount: number }[];
    expect(templates.length).toBeGreaterThan(0);
    const engagement = await makeEngagement(t.ctx, [user.id], 'Templates: every template');
    for (const tpl of templates) {
      const res = await consultant.post(`/api/engagements/${engagement}/studies`, { title: `From ${tpl.key}`, templateKey: tpl.key });
      expect(res.status).toBe(201);
      const blocks = Object.values(res.body.study.blocks as Record<string, { status: string; error: unknown }>);
      expect(blocks).toHaveLength(tpl.blockCount);
      expect(blocks.filter((b) => b.status !== 'ok')).toEqual([]);
    }
    const register = (await consultant.get(`/api/engagements/${engagement}/assumptions`)).body.assumptions as unknown[];
    expect(register.length).toBeGreaterThan(0);
  });
});
