/** People, an engagement and a saved study with one model block, ready to be submitted as a revision. */
import { expect } from 'vitest';
import { makeEngagement, makeUser, signedIn, type Agent, type TestApp } from './test-app';
import { deskBlock, doc, heading, paragraph } from './study-fixtures';

export interface ReviewCast {
  engagementId: number;
  consultant: Agent;
  partner: Agent;
  otherPartner: Agent;
  client: Agent;
  admin: Agent;
  emails: { consultant: string; partner: string; otherPartner: string; client: string };
  ids: { consultant: number; partner: number; otherPartner: number; client: number };
}

export async function reviewCast(t: TestApp, name: string): Promise<ReviewCast> {
  const people = {
    consultant: await makeUser(t.ctx, 'consultant'),
    partner: await makeUser(t.ctx, 'partner'),
    otherPartner: await makeUser(t.ctx, 'partner'),
    client: await makeUser(t.ctx, 'client'),
  };
  const admin = await makeUser(t.ctx, 'admin');
  const engagementId = await makeEngagement(t.ctx, Object.values(people).map((p) => p.id), name);
  return {
    engagementId,
    consultant: await signedIn(t.app, people.consultant.email),
    partner: await signedIn(t.app, people.partner.email),
    otherPartner: await signedIn(t.app, people.otherPartner.email),
    client: await signedIn(t.app, people.client.email),
    admin: await signedIn(t.app, admin.email),
    emails: { consultant: people.consultant.email, partner: people.partner.email, otherPartner: people.otherPartner.email, client: people.client.email },
    ids: { consultant: people.consultant.id, partner: people.partner.id, otherPartner: people.otherPartner.id, client: people.client.id },
  };
}

export const studyDocument = (servers = 3, intro = 'The ferry ticket desk serves walk-in passengers at the morning peak.') =>
  doc(heading('Peak hour', 'sect-peak'), paragraph(intro), deskBlock('desk-peak', { servers }), heading('Recommendation', 'sect-rec'), paragraph('Staff three agents at the peak.'));

/** A study saved with `studyDocument()`; returns its id and the server's results. */
export async function savedStudy(author: Agent, engagementId: number, title = 'Ferry desk capacity', servers = 3) {
  const created = await author.post(`/api/engagements/${engagementId}/studies`, { title, templateKey: null });
  expect(created.status).toBe(201);
  const saved = await author.put(`/api/studies/${created.body.study.id}/document`, { document: studyDocument(servers), baseVersion: 1 });
  expect(saved.status).toBe(200);
  return saved.body.study as { id: number; version: number; blocks: Record<string, { result: Record<string, number> }> };
}

/** Submits the study and returns the new revision's summary. */
export async function submitted(author: Agent, studyId: number) {
  const res = await author.post(`/api/studies/${studyId}/revisions`, {});
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body.revision as { id: number; number: number; sha256: string; status: string };
}

/** Submits and approves (by `approver`), returning the revision id. */
export async function approvedRevision(c: ReviewCast, studyId: number, approver = c.partner): Promise<number> {
  const rev = await submitted(c.consultant, studyId);
  const res = await approver.post(`/api/revisions/${rev.id}/decision`, { decision: 'approve' });
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return rev.id;
}

/** Waits (up to 5 s) until the SMTP fake caught a message to `address` whose subject matches. */
export async function mailArrives(address: string, subject: RegExp): Promise<{ subject: string; text: string }[]> {
  const { mailFor } = await import('./mailbox');
  for (let i = 0; i < 50; i++) {
    const found = (await mailFor(address)).filter((m) => subject.test(m.subject));
    if (found.length > 0) return found;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`no mail matching ${subject} for ${address}`);
}
