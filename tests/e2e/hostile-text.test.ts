/**
 * XSS payloads put in through the API (as a malicious or careless colleague would type them) and
 * read back in the browser: every screen shows them as literal text, no dialog opens, and no
 * element the payloads describe (img[onerror], svg[onload], iframe, inline script, javascript:
 * links) exists in the page. What the API stores is checked in tests/integration/hostile-text.test.ts.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { APIRequestContext, Browser, Page } from 'playwright-core';
import { XSS_PAYLOADS, type HostilePayload } from '../integration/support/hostile-payloads';
import { launchBrowser } from './support/browser';
import { demo, type DemoRole } from './support/demo';
import { screenshot } from './support/screenshot';
import { signedInPage } from './support/sign-in';
import { withoutInvisible } from '../../shared/schemas/shown-name';

let browser: Browser;
const pages: Page[] = [];
const dialogs: string[] = [];

const P = Object.fromEntries(XSS_PAYLOADS.map((p) => [p.key, p])) as Record<string, HostilePayload>;
const stamp = Date.now().toString(36);
const ENGAGEMENT = { name: `Quay ${stamp} ${P['img-onerror']!.text}`, clientName: P.script!.text, description: `${P['svg-onload']!.text} ${P.entities!.text}` };
const STUDY_TITLE = `Berths ${stamp} ${P['attribute-break']!.text}`;
const ids = { engagement: 0, study: 0, revision: 0 };

/** A signed-in page that records every dialog (alert, confirm, prompt) any script opens. */
async function open(role: DemoRole): Promise<Page> {
  const page = await signedInPage(browser, role);
  page.on('dialog', (d) => {
    dialogs.push(`${role}: ${d.type()} ${d.message()}`);
    void d.dismiss();
  });
  pages.push(page);
  return page;
}

async function api<T>(request: APIRequestContext, method: 'get' | 'post' | 'put', path: string, data?: unknown): Promise<T> {
  const res = await request[method](`${demo.url}/api${path}`, method === 'get' ? {} : { headers: { 'x-sojourn-csrf': '1' }, data: data ?? {} });
  if (!res.ok()) throw new Error(`${method.toUpperCase()} ${path}: ${res.status()} ${await res.text()}`);
  return (await res.json()) as T;
}

const block = (blockId: string, title: string, scenarios: string[], assumption: number) => ({
  type: 'modelBlock',
  attrs: {
    blockId,
    config: {
      title,
      timeUnit: 'hour',
      spec: { model: 'M/M/c', arrivalRate: { assumption }, serviceRate: 12, servers: 3, t: 0.05 },
      scenarios: scenarios.map((label, i) => ({ label, overrides: { servers: 4 + i } })),
    },
  },
});

beforeAll(async () => {
  browser = await launchBrowser();
  const admin = await open('admin');
  const consultant = await open('consultant');
  const partner = await open('partner');

  const { engagement } = await api<{ engagement: { id: number } }>(admin.request, 'post', '/engagements', ENGAGEMENT);
  ids.engagement = engagement.id;
  const { users } = await api<{ users: { id: number; email: string }[] }>(admin.request, 'get', '/users');
  for (const email of [demo.users.consultant, demo.users.partner]) {
    await api(admin.request, 'post', `/engagements/${engagement.id}/members`, { userId: users.find((u) => u.email === email)!.id });
  }

  const assumptionIds: number[] = [];
  for (const p of XSS_PAYLOADS) {
    const { assumption } = await api<{ assumption: { id: number } }>(consultant.request, 'post', `/engagements/${engagement.id}/assumptions`, {
      name: `${p.key} ${p.text}`,
      value: 30,
      unit: 'per_hour',
      sourceKind: 'client',
      sourceDetail: `source ${p.text}`,
      notes: `notes ${p.text}`,
    });
    assumptionIds.push(assumption.id);
  }
  const { study } = await api<{ study: { id: number } }>(consultant.request, 'post', `/engagements/${engagement.id}/studies`, { title: STUDY_TITLE, templateKey: null });
  ids.study = study.id;
  const document = {
    type: 'doc',
    content: [
      { type: 'heading', attrs: { level: 2, sectionId: 'sect-hostile' }, content: [{ type: 'text', text: P['attribute-break']!.text }] },
      ...XSS_PAYLOADS.map((p) => ({ type: 'paragraph', content: [{ type: 'text', text: `[${p.key}] ${p.text} [/${p.key}]` }] })),
      { type: 'paragraph', content: [{ type: 'text', text: 'timetable link', marks: [{ type: 'link', attrs: { href: `javascript:alert('xss-link')` } }] }] },
      block('hostile-a', P['svg-onload']!.text, XSS_PAYLOADS.slice(0, 5).map((p) => p.text), assumptionIds[0]!),
      block('hostile-b', P['iframe-srcdoc']!.text, XSS_PAYLOADS.slice(5).map((p) => p.text), assumptionIds[1]!),
    ],
  };
  await api(consultant.request, 'put', `/studies/${study.id}/document`, { document, baseVersion: 1 });
  const upload = await consultant.request.post(`${demo.url}/api/engagements/${engagement.id}/datasets`, {
    headers: { 'x-sojourn-csrf': '1' },
    multipart: { file: { name: `${P['img-onerror']!.text}.csv`, mimeType: 'text/csv', buffer: Buffer.from('arrived_at,channel\n2026-01-05T08:00:00Z,desk\n') } },
  });
  expect(upload.status()).toBe(201);
  const { revision } = await api<{ revision: { id: number } }>(consultant.request, 'post', `/studies/${study.id}/revisions`, {});
  ids.revision = revision.id;
  for (const p of XSS_PAYLOADS.slice(0, 4)) await api(partner.request, 'post', `/revisions/${revision.id}/comments`, { body: p.text });
}, 120_000);

