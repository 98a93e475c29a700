import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { compute } from '../../shared/queue/compute';
import type { ModelResult } from '../../shared/queue/result';
import type { SimulationJob } from '../../shared/queue/sim/from-spec-job';
import { makeUser, signedIn, startTestApp, type Agent, type TestApp } from './support/test-app';

// Simulation threads load TypeScript when first started (seconds on a busy machine), then each
// check runs for one to three seconds; hence the generous limits.
const SLOW = 90_000;

let t: TestApp;
let consultant: Agent;
let partner: Agent;
beforeAll(async () => {
  t = startTestApp();
  consultant = await signedIn(t.app, (await makeUser(t.ctx, 'consultant')).email);
  partner = await signedIn(t.app, (await makeUser(t.ctx, 'partner')).email);
});
afterAll(() => t.close());

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/** POSTs a check, retrying while both threads are still busy with an earlier test's job. */
async function start(a: Agent, spec: object, seed?: number): Promise<SimulationJob> {
  for (let i = 0; i < 100; i++) {
    const res = await a.post('/api/simulations', { spec, seed });
    if (res.status !== 429) {
      expect(res.status, JSON.stringify(res.body)).toBe(202);
      return res.body.job as SimulationJob;
    }
    await sleep(200);
  }
  throw new Error('the simulation pool stayed busy');
}

async function untilFinished(a: Agent, id: string): Promise<SimulationJob> {
  for (;;) {
    const res = await a.get(`/api/simulations/${id}`);
    expect(res.status).toBe(200);
    const job = res.body.job as SimulationJob;
    expect(job.progress).toBeGreaterThanOrEqual(0);
    expect(job.progress).toBeLessThanOrEqual(1);
    if (job.status !== 'running') return job;
    await sleep(250);
  }
}

const mmc = { model: 'M/M/c', arrivalRate: 4, serviceRate: 1, servers: 5 };

describe('POST /api/simulations', () => {
  it('runs a check to the end; the exact M/M/c and M/M/1 waits lie inside the 95 % intervals', { timeout: SLOW }, async () => {
    const mm1 = { model: 'M/M/1', arrivalRate: 2, serviceRate: 3, t: 0.5 };
    const [a, b] = [await start(consultant, mmc, 41), await start(partner, mm1, 7)];
    expect(a).toMatchObject({ status: 'running', progress: 0 });
    expect(Date.parse(a.startedAt)).not.toBeNaN();

    const doneA = await untilFinished(consultant, a.id);
    expect(doneA.status).toBe('done');
    expect(doneA.progress).toBe(1);
    // source: the engine's exact Erlang C value for λ = 4, μ = 1, c = 5 (Wq ≈ 0.554)
    const exact = (compute(mmc) as ModelResult).Wq!;
    const wq = doneA.result!.estimates.wq;
    expect(exact).toBeGreaterThanOrEqual(wq.lower);
    expect(exact).toBeLessThanOrEqual(wq.upper);
    expect(doneA.comparison!.measures.find((m) => m.measure === 'Wq')).toMatchObject({ analytic: exact, inside: true });
    expect(doneA.result!.model).toBe('M/M/5');

    const doneB = await untilFinished(partner, b.id);
    // source: Hillier & Lieberman worked example, λ = 2/h, μ = 3/h gives Wq = 2/3 h (from memory)
    const wq1 = doneB.result!.estimates.wq;
    expect(2 / 3).toBeGreaterThanOrEqual(wq1.lower);
    expect(2 / 3).toBeLessThanOrEqual(wq1.upper);
    expect(doneB.comparison!.measures.map((m) => m.measure)).toContain('serviceLevel');
  });

  it('refuses a client with 403', async () => {
    const client = await signedIn(t.app, (await makeUser(t.ctx, 'client')).email);
    const res = await client.post('/api/simulations', { spec: mmc });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('forbidden');
  });

  it('answers 422 naming the spec field the engine refuses', async () => {
    const res = await consultant.post('/api/simulations', { spec: { ...mmc, servers: 0 } });
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe('invalid_input');
    expect(res.body.error.issues.map((i: { path: string }) => i.path)).toEqual(['servers']);
  });

  it('answers 422 for a model without a simulation, and for an unstable queue', async () => {
    const finite = await consultant.post('/api/simulations', { spec: { model: 'M/M/c//N', arrivalRate: 0.1, serviceRate: 1, servers: 2, population: 10 } });
    expect(finite.status).toBe(422);
    expect(finite.body.error.message).toContain('no simulation for model M/M/c//N');
    const unstable = await consultant.post('/api/simulations', { spec: { ...mmc, arrivalRate: 6 } });
    expect(unstable.status).toBe(422);
    expect(unstable.body.error.code).toBe('unstable');
  });

  it('answers 400 for a body outside the contract', async () => {
    const res = await consultant.post('/api/simulations', { spec: mmc, horizon: 1e9 });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
  });
});

describe('DELETE /api/simulations/:id', () => {
  it('cancels a running check; it stays cancelled', { timeout: SLOW }, async () => {
    const job = await start(consultant, mmc, 3);
    const res = await consultant.delete(`/api/simulations/${job.id}`);
    expect(res.status).toBe(200);
    expect(res.body.job).toMatchObject({ id: job.id, status: 'cancelled' });
    await sleep(500);
    expect((await consultant.get(`/api/simulations/${job.id}`)).body.job.status).toBe('cancelled');
  });

  it('hides a check from everybody but the person who started it (404)', { timeout: SLOW }, async () => {
    const job = await start(consultant, mmc, 5);
    expect((await partner.get(`/api/simulations/${job.id}`)).status).toBe(404);
    expect((await partner.delete(`/api/simulations/${job.id}`)).status).toBe(404);
    expect((await consultant.get(`/api/simulations/${job.id}`)).body.job.status).not.toBe('cancelled');
    expect((await consultant.get('/api/simulations/not-an-id')).status).toBe(404);
    await consultant.delete(`/api/simulations/${job.id}`);
  });
});

describe('simulation pool', () => {
  it('answers 429 with a clear message while two checks run', { timeout: SLOW }, async () => {
    const first = await start(consultant, mmc, 11);
    const second = await start(partner, mmc, 12);
    const third = await consultant.post('/api/simulations', { spec: mmc });
    expect(third.status).toBe(429);
    expect(third.body.error.message).toMatch(/already running 2 simulation checks/);
    expect(third.headers['retry-after']).toBe('5');
    await consultant.delete(`/api/simulations/${first.id}`);
    await partner.delete(`/api/simulations/${second.id}`);
  });
});
