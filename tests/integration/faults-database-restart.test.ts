/**
 * MariaDB restarted under a running app: the real server (a child process) on a private MariaDB.
 * While the database is down every request that needs it answers 503 with a plain JSON error;
 * once it is back, requests succeed again within 5 s, on the same session, without an app restart.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { hashPassword } from '../../api/auth/passwords';
import { createDb } from '../../api/db/client';
import { engagements, memberships, users } from '../../api/db/schema/index';
import { httpSession, type HttpAnswer, type HttpSession } from './support/http-session';
import { startPrivateMariadb, type PrivateMariadb } from './support/private-mariadb';
import { startServerProcess, type ServerProcess } from './support/server-process';
import { PASSWORD } from './support/test-app';

let maria: PrivateMariadb;
let server: ServerProcess;
let partner: HttpSession;
let engagementId: number;
const email = 'partner-restart@example.test';

beforeAll(async () => {
  maria = await startPrivateMariadb('faults-db');
  const { db, pool } = createDb(maria.url);
  try {
    const now = new Date();
    const [u] = await db.insert(users).values({ email, name: 'Restart partner', role: 'partner', passwordHash: await hashPassword(PASSWORD), status: 'active', createdAt: now });
    const [e] = await db.insert(engagements).values({ name: 'Harbour ferry ticketing', clientName: 'Invented ferry line', description: '', createdAt: now, updatedAt: now });
    await db.insert(memberships).values({ engagementId: e.insertId, userId: u.insertId, addedAt: now });
    engagementId = e.insertId;
  } finally {
    await pool.end();
  }
  // No session cache: each request must reach MariaDB, so the outage shows on every route at once
  // (with the default 1 s cache, /api/auth/me could still answer from memory just after the stop).
  server = await startServerProcess({ DATABASE_URL: maria.url, SESSION_CACHE_MS: '0' });
  partner = httpSession(server.url);
  await partner.signIn(email, PASSWORD);
}, 120_000);

afterAll(async () => {
  await server?.stop();
  await maria?.remove();
});

/** A clear answer: the one error body, saying the database is unavailable, and nothing internal. */
function expectUnavailable(res: HttpAnswer): void {
  expect(res.status, res.text).toBe(503);
  expect(res.body.error).toEqual({ code: 'unavailable', message: expect.stringMatching(/database is unavailable/i) });
  expect(res.text).not.toMatch(/ECONNREFUSED|PROTOCOL_|at .*\.ts|node_modules|stack/i);
}

describe('MariaDB restarted under a running app', () => {
  it('answers 503 with a clear body while it is down and recovers within 5 s on the same session', async () => {
    expect((await partner.get('/api/auth/me')).status).toBe(200);
    expect((await partner.get('/api/engagements')).status).toBe(200);

    await maria.stop();
    const started = Date.now();
    expectUnavailable(await partner.get('/api/engagements'));
    expectUnavailable(await partner.get('/api/auth/me'));
    expectUnavailable(await partner.post('/api/engagements', { name: 'Never stored', clientName: 'Nobody' }));
    expectUnavailable(await httpSession(server.url).post('/api/auth/sign-in', { email, password: PASSWORD }));
    const health = await httpSession(server.url).get('/api/health');
    expect(health.status).toBe(503);
    expect(health.body).toMatchObject({ db: 'down' });
    // Refused connections fail fast: nobody waits out a timeout during an outage.
    expect(Date.now() - started).toBeLessThan(10_000);

    await maria.start();
    const back = Date.now();
    let res = await partner.get('/api/engagements');
    while (res.status !== 200 && Date.now() - back < 5_000) {
      await new Promise((r) => setTimeout(r, 100));
      res = await partner.get('/api/engagements');
    }
    const recoveredMs = Date.now() - back;
    if (process.env.FAULTS_DEBUG) console.log(`requests succeed again ${recoveredMs} ms after MariaDB answers`);
    expect(res.status, res.text).toBe(200);
    expect(recoveredMs).toBeLessThan(5_000);
    expect((res.body.engagements as { name: string }[]).map((e) => e.name)).toEqual(['Harbour ferry ticketing']);
    // The session survived: the same cookie is still signed in.
    expect((await partner.get('/api/auth/me')).body).toMatchObject({ user: { email } });
    // Writes work again too.
    const study = await partner.post(`/api/engagements/${engagementId}/studies`, { title: 'After the restart', templateKey: null });
    expect(study.status, study.text).toBe(201);
    expect((await partner.get('/api/engagements')).body.engagements).toHaveLength(1);
    expect((await httpSession(server.url).get('/api/health')).status).toBe(200);
    expect(server.child.exitCode).toBeNull();
  });
});