afterAll(async () => {
  for (const p of pages) await p.context().close().catch(() => undefined);
  await browser?.close();
});

/** Elements and attributes the payloads describe; none may exist anywhere in the page. */
async function injected(page: Page): Promise<string[]> {
  return page.evaluate(() => {
    const found: string[] = [];
    const selectors = ['img[onerror]', 'img[src="x"]', 'svg[onload]', 'iframe', '[onmouseover]', '[onload]', 'a[href^="javascript:" i]', 'script:not([src])', 'b[onmouseover]'];
    for (const s of selectors) if (document.querySelector(s)) found.push(s);
    // Any event-handler attribute, or a link or source that runs script. (Names may rightly sit in
    // value, title or aria-label attributes: those are text.)
    for (const el of Array.from(document.querySelectorAll('*'))) {
      for (const attr of Array.from(el.attributes)) {
        const scriptUrl = ['href', 'src', 'action', 'formaction', 'xlink:href', 'srcdoc'].includes(attr.name) && /^\s*(javascript|data:text\/html|vbscript)/i.test(attr.value);
        if (/^on/i.test(attr.name) || scriptUrl || attr.name === 'srcdoc') found.push(`${el.tagName.toLowerCase()}[${attr.name}]`);
      }
    }
    return found;
  });
}

/**
 * The page's text as the DOM holds it (textContent: CSS may show a client name in capitals, but
 * the characters are what matters here), with runs of white space folded.
 */
const textOf = async (page: Page) => ((await page.locator('body').textContent()) ?? '').replace(/\s+/g, ' ');
const folded = (s: string) => s.replace(/\s+/g, ' ');

async function expectSafe(page: Page, name: string, shown: string[]): Promise<void> {
  await page.waitForLoadState('networkidle');
  const text = await textOf(page);
  for (const s of shown) expect(text, `${name} shows ${s}`).toContain(folded(s));
  expect(await injected(page), name).toEqual([]);
  expect(dialogs, name).toEqual([]);
  await screenshot(page, `hostile-${name}`);
}

describe('hostile text on screen', () => {
  it('engagement list and overview: name, client, description, study title, dataset name', async () => {
    const page = pages[1]!;
    await page.goto(`${demo.url}/engagements`);
    await page.getByText(`Quay ${stamp}`).first().waitFor();
    await expectSafe(page, 'engagement-list', [ENGAGEMENT.name, ENGAGEMENT.clientName]);
    await page.goto(`${demo.url}/engagements/${ids.engagement}`);
    await page.getByText(STUDY_TITLE).first().waitFor();
    await expectSafe(page, 'engagement-overview', [ENGAGEMENT.name, STUDY_TITLE]);
    await page.goto(`${demo.url}/engagements/${ids.engagement}/datasets`);
    await page.getByText(`${P['img-onerror']!.text}.csv`).first().waitFor();
    await expectSafe(page, 'datasets', [`${P['img-onerror']!.text}.csv`]);
  });

  it('assumption register: names, sources and notes', async () => {
    const page = pages[1]!;
    await page.goto(`${demo.url}/engagements/${ids.engagement}/assumptions`);
    await page.getByText(`template ${P.template!.text}`).first().waitFor();
    // Names are stored without characters that reorder or hide text (shown-name.ts).
    await expectSafe(page, 'assumption-register', XSS_PAYLOADS.map((p) => `${p.key} ${withoutInvisible(p.text)}`));
  });

  it('editor: title, text, block titles and option labels', async () => {
    const page = pages[1]!;
    await page.goto(`${demo.url}/studies/${ids.study}`);
    await page.getByRole('textbox', { name: 'Study text' }).waitFor();
    await page.getByText('[template]').first().waitFor();
    expect(await page.locator('#study-title').inputValue()).toBe(STUDY_TITLE);
    await expectSafe(page, 'editor', [
      ...XSS_PAYLOADS.map((p) => `[${p.key}] ${p.inDocument} [/${p.key}]`),
      P['attribute-break']!.text,
      // Block titles, and every payload as an option (scenario) label in the blocks' tables.
      P['svg-onload']!.text,
      P['iframe-srcdoc']!.text,
      ...XSS_PAYLOADS.map((p) => p.text),
    ]);
    expect(await page.content()).not.toContain('<img src="x"');
  });

  it('reader: the study as the client will read it', async () => {
    const page = pages[1]!;
    await page.goto(`${demo.url}/studies/${ids.study}/read`);
    await page.getByText('[template]').first().waitFor();
    await expectSafe(page, 'reader', [
      STUDY_TITLE,
      ...XSS_PAYLOADS.map((p) => `[${p.key}] ${p.inDocument} [/${p.key}]`),
      P['svg-onload']!.text,
      P['iframe-srcdoc']!.text,
      'timetable link',
    ]);
    expect(await page.getByRole('link', { name: 'timetable link' }).count()).toBe(0);
  });

  it('review: comments on the revision', async () => {
    const page = pages[2]!;
    await page.goto(`${demo.url}/revisions/${ids.revision}`);
    await page.getByText(P.script!.text).first().waitFor();
    await expectSafe(page, 'review', XSS_PAYLOADS.slice(0, 4).map((p) => p.text));
  });
});

describe('the detector itself', () => {
  it('finds injected elements and handlers when they are there', async () => {
    const page = await browser.newPage();
    pages.push(page);
    await page.setContent(`<p>text</p><img src="x" onerror="void 0"><svg onload="void 0"></svg><a href="javascript:void 0">x</a>`);
    expect(await injected(page)).toEqual(expect.arrayContaining(['img[onerror]', 'svg[onload]', 'a[href^="javascript:" i]', 'img[onerror]']));
  });
});
