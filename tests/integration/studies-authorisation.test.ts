/**
 * The authorisation matrix for studies, assumptions, templates and compute: every role against
 * every new route, on an engagement the user belongs to and one it does not.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Role } from '../../shared/schemas/roles';
import { agent, makeEngagement, makeUser, signedIn, startTestApp, type Agent, type TestApp } from './support/test-app';
import { expectMatrixAnswer, matrixCases, WHO, type Who } from './support/matrix';
import { deskBlock, doc } from './support/study-fixtures';


let t: TestApp;
const agents = new Map<Who, Agent>();
const ids = { mine: 0, other: 0, myStudy: 0, otherStudy: 0, otherAssumption: 0 };

beforeAll(async () => {
  t = startTestApp();
  const people = new Map<Role, { id: number; email: string }>();
  for (const role of ['admin', 'partner', 'consultant', 'client'] as const) people.set(role, await makeUser(t.ctx, role));
  const outsider = await makeUser(t.ctx, 'consultant');
  ids.mine = await makeEngagement(t.ctx, (['partner', 'consultant', 'client'] as const).map((r) => people.get(r)!.id), 'Study matrix: member');
  ids.other = await makeEngagement(t.ctx, [outsider.id], 'Study matrix: not a member');
  for (const [role, u] of people) agents.set(role, await signedIn(t.app, u.email));
  agents.set('anonymous', agent(t.app));
  const c = agents.get('consultant')!;
  ids.myStudy = (await c.post(`/api/engagements/${ids.mine}/studies`, { title: 'Matrix study' })).body.study.id;
  const o = await signedIn(t.app, outsider.email);
  ids.otherStudy = (await o.post(`/api/engagements/${ids.other}/studies`, { title: 'Other study' })).body.study.id;
  ids.otherAssumption = (await o.post(`/api/engagements/${ids.other}/assumptions`, { name: 'Other', value: 1, unit: 'number', sourceKind: 'other' })).body.assumption.id;
});
afterAll(() => t.close());

type Method = 'get' | 'post' | 'patch' | 'put' | 'delete';
interface Row {
  method: Method;
  path: () => string;
  body?: () => object;
  expect: Record<Who, number>;
}
const m = (admin: number, partner: number, consultant: number, client: number, anonymous = 401): Record<Who, number> => ({ admin, partner, consultant, client, anonymous });
/** Reads by members (and admins); clients 403. */
const read = m(200, 200, 200, 403);
/** Reads of another engagement: admins see it, members of nothing get the 404 of a missing id. */
const readOther = m(200, 404, 404, 403);
const missing = m(404, 404, 404, 403);

let n = 0;
/** Assumptions made per role just before their PATCH/DELETE row runs, so rows do not collide. */
async function ownAssumption(who: Who): Promise<{ id: number; version: number }> {
  const c = agents.get('consultant')!;
  const res = await c.post(`/api/engagements/${ids.mine}/assumptions`, { name: `Matrix ${who} ${++n}`, value: 2, unit: 'per_hour', sourceKind: 'judgement' });
  return res.body.assumption;
}
const perRole = new Map<Who, { id: number; version: number }>();

const rows: Row[] = [
  { method: 'get', path: () => `/api/engagements/${ids.mine}/studies`, expect: read },
  { method: 'get', path: () => `/api/engagements/${ids.other}/studies`, expect: readOther },
  { method: 'post', path: () => `/api/engagements/${ids.mine}/studies`, body: () => ({ title: `New ${++n}` }), expect: m(403, 201, 201, 403) },
  { method: 'post', path: () => `/api/engagements/${ids.other}/studies`, body: () => ({ title: 'Intruder' }), expect: m(403, 404, 404, 403) },
  { method: 'get', path: () => `/api/studies/${ids.myStudy}`, expect: read },
  { method: 'get', path: () => `/api/studies/${ids.otherStudy}`, expect: readOther },
  { method: 'get', path: () => '/api/studies/999999999', expect: missing },
  {
    method: 'put',
    path: () => `/api/studies/${ids.myStudy}/document`,
    body: () => ({ document: doc(deskBlock('matrix-block')), baseVersion: 1 }),
    // Partner saves first (version 1 → 2); the consultant's save on base 1 is then stale: 409 proves it passed the gate.
    expect: m(403, 200, 409, 403),
  },
  { method: 'put', path: () => `/api/studies/${ids.otherStudy}/document`, body: () => ({ document: doc(), baseVersion: 1 }), expect: m(403, 404, 404, 403) },
  { method: 'post', path: () => '/api/compute', body: () => ({ model: 'M/M/1', arrivalRate: 1, serviceRate: 2 }), expect: m(200, 200, 200, 403) },
  { method: 'get', path: () => '/api/templates', expect: read },
  { method: 'get', path: () => `/api/engagements/${ids.mine}/assumptions`, expect: read },
  { method: 'get', path: () => `/api/engagements/${ids.other}/assumptions`, expect: readOther },
  { method: 'post', path: () => `/api/engagements/${ids.mine}/assumptions`, body: () => ({ name: `Created ${++n}`, value: 1, unit: 'count', sourceKind: 'client' }), expect: m(403, 201, 201, 403) },
  { method: 'post', path: () => `/api/engagements/${ids.other}/assumptions`, body: () => ({ name: 'Intruder', value: 1, unit: 'count', sourceKind: 'client' }), expect: m(403, 404, 404, 403) },
  { method: 'patch', path: () => `/api/assumptions/${perRole.get(current)!.id}`, body: () => ({ value: 3, version: perRole.get(current)!.version }), expect: m(403, 200, 200, 403) },
  { method: 'patch', path: () => `/api/assumptions/${ids.otherAssumption}`, body: () => ({ value: 3, version: 1 }), expect: m(403, 404, 404, 403) },
  { method: 'delete', path: () => `/api/assumptions/${perRole.get(current)!.id}`, expect: m(403, 204, 204, 403) },
  { method: 'delete', path: () => `/api/assumptions/${ids.otherAssumption}`, expect: m(403, 404, 404, 403) },
  // Writes check the role before the id: an admin is refused whether or not the id exists.
  { method: 'delete', path: () => '/api/assumptions/999999999', expect: m(403, 404, 404, 403) },
];

let current: Who = 'admin';

describe.each(WHO)('as %s', (who) => {
  beforeAll(async () => {
    current = who;
    perRole.set(who, await ownAssumption(who));
  });
  it.each(matrixCases(rows))('%s answers as the matrix says', (_name, row) => expectMatrixAnswer(agents.get(who)!, who, row));
});

describe('ids of other engagements', () => {
  it('answer exactly like missing ids, so existence does not leak', async () => {
    const a = agents.get('consultant')!;
    expect((await a.get(`/api/studies/${ids.otherStudy}`)).body).toEqual((await a.get('/api/studies/999999999')).body);
    expect((await a.delete(`/api/assumptions/${ids.otherAssumption}`)).body).toEqual((await a.delete('/api/assumptions/999999999')).body);
  });
});
