import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { accessTokens } from '../../api/db/schema/index';
import { SESSION_COOKIE } from '../../api/app';
import { PASSWORD, agent, makeUser, signedIn, startTestApp, type TestApp } from './support/test-app';
import { tokenFromMail } from './support/mailbox';

let t: TestApp;
beforeAll(() => {
  t = startTestApp();
});
afterAll(() => t.close());

const sessionCookie = (res: { headers: Record<string, unknown> }): string | undefined =>
  ([] as string[]).concat((res.headers['set-cookie'] as string[] | undefined) ?? []).find((c) => c.startsWith(`${SESSION_COOKIE}=`))?.split(';')[0];

describe('POST /api/auth/sign-in', () => {
  it('signs in with the right password and sets an httpOnly SameSite cookie', async () => {
    const u = await makeUser(t.ctx, 'consultant');
    const a = agent(t.app);
    const res = await a.post('/api/auth/sign-in', { email: u.email.toUpperCase(), password: PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body.user).toMatchObject({ email: u.email, role: 'consultant' });
    const raw = String(res.headers['set-cookie']);
    expect(raw).toMatch(/HttpOnly/i);
    expect(raw).toMatch(/SameSite=Lax/i);
    expect((await a.get('/api/auth/me')).body.user.email).toBe(u.email);
  });

  it('refuses a wrong password with 401 and the one error body, and records the failure', async () => {
    const u = await makeUser(t.ctx, 'partner');
    const res = await agent(t.app).post('/api/auth/sign-in', { email: u.email, password: 'wrong-password-1' });
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('invalid_credentials');
    const admin = await makeUser(t.ctx, 'admin');
    const audit = await (await signedIn(t.app, admin.email)).get(`/api/audit?action=sign_in_failed&q=${encodeURIComponent(u.email)}`);
    expect(audit.body.entries[0]).toMatchObject({ action: 'sign_in_failed', actorEmail: u.email });
  });

  it('names the field when the body is malformed', async () => {
    const res = await agent(t.app).post('/api/auth/sign-in', { email: 'not-an-address', password: '' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(res.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(['email', 'password']);
  });

  it('refuses a deactivated account', async () => {
    const u = await makeUser(t.ctx, 'client');
    const admin = await signedIn(t.app, (await makeUser(t.ctx, 'admin')).email);
    expect((await admin.patch(`/api/users/${u.id}`, { active: false })).status).toBe(200);
    expect((await agent(t.app).post('/api/auth/sign-in', { email: u.email, password: PASSWORD })).status).toBe(401);
  });

  it('gives a new session id at every sign-in, and the old id is no longer signed in', async () => {
    const u = await makeUser(t.ctx, 'consultant');
    const a = agent(t.app);
    const first = sessionCookie(await a.post('/api/auth/sign-in', { email: u.email, password: PASSWORD }));
    const second = sessionCookie(await a.post('/api/auth/sign-in', { email: u.email, password: PASSWORD }));
    expect(first).toBeDefined();
    expect(second).toBeDefined();
    expect(second).not.toBe(first);
    const stale = await agent(t.app).raw.get('/api/auth/me').set('Cookie', first!);
    expect(stale.status).toBe(401);
  });

  it('refuses state-changing requests without the CSRF header', async () => {
    const u = await makeUser(t.ctx, 'consultant');
    const res = await agent(t.app).raw.post('/api/auth/sign-in').send({ email: u.email, password: PASSWORD });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('csrf_failed');
  });
});

describe('sign-in rate limit', () => {
  it('answers 429 with a clear message after too many failures for one account', async () => {
    const limited = startTestApp({ signInLimit: { windowMs: 60_000, perAccount: 3, perAddress: 100 } });
    try {
      const u = await makeUser(limited.ctx, 'consultant');
      const a = agent(limited.app);
      for (let i = 0; i < 3; i++) expect((await a.post('/api/auth/sign-in', { email: u.email, password: 'wrong-password-x' })).status).toBe(401);
      const res = await a.post('/api/auth/sign-in', { email: u.email, password: PASSWORD });
      expect(res.status).toBe(429);
      expect(res.body.error).toMatchObject({ code: 'rate_limited' });
      expect(res.body.error.message).toMatch(/Too many sign-in attempts/);
    } finally {
      await limited.close();
    }
  });
});

describe('POST /api/auth/sign-out', () => {
  it('ends the session', async () => {
    const a = await signedIn(t.app, (await makeUser(t.ctx, 'partner')).email);
    expect((await a.post('/api/auth/sign-out')).status).toBe(204);
    expect((await a.get('/api/auth/me')).status).toBe(401);
  });
});

describe('password reset', () => {
  it('mails a single-use link that sets a new password', async () => {
    const u = await makeUser(t.ctx, 'consultant');
    expect((await agent(t.app).post('/api/auth/password-reset', { email: u.email })).status).toBe(202);
    const token = await tokenFromMail(u.email, 'reset-password');
    const ok = await agent(t.app).post('/api/auth/password-reset/confirm', { token, password: 'a-brand-new-password' });
    expect(ok.status).toBe(200);
    expect((await agent(t.app).post('/api/auth/sign-in', { email: u.email, password: 'a-brand-new-password' })).status).toBe(200);
    const again = await agent(t.app).post('/api/auth/password-reset/confirm', { token, password: 'another-password-2' });
    expect(again.status).toBe(400);
    expect(again.body.error.issues[0].path).toBe('token');
  });

  it('answers the same for an unknown address and sends nothing', async () => {
    const res = await agent(t.app).post('/api/auth/password-reset', { email: 'nobody-here@example.test' });
    expect(res.status).toBe(202);
  });

  it('refuses a link older than one hour', async () => {
    const u = await makeUser(t.ctx, 'client');
    await agent(t.app).post('/api/auth/password-reset', { email: u.email });
    const token = await tokenFromMail(u.email, 'reset-password');
    await t.ctx.db.update(accessTokens).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(accessTokens.userId, u.id));
    expect((await agent(t.app).post('/api/auth/password-reset/confirm', { token, password: 'a-brand-new-password' })).status).toBe(400);
  });

  it('stores only a hash of the token', async () => {
    const u = await makeUser(t.ctx, 'partner');
    await agent(t.app).post('/api/auth/password-reset', { email: u.email });
    const token = await tokenFromMail(u.email, 'reset-password');
    const rows = await t.ctx.db.select().from(accessTokens).where(eq(accessTokens.userId, u.id));
    expect(rows.some((r) => r.tokenHash === token)).toBe(false);
    expect(rows.every((r) => /^[0-9a-f]{64}$/.test(r.tokenHash))).toBe(true);
  });
});

describe('invitations', () => {
  it('lets an invited person choose a password and signs them in, once', async () => {
    const admin = await signedIn(t.app, (await makeUser(t.ctx, 'admin')).email);
    const email = `invitee-${Date.now()}@example.test`;
    const created = await admin.post('/api/users', { email, name: 'New Person', role: 'consultant' });
    expect(created.status).toBe(201);
    expect(created.body.user.status).toBe('invited');
    const token = await tokenFromMail(email, 'invitations');
    const a = agent(t.app);
    expect((await a.get(`/api/invitations/${token}`)).body).toMatchObject({ email, role: 'consultant' });
    const accepted = await a.post(`/api/invitations/${token}/accept`, { name: 'Nova Person', password: 'my-own-password' });
    expect(accepted.status).toBe(200);
    expect((await a.get('/api/auth/me')).body.user).toMatchObject({ email, name: 'Nova Person' });
    expect((await agent(t.app).post(`/api/invitations/${token}/accept`, { name: 'X', password: 'another-password' })).status).toBe(404);
  });

  it('refuses a second account with the same e-mail, naming the field', async () => {
    const admin = await signedIn(t.app, (await makeUser(t.ctx, 'admin')).email);
    const existing = await makeUser(t.ctx, 'client');
    const res = await admin.post('/api/users', { email: existing.email, name: 'Dup', role: 'client' });
    expect(res.status).toBe(409);
    expect(res.body.error.issues[0].path).toBe('email');
  });
});
