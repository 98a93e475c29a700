/**
 * Every role × every route, including ids of an engagement the user does not belong to.
 * Hiding buttons is not access control: this is what the server itself enforces.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Role } from '../../shared/schemas/roles';
import { agent, makeEngagement, makeUser, signedIn, startTestApp, type Agent, type TestApp } from './support/test-app';
import { expectMatrixAnswer, matrixCases, WHO, type Who } from './support/matrix';


let t: TestApp;
const agents = new Map<Who, Agent>();
const ids = { mine: 0, other: 0, target: 0, extra: 0 };

beforeAll(async () => {
  t = startTestApp();
  const people = new Map<Role, { id: number; email: string }>();
  for (const role of ['admin', 'partner', 'consultant', 'client'] as const) people.set(role, await makeUser(t.ctx, role));
  ids.target = (await makeUser(t.ctx, 'consultant')).id;
  ids.extra = (await makeUser(t.ctx, 'consultant')).id;
  const members = (['partner', 'consultant', 'client'] as const).map((r) => people.get(r)!.id);
  ids.mine = await makeEngagement(t.ctx, members, 'Matrix: member');
  ids.other = await makeEngagement(t.ctx, [ids.target], 'Matrix: not a member');
  for (const [role, u] of people) agents.set(role, await signedIn(t.app, u.email));
  agents.set('anonymous', agent(t.app));
});
afterAll(() => t.close());

type Method = 'get' | 'post' | 'patch' | 'delete';
interface Row {
  method: Method;
  path: () => string;
  body?: () => object;
  expect: Record<Who, number>;
}
const all = (n: number, anon = 401): Record<Who, number> => ({ admin: n, partner: n, consultant: n, client: n, anonymous: anon });
const adminOnly = (n: number): Record<Who, number> => ({ admin: n, partner: 403, consultant: 403, client: 403, anonymous: 401 });

let counter = 0;
const rows: Row[] = [
  { method: 'get', path: () => '/api/health', expect: all(200, 200) },
  { method: 'get', path: () => '/api/auth/me', expect: all(200) },
  { method: 'get', path: () => '/api/users', expect: adminOnly(200) },
  { method: 'post', path: () => '/api/users', body: () => ({ email: `matrix-${Date.now()}-${++counter}@example.test`, name: 'M', role: 'client' }), expect: adminOnly(201) },
  { method: 'patch', path: () => `/api/users/${ids.target}`, body: () => ({ name: 'Renamed' }), expect: adminOnly(200) },
  { method: 'post', path: () => `/api/users/${ids.target}/invitation`, expect: adminOnly(202) },
  { method: 'get', path: () => '/api/engagements', expect: all(200) },
  { method: 'post', path: () => '/api/engagements', body: () => ({ name: 'Matrix new', clientName: 'C' }), expect: adminOnly(201) },
  { method: 'get', path: () => `/api/engagements/${ids.mine}`, expect: all(200) },
  { method: 'get', path: () => `/api/engagements/${ids.other}`, expect: { admin: 200, partner: 404, consultant: 404, client: 404, anonymous: 401 } },
  { method: 'get', path: () => '/api/engagements/999999999', expect: { admin: 404, partner: 404, consultant: 404, client: 404, anonymous: 401 } },
  { method: 'patch', path: () => `/api/engagements/${ids.mine}`, body: () => ({ description: 'changed' }), expect: adminOnly(200) },
  { method: 'patch', path: () => `/api/engagements/${ids.other}`, body: () => ({ description: 'changed' }), expect: adminOnly(200) },
  { method: 'get', path: () => `/api/engagements/${ids.mine}/members`, expect: all(200) },
  { method: 'get', path: () => `/api/engagements/${ids.other}/members`, expect: { admin: 200, partner: 404, consultant: 404, client: 404, anonymous: 401 } },
  { method: 'post', path: () => `/api/engagements/${ids.mine}/members`, body: () => ({ userId: ids.extra }), expect: adminOnly(201) },
  { method: 'delete', path: () => `/api/engagements/${ids.mine}/members/${ids.extra}`, expect: adminOnly(204) },
  { method: 'post', path: () => `/api/engagements/${ids.other}/members`, body: () => ({ userId: ids.extra }), expect: adminOnly(201) },
  { method: 'get', path: () => '/api/audit', expect: adminOnly(200) },
  { method: 'get', path: () => '/api/admin/mailbox', expect: adminOnly(200) },
];

describe.each(WHO)('as %s', (who) => {
  it.each(matrixCases(rows))('%s answers as the matrix says', (_name, row) => expectMatrixAnswer(agents.get(who)!, who, row));
});

describe('engagement ids of other engagements', () => {
  it('answer exactly like a missing id, so existence does not leak', async () => {
    const a = agents.get('consultant')!;
    const other = await a.get(`/api/engagements/${ids.other}`);
    const missing = await a.get('/api/engagements/999999999');
    expect(other.body).toEqual(missing.body);
  });
});
