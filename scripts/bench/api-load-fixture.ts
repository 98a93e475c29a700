/**
 * What the API load bench reads: a consultant of its own, an engagement with a small assumption
 * register, and a study of eight model blocks (links, scenarios, two charts) saved through the API
 * so its stored results are the server's. One signed-in session per simulated person.
 */
import { randomBytes } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { hashPassword } from '../../api/auth/passwords';
import { createDb } from '../../api/db/client';
import * as schema from '../../api/db/schema/index';
import { CSRF_HEADER, CSRF_HEADER_VALUE } from '../../shared/api-error';
import { BENCH_REGISTER, benchDocument } from './study-bench-document';

export const STUDY_BLOCKS = 8;

export interface LoadFixture {
  engagementId: number;
  studyId: number;
  /** `cookie` header values, one per signed-in session. */
  cookies: string[];
  cleanup(): Promise<void>;
}

async function call(url: string, init: RequestInit & { cookie?: string }): Promise<Response> {
  const headers: Record<string, string> = { 'content-type': 'application/json', [CSRF_HEADER]: CSRF_HEADER_VALUE };
  if (init.cookie) headers.cookie = init.cookie;
  const res = await fetch(url, { ...init, headers });
  if (!res.ok) throw new Error(`${init.method ?? 'GET'} ${url} answered ${res.status}: ${(await res.text()).slice(0, 300)}`);
  return res;
}

/** Signs in up to `count` sessions; a sign-in limit reached part-way leaves the ones made so far. */
async function signIn(appUrl: string, email: string, password: string, count: number): Promise<string[]> {
  const cookies: string[] = [];
  for (let i = 0; i < count; i++) {
    const res = await fetch(`${appUrl}/api/auth/sign-in`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', [CSRF_HEADER]: CSRF_HEADER_VALUE },
      body: JSON.stringify({ email, password }),
    });
    if (res.status === 429 && cookies.length > 0) break;
    if (!res.ok) throw new Error(`sign-in answered ${res.status}: ${(await res.text()).slice(0, 300)}`);
    const sid = res.headers.getSetCookie().find((c) => c.startsWith('sojourn.sid='));
    if (!sid) throw new Error('sign-in set no session cookie');
    cookies.push(sid.split(';')[0]);
  }
  return cookies;
}

export async function createLoadFixture(appUrl: string, databaseUrl: string, sessions: number): Promise<LoadFixture> {
  const { db, pool } = createDb(databaseUrl);
  const password = randomBytes(12).toString('hex');
  const email = `bench-load-${randomBytes(4).toString('hex')}@example.test`;
  const now = new Date();
  const [u] = await db.insert(schema.users).values({ email, name: 'Load bench consultant', role: 'consultant', passwordHash: await hashPassword(password), status: 'active', createdAt: now });
  const [e] = await db.insert(schema.engagements).values({ name: 'Load bench: regional help lines', clientName: 'Bench', description: '', createdAt: now, updatedAt: now });
  let cookies: string[] = [];
  const cleanup = async (): Promise<void> => {
    for (const cookie of cookies) await fetch(`${appUrl}/api/auth/sign-out`, { method: 'POST', headers: { cookie, [CSRF_HEADER]: CSRF_HEADER_VALUE } }).catch(() => undefined);
    await db.delete(schema.studies).where(eq(schema.studies.engagementId, e.insertId));
    await db.delete(schema.engagements).where(eq(schema.engagements.id, e.insertId));
    await db.delete(schema.users).where(eq(schema.users.id, u.insertId));
    await pool.end();
  };
  try {
    await db.insert(schema.memberships).values({ engagementId: e.insertId, userId: u.insertId, addedAt: now });
    const ids = new Map<number, number>();
    for (const a of BENCH_REGISTER) {
      const [r] = await db.insert(schema.assumptions).values({ engagementId: e.insertId, name: a.name, value: a.value, unit: a.unit, sourceKind: 'judgement', createdAt: now, updatedAt: now });
      ids.set(a.id, r.insertId);
    }
    cookies = await signIn(appUrl, email, password, sessions);
    const cookie = cookies[0];
    const created = (await (await call(`${appUrl}/api/engagements/${e.insertId}/studies`, { method: 'POST', cookie, body: JSON.stringify({ title: 'Help line staffing' }) })).json()) as {
      study: { id: number; version: number };
    };
    const document = JSON.stringify(benchDocument(STUDY_BLOCKS)).replace(/"assumption":(\d+)/g, (_m, id: string) => `"assumption":${ids.get(Number(id))}`);
    await call(`${appUrl}/api/studies/${created.study.id}/document`, {
      method: 'PUT',
      cookie,
      body: `{"baseVersion":${created.study.version},"document":${document}}`,
    });
    return { engagementId: e.insertId, studyId: created.study.id, cookies, cleanup };
  } catch (err) {
    await cleanup();
    throw err;
  }
}
