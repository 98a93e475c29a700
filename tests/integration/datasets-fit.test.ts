/** Mapping, the background fit, every bad-input kind (row and column named), and the ways into a study. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eventLogCsv, DEMO_LOG_OPTIONS } from '../../fakes/demo-event-log';
import { makeEngagement, makeUser, signedIn, startTestApp, type Agent, type TestApp } from './support/test-app';
import { EVENT_MAPPING, upload, waitForFit } from './datasets-helpers';
import { doc, modelBlock } from './support/study-fixtures';

let t: TestApp;
let consultant: Agent;
let engagementId = 0;

beforeAll(async () => {
  t = startTestApp();
  const c = await makeUser(t.ctx, 'consultant');
  engagementId = await makeEngagement(t.ctx, [c.id], 'Datasets: museum cloakroom');
  consultant = await signedIn(t.app, c.email);
});
afterAll(() => t.close());

async function uploaded(csv: string, name = 'log.csv'): Promise<number> {
  const res = await upload(consultant, engagementId, csv, name);
  expect(res.status).toBe(201);
  return res.body.dataset.id;
}

const H = 'arrived_at,service_start,service_end,channel\n';
const ok = (i: number) => `2026-01-05T08:${String(i).padStart(2, '0')}:00Z,2026-01-05T08:${String(i).padStart(2, '0')}:30Z,2026-01-05T08:${String(i + 2).padStart(2, '0')}:00Z,desk\n`;
const goodRows = (n: number) => Array.from({ length: n }, (_, i) => ok(i)).join('');
/** 30 readable rows, then `bad` as row 32, so the problem shows up in the fit, not the preview. */
const lateBad = (bad: string) => H + goodRows(30) + bad;

