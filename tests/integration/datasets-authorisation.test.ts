/** Who may do what with datasets: members who are partners or consultants write, admins read, clients never, others 404. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeEngagement, makeUser, signedIn, startTestApp, type Agent, type TestApp } from './support/test-app';
import { EVENT_MAPPING, upload, waitForFit } from './datasets-helpers';

let t: TestApp;
const as: Record<string, Agent> = {};
let engagementId = 0;
let datasetId = 0;
const CSV = 'arrived_at,service_start,service_end,channel\n' + Array.from({ length: 40 }, (_, i) => `2026-01-05T09:${String(i).padStart(2, '0')}:00Z,2026-01-05T09:${String(i).padStart(2, '0')}:10Z,2026-01-05T09:${String(i + 3).padStart(2, '0')}:00Z,desk\n`).join('');

beforeAll(async () => {
  t = startTestApp();
  const users = {
    partner: await makeUser(t.ctx, 'partner'),
    consultant: await makeUser(t.ctx, 'consultant'),
    outsider: await makeUser(t.ctx, 'consultant'),
    client: await makeUser(t.ctx, 'client'),
    admin: await makeUser(t.ctx, 'admin'),
  };
  engagementId = await makeEngagement(t.ctx, [users.partner.id, users.consultant.id, users.client.id], 'Datasets: harbour ferry');
  for (const [k, u] of Object.entries(users)) as[k] = await signedIn(t.app, u.email);
  const res = await upload(as.consultant, engagementId, CSV);
  datasetId = res.body.dataset.id;
  await as.consultant.put(`/api/datasets/${datasetId}/mapping`, EVENT_MAPPING);
  await waitForFit(as.consultant, datasetId);
});
afterAll(() => t.close());

describe('datasets authorisation', () => {
  it.each([
    ['partner', 201],
    ['consultant', 201],
    ['admin', 403],
    ['client', 403],
    ['outsider', 404],
  ])('POST /api/engagements/:id/datasets as %s answers %i', async (who, status) => {
    const res = await upload(as[who], engagementId, CSV);
    expect(res.status).toBe(status);
  });

  it.each([
    ['partner', 200],
    ['consultant', 200],
    ['admin', 200],
    ['client', 403],
    ['outsider', 404],
  ])('reading (list, dataset, fit) as %s answers %i', async (who, status) => {
    expect((await as[who].get(`/api/engagements/${engagementId}/datasets`)).status).toBe(status);
    expect((await as[who].get(`/api/datasets/${datasetId}`)).status).toBe(status);
    expect((await as[who].get(`/api/datasets/${datasetId}/fit`)).status).toBe(status);
  });

  it.each([
    ['admin', 403],
    ['client', 403],
    ['outsider', 404],
  ])('writing (mapping, assumptions, staffing block) as %s answers %i', async (who, status) => {
    expect((await as[who].put(`/api/datasets/${datasetId}/mapping`, EVENT_MAPPING)).status).toBe(status);
    expect((await as[who].post(`/api/datasets/${datasetId}/assumptions`, { assumptions: [{ name: 'x', value: 1, unit: 'per_hour' }] })).status).toBe(status);
    expect((await as[who].post(`/api/datasets/${datasetId}/staffing-block`, { studyId: 1, serviceRate: 10 })).status).toBe(status);
  });

  it('answers 404 for a missing id and 403 to a client whether or not it exists', async () => {
    expect((await as.consultant.get('/api/datasets/999999999')).status).toBe(404);
    expect((await as.client.get('/api/datasets/999999999')).status).toBe(403);
  });

  it('refuses a staffing block into a study the user cannot see with 404', async () => {
    const res = await as.consultant.post(`/api/datasets/${datasetId}/staffing-block`, { studyId: 999999, serviceRate: 10 });
    expect(res.status).toBe(404);
  });
});
