/**
 * The authorisation matrix for revisions, comments, deliverables and verification: every role
 * against every new route, on an engagement the user belongs to and one it does not.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Role } from '../../shared/schemas/roles';
import { agent, makeEngagement, makeUser, signedIn, startTestApp, type Agent, type TestApp } from './support/test-app';
import { expectMatrixAnswer, matrixCases, WHO, type Who } from './support/matrix';
import { savedStudy, submitted } from './support/revision-setup';


let t: TestApp;
const agents = new Map<Who, Agent>();
let writer: Agent;
let approver: Agent;
const ids = { mine: 0, other: 0, myStudy: 0, otherStudy: 0, inReview: 0, released: 0, comment: 0, otherInReview: 0, otherReleased: 0, otherComment: 0 };

/** A revision of `engagementId` submitted by `by`, optionally approved and released by `decider`. */
async function revision(engagementId: number, by: Agent, decider: Agent | null, release: boolean): Promise<number> {
  const id = (await submitted(by, (await savedStudy(by, engagementId, 'Matrix study')).id)).id;
  if (decider) expect((await decider.post(`/api/revisions/${id}/decision`, { decision: 'approve' })).status).toBe(200);
  if (decider && release) expect((await decider.post(`/api/revisions/${id}/release`)).status).toBe(200);
  return id;
}

beforeAll(async () => {
  t = startTestApp();
  const people = new Map<Role, { id: number; email: string }>();
  for (const role of ['admin', 'partner', 'consultant', 'client'] as const) people.set(role, await makeUser(t.ctx, role));
  const w = await makeUser(t.ctx, 'consultant');
  const ap = await makeUser(t.ctx, 'partner');
  const ow = await makeUser(t.ctx, 'consultant');
  const op = await makeUser(t.ctx, 'partner');
  ids.mine = await makeEngagement(t.ctx, [...(['partner', 'consultant', 'client'] as const).map((r) => people.get(r)!.id), w.id, ap.id], 'Revision matrix: member');
  ids.other = await makeEngagement(t.ctx, [ow.id, op.id], 'Revision matrix: not a member');
  for (const [role, u] of people) agents.set(role, await signedIn(t.app, u.email));
  agents.set('anonymous', agent(t.app));
  writer = await signedIn(t.app, w.email);
  approver = await signedIn(t.app, ap.email);
  const otherWriter = await signedIn(t.app, ow.email);
  const otherPartner = await signedIn(t.app, op.email);

  ids.myStudy = (await savedStudy(writer, ids.mine, 'Matrix listing')).id;
  ids.inReview = await revision(ids.mine, writer, null, false);
  ids.released = await revision(ids.mine, writer, approver, true);
  ids.comment = (await approver.post(`/api/revisions/${ids.inReview}/comments`, { body: 'Matrix thread' })).body.comment.id;
  ids.otherStudy = (await savedStudy(otherWriter, ids.other, 'Other listing')).id;
  ids.otherInReview = await revision(ids.other, otherWriter, null, false);
  ids.otherReleased = await revision(ids.other, otherWriter, otherPartner, true);
  ids.otherComment = (await otherPartner.post(`/api/revisions/${ids.otherInReview}/comments`, { body: 'Other thread' })).body.comment.id;
}, 120_000);
afterAll(() => t.close());

/** Fresh objects per role, made just before that role's rows run, so a row's success does not change the next role's answer. */
const perRole = { study: 0, inReview: 0, approved: 0 };

type Method = 'get' | 'post' | 'patch';
interface Row {
  method: Method;
  path: () => string;
  body?: () => object;
  expect: Record<Who, number>;
}
const m = (admin: number, partner: number, consultant: number, client: number, anonymous = 401): Record<Who, number> => ({ admin, partner, consultant, client, anonymous });

