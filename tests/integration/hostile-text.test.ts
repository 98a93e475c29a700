/**
 * Hostile text (XSS payloads) in every text field the API accepts: stored and returned as the
 * characters typed (the editor text as the document sanitiser leaves it), and printed literally in
 * the released PDF. Sanitiser details (unknown nodes, attributes) are in studies.test.ts; the web
 * side is tests/e2e/hostile-text.test.ts; dataset file names are in hostile-upload.test.ts.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { download } from './support/pdf-tools';
import { pdfRawText } from './support/pdf-raw-text';
import { XSS_PAYLOADS, squeezed, visible, type HostilePayload } from './support/hostile-payloads';
import { tokenFromMail } from './support/mailbox';
import { agent, makeEngagement, makeUser, signedIn, startTestApp, unique, type Agent, type TestApp } from './support/test-app';
import { deskBlock, doc, heading, paragraph } from './support/study-fixtures';
import { memberships } from '../../api/db/schema/index';
import { withoutInvisible } from '../../shared/schemas/shown-name';

/** A name or title as stored: characters that reorder or hide text are removed (shown-name.ts). */
const shown = (text: string): string => withoutInvisible(text).trim();

let t: TestApp;
let admin: Agent;
let partner: Agent;
let partnerId = 0;
let consultant: Agent;
let consultantId = 0;
let engagementId = 0;

const P = Object.fromEntries(XSS_PAYLOADS.map((p) => [p.key, p])) as Record<string, HostilePayload>;
/** The name the invited consultant chooses when accepting, and the approver's name. */
const CONSULTANT_NAME = P['img-onerror']!.text;
const PARTNER_NAME = P['svg-onload']!.text;
const ENGAGEMENT = { name: `Harbour ${P.script!.text}`, clientName: P['attribute-break']!.text, description: P.entities!.text };

beforeAll(async () => {
  t = startTestApp();
  admin = await signedIn(t.app, (await makeUser(t.ctx, 'admin')).email);
  const p = await makeUser(t.ctx, 'partner');
  partnerId = p.id;
  partner = await signedIn(t.app, p.email);
  engagementId = (await admin.post('/api/engagements', ENGAGEMENT)).body.engagement.id;
});
afterAll(() => t.close());

describe('people', () => {
  it('keeps hostile names of invited people, of people accepting, and of renamed people as text', async () => {
    const email = unique('hostile-invitee');
    const invited = await admin.post('/api/users', { email, name: P.fullwidth!.text, role: 'consultant' });
    expect(invited.status).toBe(201);
    expect(invited.body.user.name).toBe(P.fullwidth!.text);
    consultantId = invited.body.user.id;
    const token = await tokenFromMail(email, 'invitations');
    expect((await agent(t.app).get(`/api/invitations/${token}`)).body.name).toBe(P.fullwidth!.text);
    consultant = agent(t.app);
    const accepted = await consultant.post(`/api/invitations/${token}/accept`, { name: ` ${CONSULTANT_NAME} `, password: 'hostile-text-password' });
    expect(accepted.status).toBe(200);
    expect((await consultant.get('/api/auth/me')).body.user.name).toBe(CONSULTANT_NAME);

    const renamed = await admin.patch(`/api/users/${partnerId}`, { name: PARTNER_NAME });
    expect(renamed.status).toBe(200);
    expect((await admin.get('/api/users')).body.users.find((u: { id: number }) => u.id === partnerId).name).toBe(PARTNER_NAME);
    await t.ctx.db.insert(memberships).values([consultantId, partnerId].map((userId) => ({ engagementId, userId, addedAt: new Date() })));
    const members = (await admin.get(`/api/engagements/${engagementId}/members`)).body.members as { name: string }[];
    expect(members.map((m) => m.name).sort()).toEqual([CONSULTANT_NAME, PARTNER_NAME].sort());
  });
});

describe('engagements', () => {
  it.each(XSS_PAYLOADS.map((p) => [p.key, p] as const))('stores %s in the name, client and description as typed, names without reordering marks (create and edit)', async (_key, p) => {
    const created = await admin.post('/api/engagements', { name: p.text, clientName: p.text, description: p.text });
    expect(created.status).toBe(201);
    const id = created.body.engagement.id as number;
    expect((await admin.get(`/api/engagements/${id}`)).body.engagement).toMatchObject({ name: shown(p.text), clientName: shown(p.text), description: p.text });
    const edited = await admin.patch(`/api/engagements/${id}`, { description: `Edited: ${p.text}`, version: created.body.engagement.version });
    expect(edited.status).toBe(200);
    const listed = (await admin.get('/api/engagements')).body.engagements.find((e: { id: number }) => e.id === id);
    expect(listed).toMatchObject({ name: shown(p.text), clientName: shown(p.text), description: `Edited: ${p.text}` });
  });
});