describe('PUT /api/datasets/:id/mapping and the fit', () => {
  let fittedId = 0;

  it('fits the demo log in the background: profile, peak, service time and verdict', async () => {
    fittedId = await uploaded(eventLogCsv(DEMO_LOG_OPTIONS), 'counter.csv');
    const put = await consultant.put(`/api/datasets/${fittedId}/mapping`, EVENT_MAPPING);
    expect(put.status).toBe(200);
    expect(['mapped', 'fitting', 'fitted']).toContain(put.body.dataset.status);
    const { status, fit } = await waitForFit(consultant, fittedId);
    expect(status).toBe('fitted');
    const f = fit as { demand: { peak: { start: string }; profile: { byHour: { ratePerHour: number }[] } }; service: { meanSeconds: number; goodnessOfFit: { rejected: boolean } }; suggestions: { key: string }[] };
    expect(f.demand.profile.byHour[3].ratePerHour).toBe(0);
    expect(f.demand.peak.start).toMatch(/T(10|11|12):00$/);
    // Lognormal service with mean 330 s and SCV 0.45 (the generator's settings): not exponential.
    expect(f.service.meanSeconds).toBeGreaterThan(300);
    expect(f.service.meanSeconds).toBeLessThan(360);
    expect(f.service.goodnessOfFit.rejected).toBe(true);
    expect(f.suggestions.map((s) => s.key)).toEqual(['arrival_rate_mean', 'arrival_rate_busiest_hour', 'service_time_mean', 'service_time_scv']);
    const d = await consultant.get(`/api/datasets/${fittedId}`);
    expect(d.body.dataset).toMatchObject({ status: 'fitted', progress: 1 });
  });

  it('refuses a mapping naming a column the file lacks, hinting at the delimiter', async () => {
    const id = await uploaded('arrived_at;service_start\n2026-01-05T08:00:00Z;2026-01-05T08:01:00Z\n');
    const res = await consultant.put(`/api/datasets/${id}/mapping`, { ...EVENT_MAPPING, delimiter: 'comma', serviceStartColumn: null, serviceEndColumn: null, channelColumn: 'channel' });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/no column "arrived_at".*semicolons, not commas/);
    expect(res.body.error.issues[0].path).toBe('timeColumn');
  });

  it.each([
    ['a duplicated column', 'arrived_at,arrived_at\n2026-01-05T08:00:00Z,x\n', { serviceStartColumn: null, serviceEndColumn: null, channelColumn: null }, /Row 1: the column name "arrived_at" appears twice/],
    ['an unparseable timestamp in the preview', H + 'yesterday,2026-01-05T08:01:00Z,2026-01-05T08:02:00Z,desk\n', {}, /Row 2, column "arrived_at": "yesterday" is not an ISO 8601/],
    ['an unknown time zone', H + goodRows(2), { timeZone: 'Mars/Olympus' }, /Unknown time zone/],
    ['the same column mapped twice', H + goodRows(2), { channelColumn: 'arrived_at' }, /already used/],
  ])('refuses %s with the row and column', async (_what, csv, patch, message) => {
    const id = await uploaded(csv);
    const res = await consultant.put(`/api/datasets/${id}/mapping`, { ...EVENT_MAPPING, ...patch });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(message);
  });

  it.each([
    ['an unparseable timestamp', lateBad('2026-02-30T08:00:00Z,2026-01-05T08:01:00Z,2026-01-05T08:02:00Z,desk\n'), 32, 'arrived_at', /not an ISO 8601/],
    ['an end before the start', lateBad('2026-01-05T09:00:00Z,2026-01-05T09:05:00Z,2026-01-05T09:01:00Z,desk\n'), 32, 'service_end', /ends before it starts/],
    ['a start before the arrival', lateBad('2026-01-05T09:00:00Z,2026-01-05T08:05:00Z,2026-01-05T09:01:00Z,desk\n'), 32, 'service_start', /starts before the arrival/],
    ['mixed time-zone offsets', lateBad('2026-01-05T09:00:00-05:00,2026-01-05T09:05:00-05:00,2026-01-05T09:08:00-05:00,desk\n').replace(/Z,/g, '+00:00,').replace(/Z\n/g, '+00:00\n'), 32, 'arrived_at', /mixes time zones/],
    ['a row with a missing field (wrong delimiter or quotes)', lateBad('2026-01-05T09:00:00Z;2026-01-05T09:05:00Z\n'), 32, null, /Row 32: .*Check the delimiter/],
    ['an absurdly long line further down', lateBad(`2026-01-05T09:00:00Z,${'y'.repeat(70_000)},x,desk\n`), 32, null, /longer than 65,536 characters/],
  ])('fails the fit on %s, naming row and column, and stores no fit', async (_what, csv, row, column, message) => {
    const id = await uploaded(csv);
    const put = await consultant.put(`/api/datasets/${id}/mapping`, EVENT_MAPPING);
    expect(put.status).toBe(200);
    const done = await waitForFit(consultant, id);
    expect(done.status).toBe('failed');
    expect(done.fit).toBeNull();
    expect(done.problem!.message).toMatch(message);
    expect(done.problem!.row).toBe(row);
    if (column) expect(done.problem!.column).toBe(column);
  });

  it('lets the user fix the mapping and retry after a failure', async () => {
    const csv = 'arrived_ms,channel\n' + Array.from({ length: 40 }, (_, i) => `${1767600000000 + i * 60_000},desk\n`).join('');
    const id = await uploaded(csv);
    const wrong = { ...EVENT_MAPPING, timeColumn: 'arrived_ms', serviceStartColumn: null, serviceEndColumn: null };
    expect((await consultant.put(`/api/datasets/${id}/mapping`, wrong)).status).toBe(400);
    const right = await consultant.put(`/api/datasets/${id}/mapping`, { ...wrong, timestampFormat: 'epoch_milliseconds', intervalMinutes: 15 });
    expect(right.status).toBe(200);
    const done = await waitForFit(consultant, id);
    expect(done.status).toBe('fitted');
    expect((done.fit as { demand: { totalArrivals: number } }).demand.totalArrivals).toBe(40);
  });

  it('turns chosen fitted values into assumptions whose source is the dataset', async () => {
    const res = await consultant.post(`/api/datasets/${fittedId}/assumptions`, {
      assumptions: [
        { name: 'Counter arrivals at peak', value: 33.5, unit: 'per_hour' },
        { name: 'Counter service time', value: 5.5, unit: 'minutes', notes: 'edited before saving' },
      ],
    });
    expect(res.status).toBe(201);
    expect(res.body.assumptions).toHaveLength(2);
    expect(res.body.assumptions[0]).toMatchObject({ sourceKind: 'dataset' });
    expect(res.body.assumptions[0].sourceDetail).toMatch(/counter\.csv/);
    const again = await consultant.post(`/api/datasets/${fittedId}/assumptions`, { assumptions: [{ name: 'Counter service time', value: 5, unit: 'minutes' }] });
    expect(again.status).toBe(409);
    expect(again.body.error.issues[0].path).toBe('assumptions.0.name');
  });

  it("carries the fit's cautions into the model blocks that link its values, where they bear on the model", async () => {
    const fitted = (await waitForFit(consultant, fittedId)).fit as { demand: { warnings: { code: string }[] }; service: { warnings: { code: string }[] } };
    expect(fitted.service.warnings.map((w) => w.code)).toContain('not_exponential');
    const made = await consultant.post(`/api/datasets/${fittedId}/assumptions`, {
      assumptions: [
        { key: 'service_time_mean', name: 'Cloakroom service time', value: 5.5, unit: 'minutes' },
        { key: 'arrival_rate_mean', name: 'Cloakroom arrivals, average', value: 20, unit: 'per_hour' },
      ],
    });
    expect(made.status).toBe(201);
    const byName = (name: string) => (made.body.assumptions as { id: number; name: string; version: number }[]).find((a) => a.name === name)!;
    const [service, arrivals] = [byName('Cloakroom service time'), byName('Cloakroom arrivals, average')];
    const study = await consultant.post(`/api/engagements/${engagementId}/studies`, { title: 'Cloakroom cautions', templateKey: null });
    const link = (id: number) => ({ assumption: id });
    const spec = { arrivalRate: link(arrivals.id), serviceRate: link(service.id) };
    const saved = await consultant.put(`/api/studies/${study.body.study.id}/document`, {
      baseVersion: study.body.study.version,
      document: doc(
        modelBlock('mmc-desk', { title: 'Desk', timeUnit: 'hour', spec: { model: 'M/M/c', servers: 3, ...spec } }),
        modelBlock('mg1-desk', { title: 'Desk, general service', timeUnit: 'hour', spec: { model: 'M/G/1', serviceScv: 0.45, ...spec, arrivalRate: 5 } }),
      ),
    });
    expect(saved.status).toBe(200);
    const codes = (blockId: string, body = saved.body) => (body.study.blocks[blockId].result.warnings as { code: string; message: string }[]).map((w) => w.code);
    // M/M/c takes service times to be exponential; the fit rejected that for this data.
    expect(codes('mmc-desk')).toContain('data_not_exponential');
    const caution = (saved.body.study.blocks['mmc-desk'].result.warnings as { code: string; message: string }[]).find((w) => w.code === 'data_not_exponential')!;
    expect(caution.message).toMatch(/^Service rate μ per server is linked to "Cloakroom service time", fitted from data: Service times are clearly not exponential/);
    // M/G/1 takes the SCV instead: no such caution.
    expect(codes('mg1-desk')).not.toContain('data_not_exponential');
    if (fitted.demand.warnings.some((w) => w.code === 'variable_demand')) expect(codes('mmc-desk')).toContain('data_variable_demand');

    // Once the value no longer names the dataset as its source, its cautions leave the blocks too.
    expect((await consultant.patch(`/api/assumptions/${service.id}`, { sourceKind: 'judgement', version: service.version })).status).toBe(200);
    const reread = await consultant.get(`/api/studies/${study.body.study.id}`);
    expect(codes('mmc-desk', reread.body)).not.toContain('data_not_exponential');
  });

  it('appends an interval-staffing block built from the profile to a draft study, linked to an assumption', async () => {
    const list = await consultant.get(`/api/engagements/${engagementId}/assumptions`);
    const service = list.body.assumptions.find((a: { name: string }) => a.name === 'Counter service time');
    const study = await consultant.post(`/api/engagements/${engagementId}/studies`, { title: 'Counter staffing', templateKey: null });
    const res = await consultant.post(`/api/datasets/${fittedId}/staffing-block`, { studyId: study.body.study.id, weekday: 1, serviceRate: { assumption: service.id }, criterion: 'serviceLevel', target: 0.9, t: 0.25 });
    expect(res.status).toBe(201);
    const s = await consultant.get(`/api/studies/${study.body.study.id}`);
    const block = s.body.study.blocks[res.body.blockId];
    expect(block.status).toBe('ok');
    expect(block.assumptionIds).toEqual([service.id]);
    // Opening hours 08:00–17:00 on Mondays: nine hourly rates.
    expect((block.resolvedSpec.arrivalRates as number[]).length).toBe(9);
    expect(block.resolvedSpec.serviceRate).toBeCloseTo(60 / 5.5, 6);
  });
});
