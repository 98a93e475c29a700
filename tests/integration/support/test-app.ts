/**
 * Integration support: the real app (createApp) against the real MariaDB that `npm test`
 * started (DATABASE_URL etc. in the environment). Each suite makes its own people and
 * engagements with unique e-mails, so suites never depend on each other's data.
 */
import { randomBytes } from 'node:crypto';
import request from 'supertest';
import type { Express } from 'express';
import { CSRF_HEADER, CSRF_HEADER_VALUE } from '../../../shared/api-error';
import type { Role } from '../../../shared/schemas/roles';
import { createApp } from '../../../api/app';
import { hashPassword } from '../../../api/auth/passwords';
import { loadConfig, type Config } from '../../../api/config';
import { createContext, type AppContext } from '../../../api/context';
import { engagements, memberships, users } from '../../../api/db/schema/index';

export const PASSWORD = 'correct-horse-battery';

export interface TestApp {
  app: Express;
  ctx: AppContext;
  close(): Promise<void>;
}

export function startTestApp(overrides: Partial<Config> = {}): TestApp {
  const ctx = createContext({ ...loadConfig(), ...overrides });
  return { app: createApp(ctx), ctx, close: () => ctx.close() };
}

export const unique = (prefix: string): string => `${prefix}-${randomBytes(4).toString('hex')}@example.test`;

let hashed: Promise<string> | null = null;

/** Inserts an active user with PASSWORD (hash computed once per file: argon2 is deliberately slow). */
export async function makeUser(ctx: AppContext, role: Role, email = unique(role)): Promise<{ id: number; email: string; role: Role }> {
  hashed ??= hashPassword(PASSWORD);
  const [res] = await ctx.db.insert(users).values({ email, name: `Test ${role}`, role, passwordHash: await hashed, status: 'active', createdAt: new Date() });
  return { id: res.insertId, email, role };
}

export async function makeEngagement(ctx: AppContext, memberIds: number[], name = 'Test engagement'): Promise<number> {
  const now = new Date();
  const [res] = await ctx.db.insert(engagements).values({ name, clientName: 'Test client', description: '', createdAt: now, updatedAt: now });
  for (const userId of memberIds) await ctx.db.insert(memberships).values({ engagementId: res.insertId, userId, addedAt: now });
  return res.insertId;
}

/** A supertest agent (keeps cookies) that sends the CSRF header like the web client does. */
export function agent(app: Express) {
  const a = request.agent(app);
  return {
    raw: a,
    get: (url: string) => a.get(url),
    post: (url: string, body?: object) => a.post(url).set(CSRF_HEADER, CSRF_HEADER_VALUE).send(body ?? {}),
    patch: (url: string, body?: object) => a.patch(url).set(CSRF_HEADER, CSRF_HEADER_VALUE).send(body ?? {}),
    put: (url: string, body?: object) => a.put(url).set(CSRF_HEADER, CSRF_HEADER_VALUE).send(body ?? {}),
    delete: (url: string) => a.delete(url).set(CSRF_HEADER, CSRF_HEADER_VALUE),
  };
}
export type Agent = ReturnType<typeof agent>;

export async function signedIn(app: Express, email: string, password = PASSWORD): Promise<Agent> {
  const a = agent(app);
  const res = await a.post('/api/auth/sign-in', { email, password });
  if (res.status !== 200) throw new Error(`sign-in of ${email} failed: ${res.status} ${JSON.stringify(res.body)}`);
  return a;
}