describe('studies, assumptions, comments and decisions', () => {
  let otherEngagement = 0;
  let writer: Agent;
  beforeAll(async () => {
    const w = await makeUser(t.ctx, 'consultant');
    const r = await makeUser(t.ctx, 'partner');
    otherEngagement = await makeEngagement(t.ctx, [w.id, r.id], 'Hostile text: field by field');
    writer = await signedIn(t.app, w.email);
  });

  it.each(XSS_PAYLOADS.map((p) => [p.key, p] as const))('keeps %s as a study title, without reordering marks (create, save, list)', async (_key, p) => {
    const created = await writer.post(`/api/engagements/${otherEngagement}/studies`, { title: p.text, templateKey: null });
    expect(created.status).toBe(201);
    expect(created.body.study.title).toBe(shown(p.text));
    const saved = await writer.put(`/api/studies/${created.body.study.id}/document`, { document: doc(paragraph('x')), baseVersion: 1, title: `Saved ${p.text}` });
    expect(saved.body.study.title).toBe(`Saved ${shown(p.text)}`);
    const list = (await writer.get(`/api/engagements/${otherEngagement}/studies`)).body.studies as { id: number; title: string }[];
    expect(list.find((s) => s.id === created.body.study.id)!.title).toBe(`Saved ${shown(p.text)}`);
  });

  it.each(XSS_PAYLOADS.map((p) => [p.key, p] as const))('keeps %s in an assumption name, source and notes (create, edit, list)', async (_key, p) => {
    const created = await writer.post(`/api/engagements/${otherEngagement}/assumptions`, { name: p.text, value: 12, unit: 'per_hour', sourceKind: 'client', sourceDetail: p.text, notes: p.text });
    expect(created.status).toBe(201);
    expect(created.body.assumption).toMatchObject({ name: shown(p.text), sourceDetail: p.text, notes: p.text });
    const edited = await writer.patch(`/api/assumptions/${created.body.assumption.id}`, { notes: `Checked: ${p.text}`, version: created.body.assumption.version });
    expect(edited.status).toBe(200);
    const listed = (await writer.get(`/api/engagements/${otherEngagement}/assumptions`)).body.assumptions.find((a: { id: number }) => a.id === created.body.assumption.id);
    expect(listed).toMatchObject({ name: shown(p.text), sourceDetail: p.text, notes: `Checked: ${p.text}` });
  });

  it('refuses a payload in a closed-choice field (unit, source) naming the field, storing nothing', async () => {
    const before = (await writer.get(`/api/engagements/${otherEngagement}/assumptions`)).body.assumptions.length;
    const res = await writer.post(`/api/engagements/${otherEngagement}/assumptions`, { name: 'Unit probe', value: 1, unit: P.script!.text, sourceKind: P['img-onerror']!.text });
    expect(res.status).toBe(400);
    expect(res.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(['sourceKind', 'unit']);
    // The message names the field and the allowed choices; it does not echo the payload back.
    expect(JSON.stringify(res.body)).not.toContain('<script>');
    expect((await writer.get(`/api/engagements/${otherEngagement}/assumptions`)).body.assumptions.length).toBe(before);
  });
});

describe('review comments and change requests', () => {
  let revisionId = 0;
  beforeAll(async () => {
    const created = await consultant.post(`/api/engagements/${engagementId}/studies`, { title: 'Hostile review', templateKey: null });
    await consultant.put(`/api/studies/${created.body.study.id}/document`, { document: doc(heading('Peak', 'sect-peak'), deskBlock('desk-review')), baseVersion: 1 });
    revisionId = (await consultant.post(`/api/studies/${created.body.study.id}/revisions`, {})).body.revision.id;
  });

  it('keeps every payload as a comment body and a reply, returned as typed', async () => {
    const ids: number[] = [];
    for (const p of XSS_PAYLOADS) {
      const res = await partner.post(`/api/revisions/${revisionId}/comments`, { anchorType: 'block', anchorId: 'desk-review', body: p.text });
      expect(res.status).toBe(201);
      expect(res.body.comment.body).toBe(p.text);
      ids.push(res.body.comment.id);
    }
    const reply = await consultant.post(`/api/revisions/${revisionId}/comments`, { parentId: ids[0], body: P.entities!.text });
    expect(reply.body.comment.body).toBe(P.entities!.text);
    const listed = (await partner.get(`/api/revisions/${revisionId}/comments`)).body.comments as { body: string }[];
    expect(listed.map((c) => c.body)).toEqual([...XSS_PAYLOADS.map((p) => p.text), P.entities!.text]);
  });

  it('keeps a payload as the reason of a change request', async () => {
    const reason = `${P.script!.text} ${P['javascript-url']!.text}`;
    const res = await partner.post(`/api/revisions/${revisionId}/decision`, { decision: 'request-changes', reason });
    expect(res.status).toBe(200);
    expect(res.body.revision).toMatchObject({ status: 'changes_requested', decisionReason: reason });
    expect((await consultant.get(`/api/revisions/${revisionId}`)).body.revision.decisionReason).toBe(reason);
  });
});

/** Links the document tries: only absolute http, https and mailto survive (api/routes/studies/safe-href.ts). */
const HREFS: { href: string; kept: string | null }[] = [
  { href: `javascript:alert('xss-link')`, kept: null },
  { href: `JaVaScRiPt:alert('xss-case')`, kept: null },
  { href: ` java\nscript:alert('xss-newline')`, kept: null },
  { href: `data:text/html,<script>alert('xss-data')</script>`, kept: null },
  { href: `vbscript:msgbox('xss-vb')`, kept: null },
  { href: `//evil.example.test/steal`, kept: null },
  { href: `https://ferry.example.test/timetable?from=<script>`, kept: 'https://ferry.example.test/timetable?from=%3Cscript%3E' },
  { href: `mailto:desk@ferry.example.test`, kept: 'mailto:desk@ferry.example.test' },
];

describe('the study document, and the released PDF', () => {
  let studyId = 0;
  let stored: { content: { type: string; content?: { text: string; marks?: { type: string; attrs: { href: string } }[] }[] }[] };
  let pdf: Buffer = Buffer.alloc(0);
  const STUDY_TITLE = `${P['bidi-zero-width']!.text} ${P.template!.text}`;
  const line = (p: HostilePayload) => `[${p.key}] ${p.text} [/${p.key}]`;
  const assumptionIds: number[] = [];

  beforeAll(async () => {
    for (const p of XSS_PAYLOADS) {
      const res = await consultant.post(`/api/engagements/${engagementId}/assumptions`, {
        name: `${p.key}: ${p.text}`,
        value: 30,
        unit: 'per_hour',
        sourceKind: 'client',
        sourceDetail: `source ${p.text}`,
        notes: `notes ${p.text}`,
        ownerId: consultantId,
      });
      expect(res.status, JSON.stringify(res.body)).toBe(201);
      assumptionIds.push(res.body.assumption.id);
    }
    const created = await consultant.post(`/api/engagements/${engagementId}/studies`, { title: STUDY_TITLE, templateKey: null });
    studyId = created.body.study.id;
    // One block per payload (its title hostile, its arrivals linked to a hostile assumption), and
    // scenario labels carrying every payload across two blocks (at most 8 scenarios per block).
    const blocks = XSS_PAYLOADS.map((p, i) =>
      deskBlock(`hostile-${p.key}`, { arrivalRate: { assumption: assumptionIds[i] } }, {
        title: p.text,
        scenarios: i < 2 ? XSS_PAYLOADS.slice(i * 5, i * 5 + 5).map((s, j) => ({ label: s.text, overrides: { servers: 4 + j } })) : [],
      }),
    );
    const document = doc(
      heading(P['attribute-break']!.text, 'sect-hostile'),
      ...XSS_PAYLOADS.map((p) => paragraph(line(p))),
      ...HREFS.map((h, i) => paragraph(`link ${i}`, [{ type: 'link', attrs: { href: h.href } }])),
      ...blocks,
    );
    const saved = await consultant.put(`/api/studies/${studyId}/document`, { document, baseVersion: 1 });
    expect(saved.status, JSON.stringify(saved.body).slice(0, 500)).toBe(200);
    stored = (await consultant.get(`/api/studies/${studyId}`)).body.study.document;
  });

  it('keeps payload text as text, removing only the tags the sanitiser strips', () => {
    const paragraphs = stored.content.filter((n) => n.type === 'paragraph').map((n) => (n.content ?? []).map((c) => c.text).join(''));
    for (const p of XSS_PAYLOADS) expect(paragraphs).toContain(`[${p.key}] ${p.inDocument} [/${p.key}]`);
    // (Block titles and scenario labels are plain fields, kept as typed: see the next test.)
    const text = JSON.stringify(stored.content.filter((n) => n.type !== 'modelBlock'));
    for (const tag of ['<script', '<img', '<svg', '<iframe']) expect(text).not.toContain(tag);
    expect(stored.content.find((n) => n.type === 'heading')!.content![0]!.text).toBe(P['attribute-break']!.text);
  });

  it('drops javascript:, data:, vbscript: and relative link targets, keeping the link text; keeps http(s) and mailto', () => {
    for (const [i, h] of HREFS.entries()) {
      const node = stored.content.find((n) => n.type === 'paragraph' && n.content?.[0]?.text === `link ${i}`);
      expect(node, `link ${i}`).toBeDefined();
      const href = node!.content![0]!.marks?.find((m) => m.type === 'link')?.attrs.href ?? null;
      expect(href, h.href).toBe(h.kept);
    }
  });

  it('keeps block titles and scenario labels as typed', async () => {
    const blocks = stored.content.filter((n) => n.type === 'modelBlock') as unknown as { attrs: { config: { title: string; scenarios: { label: string }[] } } }[];
    expect(blocks.map((b) => b.attrs.config.title)).toEqual(XSS_PAYLOADS.map((p) => p.text));
    expect(blocks.flatMap((b) => b.attrs.config.scenarios.map((s) => s.label))).toEqual(XSS_PAYLOADS.map((p) => p.text));
    const results = (await consultant.get(`/api/studies/${studyId}`)).body.study.blocks as Record<string, { status: string; scenarios: { label: string }[] }>;
    expect(results['hostile-script']!.status).toBe('ok');
    expect(results['hostile-script']!.scenarios.map((s) => s.label)).toEqual(XSS_PAYLOADS.slice(0, 5).map((p) => p.text));
  });

  it('prints every payload literally in the released PDF, which carries no script or javascript: action', async () => {
    const rev = (await consultant.post(`/api/studies/${studyId}/revisions`, {})).body.revision;
    expect((await partner.post(`/api/revisions/${rev.id}/decision`, { decision: 'approve' })).status).toBe(200);
    const released = await partner.post(`/api/revisions/${rev.id}/release`);
    expect(released.status, JSON.stringify(released.body)).toBe(200);
    pdf = (await download((await partner.get(`/api/revisions/${rev.id}/pdf`)).body.url)).body;
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');

    // Known gap (reported, left alone): no embedded face has glyphs for fullwidth forms (U+FF00–
    // U+FFEF, nor CJK), so pdfmake drops them; the ASCII around them is printed as typed.
    const printable = (s: string) => squeezed(visible(s)).replace(/[\uff00-\uffef]/g, '');
    const text = printable(pdfRawText(pdf));
    const expectPrinted = (what: string, value: string) => expect(text, `${what}: ${value}`).toContain(printable(value));
    expectPrinted('engagement', ENGAGEMENT.name);
    expectPrinted('client', ENGAGEMENT.clientName);
    expectPrinted('study title', STUDY_TITLE);
    expectPrinted('section', P['attribute-break']!.text);
    expectPrinted('approver', PARTNER_NAME);
    for (const p of XSS_PAYLOADS) {
      expectPrinted('document text', `[${p.key}] ${p.inDocument} [/${p.key}]`);
      expectPrinted('block title', p.text);
      expectPrinted('scenario label', p.text);
      expectPrinted('assumption name', `${p.key}: ${p.text}`);
      expectPrinted('assumption source', `source ${p.text}`);
      expectPrinted('assumption notes', `notes ${p.text}`);
    }
    expectPrinted('assumption owner', CONSULTANT_NAME);
    expectPrinted('kept link', 'https://ferry.example.test/timetable?from=%3Cscript%3E');

    const raw = pdf.toString('latin1');
    expect(raw).not.toMatch(/\/JavaScript|\/JS\s*[(<]/);
    expect(raw).not.toMatch(/\/URI\s*\(\s*(javascript|data|vbscript):/i);
    expect(raw).not.toMatch(/\/Launch|\/SubmitForm|\/ImportData/);
  }, 60_000);
});
