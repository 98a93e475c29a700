/** POST /api/engagements/:id/datasets: streamed to object storage byte for byte; bad files leave nothing. */
import { createHash } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { datasets } from '../../api/db/schema/index';
import { eventLogCsv, DEMO_LOG_OPTIONS } from '../../fakes/demo-event-log';
import { makeEngagement, makeUser, signedIn, startTestApp, type Agent, type TestApp } from './support/test-app';
import { storedBytes, storedKeys, upload } from './datasets-helpers';

let t: TestApp;
let consultant: Agent;
let engagementId = 0;

beforeAll(async () => {
  t = startTestApp();
  const c = await makeUser(t.ctx, 'consultant');
  engagementId = await makeEngagement(t.ctx, [c.id], 'Datasets: ferry ticket office');
  consultant = await signedIn(t.app, c.email);
});
afterAll(() => t.close());

const rowsOf = async () => t.ctx.db.select().from(datasets).where(eq(datasets.engagementId, engagementId));

describe('POST /api/engagements/:id/datasets', () => {
  it('stores a small file byte for byte with its SHA-256, header and preview', async () => {
    const csv = 'arrived_at,service_start,service_end,channel\n2026-01-05T08:00:00Z,2026-01-05T08:01:00Z,2026-01-05T08:05:00Z,desk\n';
    const res = await upload(consultant, engagementId, csv, 'small.csv');
    expect(res.status).toBe(201);
    const d = res.body.dataset;
    expect(d).toMatchObject({ name: 'small.csv', byteSize: Buffer.byteLength(csv), status: 'uploaded', detectedDelimiter: 'comma', header: ['arrived_at', 'service_start', 'service_end', 'channel'] });
    expect(d.sha256).toBe(createHash('sha256').update(csv).digest('hex'));
    expect(d.preview).toHaveLength(1);
    const [row] = (await rowsOf()).filter((r) => r.id === d.id);
    expect((await storedBytes(t.ctx, row.objectKey)).equals(Buffer.from(csv))).toBe(true);
  });

  it('stores a multi-part file (over one 8 MB part) byte for byte', async () => {
    let csv = eventLogCsv({ ...DEMO_LOG_OPTIONS, days: 400, weekendFactor: 1 });
    while (Buffer.byteLength(csv) < 17 * 1024 * 1024) csv += csv.slice(csv.indexOf('\n') + 1);
    const res = await upload(consultant, engagementId, csv, 'big.csv');
    expect(res.status).toBe(201);
    const [row] = (await rowsOf()).filter((r) => r.id === res.body.dataset.id);
    const back = await storedBytes(t.ctx, row.objectKey);
    expect(back.length).toBe(Buffer.byteLength(csv));
    expect(createHash('sha256').update(back).digest('hex')).toBe(res.body.dataset.sha256);
    expect(res.body.dataset.sha256).toBe(createHash('sha256').update(csv).digest('hex'));
  });

  it.each([
    ['an empty file', '', /empty/],
    ['a file with a header only', 'arrived_at,channel\n', /no data rows/],
    ['a binary file', Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0, 0, 0, 0x0d]), Buffer.alloc(20_000, 7)]), /not a text file/],
    ['an absurdly long line', 'x'.repeat(300 * 1024), /longer than/],
    ['a large binary file (stopped while streaming)', Buffer.alloc(12 * 1024 * 1024, 0), /not a text file/],
  ])('refuses %s with a clear message and stores nothing', async (_what, body, message) => {
    const before = await storedKeys(t.ctx, engagementId);
    const rows = (await rowsOf()).length;
    const res = await upload(consultant, engagementId, body as Buffer | string);
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(message);
    expect(await storedKeys(t.ctx, engagementId)).toEqual(before);
    expect((await rowsOf()).length).toBe(rows);
  });

  it('refuses a request without a file', async () => {
    const res = await consultant.post(`/api/engagements/${engagementId}/datasets`, {});
    expect(res.status).toBe(400);
    expect(res.body.error.issues[0].path).toBe('file');
  });

  it('lists the engagement datasets newest first, without their fits', async () => {
    const res = await consultant.get(`/api/engagements/${engagementId}/datasets`);
    expect(res.status).toBe(200);
    expect(res.body.datasets.map((d: { name: string }) => d.name)).toEqual(['big.csv', 'small.csv']);
  });
});