const rows: Row[] = [
  { method: 'post', path: () => `/api/studies/${perRole.study}/revisions`, expect: m(403, 201, 201, 403) },
  { method: 'post', path: () => `/api/studies/${ids.otherStudy}/revisions`, expect: m(403, 404, 404, 403) },
  { method: 'get', path: () => `/api/studies/${ids.myStudy}/revisions`, expect: m(200, 200, 200, 200) },
  { method: 'get', path: () => `/api/studies/${ids.otherStudy}/revisions`, expect: m(200, 404, 404, 404) },
  { method: 'get', path: () => `/api/revisions/${ids.inReview}`, expect: m(200, 200, 200, 404) },
  { method: 'get', path: () => `/api/revisions/${ids.released}`, expect: m(200, 200, 200, 200) },
  { method: 'get', path: () => `/api/revisions/${ids.otherReleased}`, expect: m(200, 404, 404, 404) },
  { method: 'get', path: () => '/api/revisions/999999999', expect: m(404, 404, 404, 404) },
  { method: 'post', path: () => `/api/revisions/${perRole.inReview}/decision`, body: () => ({ decision: 'approve' }), expect: m(403, 200, 403, 403) },
  { method: 'post', path: () => `/api/revisions/${ids.otherInReview}/decision`, body: () => ({ decision: 'approve' }), expect: m(403, 404, 403, 403) },
  { method: 'post', path: () => `/api/revisions/${perRole.approved}/release`, expect: m(403, 200, 403, 403) },
  { method: 'post', path: () => `/api/revisions/${ids.otherReleased}/release`, expect: m(403, 404, 403, 403) },
  { method: 'get', path: () => `/api/revisions/${ids.released}/pdf`, expect: m(200, 200, 200, 200) },
  { method: 'get', path: () => `/api/revisions/${ids.inReview}/pdf`, expect: m(409, 409, 409, 404) },
  { method: 'get', path: () => `/api/revisions/${ids.otherReleased}/pdf`, expect: m(200, 404, 404, 404) },
  { method: 'get', path: () => `/api/revisions/${ids.inReview}/compare/${ids.inReview}`, expect: m(200, 200, 200, 403) },
  { method: 'get', path: () => `/api/revisions/${ids.otherInReview}/compare/${ids.otherInReview}`, expect: m(200, 404, 404, 403) },
  { method: 'get', path: () => `/api/revisions/${ids.inReview}/comments`, expect: m(200, 200, 200, 403) },
  { method: 'get', path: () => `/api/revisions/${ids.otherInReview}/comments`, expect: m(200, 404, 404, 403) },
  { method: 'post', path: () => `/api/revisions/${ids.inReview}/comments`, body: () => ({ body: 'A remark' }), expect: m(403, 201, 201, 403) },
  { method: 'post', path: () => `/api/revisions/${ids.otherInReview}/comments`, body: () => ({ body: 'Intruder' }), expect: m(403, 404, 404, 403) },
  { method: 'patch', path: () => `/api/comments/${ids.comment}`, body: () => ({ resolved: true }), expect: m(403, 200, 200, 403) },
  { method: 'patch', path: () => `/api/comments/${ids.otherComment}`, body: () => ({ resolved: true }), expect: m(403, 404, 404, 403) },
  { method: 'get', path: () => '/api/deliverables', expect: m(200, 200, 200, 200) },
  { method: 'get', path: () => '/api/review-queue', expect: m(200, 200, 403, 403) },
  // An empty body passes the sign-in gate and fails on the missing file: 400 proves the gate let the user through.
  { method: 'post', path: () => '/api/verify', body: () => ({}), expect: m(400, 400, 400, 400) },
];

describe.each(WHO)('as %s', (who) => {
  beforeAll(async () => {
    perRole.study = (await savedStudy(writer, ids.mine, `Submit as ${who}`)).id;
    perRole.inReview = await revision(ids.mine, writer, null, false);
    perRole.approved = await revision(ids.mine, writer, approver, false);
  }, 60_000);
  it.each(matrixCases(rows))('%s answers as the matrix says', (_name, row) => expectMatrixAnswer(agents.get(who)!, who, row));
});

describe('ids of other engagements', () => {
  it('answer exactly like missing ids, so existence does not leak', async () => {
    const a = agents.get('client')!;
    expect((await a.get(`/api/revisions/${ids.otherReleased}`)).body).toEqual((await a.get('/api/revisions/999999999')).body);
    expect((await a.get(`/api/revisions/${ids.inReview}`)).body).toEqual((await a.get('/api/revisions/999999999')).body);
    const p = agents.get('partner')!;
    expect((await p.patch(`/api/comments/${ids.otherComment}`, { resolved: true })).body).toEqual((await p.patch('/api/comments/999999999', { resolved: true })).body);
  });
});
