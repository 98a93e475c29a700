import type { APIRequestContext } from 'playwright-core';
import { demo } from './demo';

const write = { 'x-sojourn-csrf': '1' };

async function json<T>(request: APIRequestContext, method: 'get' | 'post' | 'put', path: string, data?: unknown): Promise<T> {
  const res = await request[method](`${demo.url}/api${path}`, method === 'get' ? {} : { headers: write, data: data ?? {} });
  if (!res.ok()) throw new Error(`${method.toUpperCase()} ${path}: ${res.status()} ${await res.text()}`);
  return (await res.json()) as T;
}

export type A11yFixtures = {
  engagementId: number;
  studyId: number;
  datasetId: number;
  releasedRevisionId: number;
  inReviewRevisionId: number;
  studyTitle: string;
  invitationPath: string;
  /** A blank study with no revision yet: the editor offers "Submit for review". */
  blankStudyId: number;
  /** Signed off, not yet released: the revision screen shows the release panel. */
  approvedRevisionId: number;
};

type Node = { type?: string; text?: string; attrs?: { config?: { spec?: Record<string, unknown> } }; content?: Node[] };

/** A second revision differs in text and in one number, so the comparison has something to show. */
function reviseDocument(doc: Node): Node {
  let textDone = false;
  let numberDone = false;
  const walk = (n: Node): void => {
    if (!textDone && n.type === 'text' && typeof n.text === 'string' && n.text.length > 20) {
      n.text = `${n.text} Revised after the partner's first reading.`;
      textDone = true;
    }
    const spec = n.attrs?.config?.spec;
    if (!numberDone && n.type === 'modelBlock' && spec && typeof spec.percentile === 'number') {
      spec.percentile = 0.95;
      numberDone = true;
    }
    n.content?.forEach(walk);
  };
  walk(doc);
  return doc;
}

/**
 * What the demo seed lacks for a tour of every screen, made through the API as each role would:
 * a study from a template (model blocks, charts), revision 1 approved and released, revision 2
 * (text and a number changed) waiting for review, and an open invitation.
 */
export async function makeA11yFixtures(req: { consultant: APIRequestContext; partner: APIRequestContext; admin: APIRequestContext }): Promise<A11yFixtures> {
  const stamp = Date.now();
  const studyTitle = `Counter staffing, accessibility tour ${stamp}`;
  const { engagements } = await json<{ engagements: { id: number; name: string }[] }>(req.consultant, 'get', '/engagements');
  const engagement = engagements.find((e) => e.name === 'Permit counter wait times');
  if (!engagement) throw new Error('The demo seed has no "Permit counter wait times" engagement');
  const { templates } = await json<{ templates: { key: string }[] }>(req.consultant, 'get', '/templates');
  const { study } = await json<{ study: { id: number } }>(req.consultant, 'post', `/engagements/${engagement.id}/studies`, {
    title: studyTitle,
    templateKey: templates[0]?.key ?? null,
  });
  const { datasets } = await json<{ datasets: { id: number }[] }>(req.consultant, 'get', `/engagements/${engagement.id}/datasets`);
  if (!datasets[0]) throw new Error('The demo seed has no dataset on the permit counter engagement');

  const first = await json<{ revision: { id: number } }>(req.consultant, 'post', `/studies/${study.id}/revisions`, {});
  await json(req.partner, 'post', `/revisions/${first.revision.id}/decision`, { decision: 'approve' });
  await json(req.partner, 'post', `/revisions/${first.revision.id}/release`, {});

  const detail = await json<{ study: { document: Node; version: number } }>(req.consultant, 'get', `/studies/${study.id}`);
  await json(req.consultant, 'put', `/studies/${study.id}/document`, { document: reviseDocument(detail.study.document), baseVersion: detail.study.version });
  const second = await json<{ revision: { id: number } }>(req.consultant, 'post', `/studies/${study.id}/revisions`, {});

  const blank = await json<{ study: { id: number } }>(req.consultant, 'post', `/engagements/${engagement.id}/studies`, { title: `Blank study ${stamp}`, templateKey: null });
  const other = await json<{ study: { id: number } }>(req.consultant, 'post', `/engagements/${engagement.id}/studies`, { title: `Signed-off study ${stamp}`, templateKey: null });
  const approved = await json<{ revision: { id: number } }>(req.consultant, 'post', `/studies/${other.study.id}/revisions`, {});
  await json(req.partner, 'post', `/revisions/${approved.revision.id}/decision`, { decision: 'approve' });

  const email = `a11y.${stamp}@sojourn.test`;
  await json(req.admin, 'post', '/users', { email, name: 'Ines Okafor', role: 'consultant' });
  let invitationPath = '';
  for (let attempt = 0; attempt < 20 && !invitationPath; attempt++) {
    const { messages } = await json<{ messages: { to: string[]; links: string[] }[] }>(req.admin, 'get', '/admin/mailbox');
    const link = messages.find((m) => m.to.includes(email))?.links.find((l) => l.includes('/invitations/'));
    if (link) invitationPath = new URL(link).pathname;
    else await new Promise((r) => setTimeout(r, 250));
  }
  if (!invitationPath) throw new Error(`No invitation mail reached ${email}`);

  return {
    engagementId: engagement.id,
    studyId: study.id,
    datasetId: datasets[0].id,
    releasedRevisionId: first.revision.id,
    inReviewRevisionId: second.revision.id,
    studyTitle,
    invitationPath,
    blankStudyId: blank.study.id,
    approvedRevisionId: approved.revision.id,
  };
}
