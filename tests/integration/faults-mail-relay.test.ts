/**
 * The SMTP relay unreachable (connection refused, not a refusal after connecting, which
 * mail-outbox covers) under the real server: the mail waits in the outbox with the reason and
 * arrives by itself once the relay is back, exactly once. A private MariaDB keeps the shared test
 * server's outbox from delivering this suite's mail through its own working relay.
 */
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { hashPassword } from '../../api/auth/passwords';
import { createDb } from '../../api/db/client';
import { mailOutbox, users } from '../../api/db/schema/index';
import { httpSession } from './support/http-session';
import { mailFor } from './support/mailbox';
import { startPrivateMariadb, type PrivateMariadb } from './support/private-mariadb';
import { startServerProcess, type ServerProcess } from './support/server-process';
import { tcpRelay, type TcpRelay } from './support/tcp-relay';
import { PASSWORD, unique } from './support/test-app';

let maria: PrivateMariadb;
let db: ReturnType<typeof createDb>;
let relay: TcpRelay;
let server: ServerProcess;
const email = unique('relay');

beforeAll(async () => {
  maria = await startPrivateMariadb('faults-mail');
  db = createDb(maria.url);
  await db.db.insert(users).values({ email, name: 'Relay consultant', role: 'consultant', passwordHash: await hashPassword(PASSWORD), status: 'active', createdAt: new Date() });
  const smtp = new URL(process.env.SMTP_URL!);
  relay = await tcpRelay({ host: smtp.hostname, port: Number(smtp.port) });
  server = await startServerProcess({ DATABASE_URL: maria.url, SMTP_URL: `smtp://127.0.0.1:${relay.port}` });
}, 120_000);

afterAll(async () => {
  await server?.stop();
  await relay?.down();
  await db?.pool.end();
  await maria?.remove();
});

const row = async () => (await db.db.select().from(mailOutbox).where(eq(mailOutbox.toAddress, email)))[0];

describe('the SMTP relay unreachable under a running app', () => {
  it('keeps the mail with the reason, then delivers it once by itself after the relay is back', { timeout: 90_000 }, async () => {
    const anonymous = httpSession(server.url);
    expect((await anonymous.post('/api/auth/password-reset', { email })).status).toBe(202);

    let held = await row();
    for (let i = 0; i < 100 && !(held && held.attempts >= 1); i++) {
      await new Promise((r) => setTimeout(r, 100));
      held = await row();
    }
    expect(held).toMatchObject({ status: 'pending', sentAt: null });
    expect(held!.attempts).toBeGreaterThanOrEqual(1);
    expect(held!.lastError).toMatch(/ECONNREFUSED|connect/i);
    expect(await mailFor(email)).toEqual([]);
    // The app itself stays up and says which part is down.
    expect((await anonymous.get('/api/health')).body).toMatchObject({ db: 'ok', mail: 'down' });

    await relay.up();
    const back = Date.now();
    let caught = await mailFor(email);
    while (caught.length === 0 && Date.now() - back < 30_000) {
      await new Promise((r) => setTimeout(r, 200));
      caught = await mailFor(email);
    }
    if (process.env.FAULTS_DEBUG) console.log(`mail arrived ${Date.now() - back} ms after the relay came back`);
    expect(caught.map((m) => m.subject)).toEqual(['Reset your Sojourn password']);
    const sent = await row();
    expect(sent).toMatchObject({ status: 'sent' });
    expect(sent!.attempts).toBeGreaterThanOrEqual(2);
    // Later passes of the outbox send nothing more.
    await new Promise((r) => setTimeout(r, 3_000));
    expect(await mailFor(email)).toHaveLength(1);
  });
});
