/**
 * Every screen, as the role that uses it, checked with axe-core (WCAG 2.0/2.1 A and AA) in
 * Chromium: no serious or critical violation. Forms are also checked in their error state and
 * dialogs open, since that is where labels and contrast most often go wrong.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { makeA11yFixtures, type A11yFixtures } from './support/a11y-fixtures';
import { describeFindings, seriousViolations } from './support/axe';
import { launchBrowser } from './support/browser';
import { demo, type DemoRole } from './support/demo';
import { screenshot } from './support/screenshot';
import { signIn } from './support/sign-in';

type Who = DemoRole | 'anonymous';

type Screen = {
  name: string;
  who: Who;
  path: (f: A11yFixtures) => string;
  /** Waits until the screen shows its data (not a loading state). */
  ready: (page: Page) => Promise<unknown>;
  /** Brings the screen into the state worth checking: an open form, an error, a dialog. */
  act?: (page: Page) => Promise<unknown>;
  /** A screenshot of the checked state, for people to look at. */
  shot?: string;
  /** A phone-sized window: wide tables scroll, the top bar wraps. */
  width?: number;
};

const heading = (page: Page, name: string | RegExp) => page.getByRole('heading', { name, level: 1 }).waitFor();
const submitEmpty = async (page: Page, button: string) => {
  await page.getByRole('button', { name: button, exact: true }).click();
  await page.locator('[aria-invalid="true"]').first().waitFor();
};

const screens: Screen[] = [
  { name: 'sign in, with a refused password', who: 'anonymous', path: () => '/sign-in', ready: (p) => p.getByLabel('E-mail').waitFor(), act: async (p) => {
    await p.getByLabel('E-mail').fill(demo.users.consultant);
    await p.getByLabel('Password').fill('not the password');
    await p.getByRole('button', { name: 'Sign in' }).click();
    await p.getByRole('alert').first().waitFor();
  }, shot: 'a11y-sign-in-error' },
  { name: 'forgot password, empty', who: 'anonymous', path: () => '/forgot-password', ready: (p) => p.getByLabel('E-mail').waitFor(), act: (p) => submitEmpty(p, 'Send reset link') },
  { name: 'reset password, mismatched', who: 'anonymous', path: () => '/reset-password/not-a-real-token', ready: (p) => p.getByLabel('New password', { exact: true }).waitFor(), act: async (p) => {
    await p.getByLabel('New password', { exact: true }).fill('a long enough sentence');
    await p.getByLabel('Repeat the new password').fill('something else entirely');
    await p.getByRole('button', { name: /password/i }).last().click();
    await p.locator('[aria-invalid="true"]').first().waitFor();
  } },
  { name: 'reset password, link incomplete', who: 'anonymous', path: () => '/reset-password', ready: (p) => heading(p, 'This link is incomplete') },
  { name: 'invitation accept', who: 'anonymous', path: (f) => f.invitationPath, ready: (p) => heading(p, 'Join Sojourn'), shot: 'a11y-invitation' },
  { name: 'invitation, unknown link', who: 'anonymous', path: () => '/invitations/not-a-real-token', ready: (p) => p.getByRole('heading', { level: 1 }).waitFor() },

  { name: 'engagements list (consultant)', who: 'consultant', path: () => '/engagements', ready: (p) => p.getByRole('list', { name: 'Engagements' }).waitFor() },
  { name: 'engagement overview, new study form in error', who: 'consultant', path: (f) => `/engagements/${f.engagementId}`, ready: (p) => p.getByRole('heading', { name: 'Studies', exact: true }).waitFor(), act: async (p) => {
    await p.getByRole('button', { name: 'New study' }).first().click();
    await p.getByRole('button', { name: 'Create and open' }).click();
    await p.getByText('Enter a title').waitFor();
  }, shot: 'a11y-overview-new-study' },
  { name: 'assumption register', who: 'consultant', path: (f) => `/engagements/${f.engagementId}/assumptions`, ready: (p) => p.getByRole('table').first().waitFor() },
  { name: 'assumption dialog in error', who: 'consultant', path: (f) => `/engagements/${f.engagementId}/assumptions`, ready: (p) => p.getByRole('table').first().waitFor(), act: async (p) => {
    await p.getByRole('button', { name: 'New assumption' }).click();
    const dialog = p.getByRole('dialog', { name: 'New assumption' });
    await dialog.getByRole('button', { name: 'Add to register' }).click();
    await dialog.locator('[aria-invalid="true"]').first().waitFor();
  }, shot: 'a11y-assumption-dialog-error' },
  { name: 'datasets list', who: 'consultant', path: (f) => `/engagements/${f.engagementId}/datasets`, ready: (p) => p.getByLabel('File').waitFor() },
  { name: 'dataset fit', who: 'consultant', path: (f) => `/datasets/${f.datasetId}`, ready: async (p) => {
    await p.getByRole('heading', { name: 'Demand' }).waitFor();
    await p.locator('figure svg').first().waitFor();
  }, shot: 'a11y-dataset-fit' },
  { name: 'study editor with model blocks', who: 'consultant', path: (f) => `/studies/${f.studyId}`, ready: async (p) => {
    await p.getByRole('textbox', { name: 'Study text' }).waitFor();
    await p.locator('section.model-block table').first().waitFor();
    await p.locator('section.model-block figure svg').first().waitFor();
    // A chart is one described picture: vega's container carries the words, not each mark.
    const chart = p.locator('section.model-block figure [role="graphics-document"]').first();
    expect(await chart.getAttribute('aria-label')).toMatch(/\w+/);
  } },
  { name: 'study editor, block settings open', who: 'consultant', path: (f) => `/studies/${f.studyId}`, ready: (p) => p.locator('section.model-block table').first().waitFor(), act: async (p) => {
    await p.getByRole('button', { name: 'Edit block' }).first().click();
    await p.getByRole('group', { name: 'Block settings' }).waitFor();
  }, shot: 'a11y-editor-block-settings' },
  { name: 'study editor, picker, option and simulation check open', who: 'consultant', path: (f) => `/studies/${f.studyId}`, ready: (p) => p.locator('section.model-block table').first().waitFor(), act: async (p) => {
    const block = p.locator('section.model-block').filter({ has: p.getByText('Check these figures by simulation') }).first();
    await block.getByText('Check these figures by simulation').click();
    await block.getByRole('button', { name: 'Run a simulation check' }).click();
    await block.getByRole('button', { name: 'Run again with a new seed' }).waitFor({ timeout: 60_000 });
    await block.getByRole('button', { name: 'Edit block' }).click();
    const settings = block.getByRole('group', { name: 'Block settings' });
    await settings.getByRole('button', { name: 'Add an option' }).click();
    await settings.getByRole('button', { name: /^Link to assumption/ }).first().click();
    await settings.locator('select[aria-label^="Assumption for"]').waitFor();
  }, shot: 'a11y-editor-simulation-and-picker' },
  { name: 'study editor, submit dialog', who: 'consultant', path: (f) => `/studies/${f.blankStudyId}`, ready: (p) => p.getByRole('textbox', { name: 'Study text' }).waitFor(), act: async (p) => {
    await p.getByRole('button', { name: 'Submit for review' }).click();
    await p.getByRole('dialog').waitFor();
  } },
  { name: 'assumption register, numbers moved after a change', who: 'consultant', path: (f) => `/engagements/${f.engagementId}/assumptions`, ready: (p) => p.getByRole('table').first().waitFor(), act: async (p) => {
    await p.getByRole('button', { name: /^Edit / }).first().click();
    const value = p.getByRole('dialog').getByLabel('Value');
    await value.fill(String(Number(await value.inputValue()) * 1.05));
    await p.getByRole('dialog').getByRole('button', { name: 'Save change' }).click();
    await p.getByRole('region', { name: /moved/ }).waitFor();
  }, shot: 'a11y-moved-numbers' },
  { name: 'datasets, column mapping after an upload', who: 'consultant', path: (f) => `/engagements/${f.engagementId}/datasets`, ready: (p) => p.getByLabel('File').waitFor(), act: async (p) => {
    const csv = ['arrived_at,started_at,ended_at', '2026-03-02T09:00:00Z,2026-03-02T09:01:00Z,2026-03-02T09:05:00Z', '2026-03-02T09:02:00Z,2026-03-02T09:05:00Z,2026-03-02T09:09:00Z'].join('\n');
    await p.getByLabel('File').setInputFiles({ name: 'a11y-counter-log.csv', mimeType: 'text/csv', buffer: Buffer.from(csv) });
    await p.getByRole('button', { name: 'Upload' }).click();
    await p.getByRole('form', { name: 'Column mapping' }).waitFor({ timeout: 30_000 });
  }, shot: 'a11y-dataset-mapping' },
  { name: 'study reader', who: 'consultant', path: (f) => `/studies/${f.studyId}/read`, ready: (p) => p.locator('table').first().waitFor() },
  { name: 'study revisions list', who: 'consultant', path: (f) => `/studies/${f.studyId}/revisions`, ready: (p) => p.getByRole('table').first().waitFor() },
  { name: 'released revision', who: 'consultant', path: (f) => `/revisions/${f.releasedRevisionId}`, ready: (p) => p.locator('table').first().waitFor() },

  { name: 'review queue', who: 'partner', path: () => '/reviews', ready: (p) => heading(p, 'Waiting for your review') },
  { name: 'revision in review, with decision panel', who: 'partner', path: (f) => `/revisions/${f.inReviewRevisionId}`, ready: (p) => p.getByRole('button', { name: 'Approve' }).waitFor(), act: (p) => p.getByRole('button', { name: /^Comment on model block/ }).first().click(), shot: 'a11y-revision-review' },
  { name: 'revision in review, request changes in error', who: 'partner', path: (f) => `/revisions/${f.inReviewRevisionId}`, ready: (p) => p.getByRole('button', { name: 'Request changes' }).waitFor(), act: async (p) => {
    await p.getByRole('button', { name: 'Request changes' }).click();
    await p.getByLabel('What needs to change').waitFor();
    await p.locator('form button[type="submit"]').filter({ hasText: /changes/i }).first().click();
    await p.locator('[aria-invalid="true"], [role="alert"]').first().waitFor();
  } },
  { name: 'approved revision, release panel', who: 'partner', path: (f) => `/revisions/${f.approvedRevisionId}`, ready: (p) => p.getByRole('region', { name: 'Release to the client' }).waitFor(), shot: 'a11y-release-panel' },
  { name: 'revision compare', who: 'partner', path: (f) => `/revisions/${f.releasedRevisionId}/compare/${f.inReviewRevisionId}`, ready: (p) => p.getByRole('table').first().waitFor(), shot: 'a11y-compare' },

  { name: 'engagements list (client)', who: 'client', path: () => '/engagements', ready: (p) => p.getByRole('list', { name: 'Engagements' }).waitFor() },
  { name: 'engagement overview (client deliverables)', who: 'client', path: (f) => `/engagements/${f.engagementId}`, ready: (p) => p.getByRole('table', { name: 'Released reports of this engagement' }).waitFor() },
  { name: 'deliverables', who: 'client', path: () => '/deliverables', ready: (p) => p.getByRole('table').first().waitFor() },
  { name: 'verify a copy, not a PDF', who: 'client', path: () => '/verify', ready: (p) => p.getByLabel('PDF to check').waitFor(), act: async (p) => {
    await p.getByLabel('PDF to check').setInputFiles({ name: 'notes.pdf', mimeType: 'application/pdf', buffer: Buffer.from('not a pdf at all') });
    await p.getByRole('button', { name: 'Check this file' }).click();
    await p.locator('[data-verdict], [role="alert"]').first().waitFor({ timeout: 30_000 });
  } },
  { name: 'not allowed (client on the register)', who: 'client', path: (f) => `/engagements/${f.engagementId}/assumptions`, ready: (p) => heading(p, 'Not allowed') },

  { name: 'people, invite form in error', who: 'admin', path: () => '/admin/users', ready: (p) => p.getByRole('table').first().waitFor(), act: async (p) => {
    await p.getByRole('button', { name: 'Invite a person' }).click();
    await submitEmpty(p, 'Send invitation');
  }, shot: 'a11y-people-invite-error' },
  { name: 'engagement admin, new engagement in error', who: 'admin', path: () => '/admin/engagements', ready: (p) => p.getByRole('table').first().waitFor(), act: async (p) => {
    await p.getByRole('button', { name: 'New engagement' }).click();
    await p.locator('form button[type="submit"]').first().click();
    await p.locator('[aria-invalid="true"]').first().waitFor();
  } },
  { name: 'engagement admin, members', who: 'admin', path: () => '/admin/engagements', ready: (p) => p.getByRole('table').first().waitFor(), act: async (p) => {
    await p.getByRole('table').first().getByRole('link').first().click();
    await p.getByRole('heading', { name: /Members/ }).first().waitFor();
  }, shot: 'a11y-engagement-members' },
  { name: 'audit trail', who: 'admin', path: () => '/admin/audit', ready: (p) => p.getByRole('table').first().waitFor() },
  { name: 'mailbox', who: 'admin', path: () => '/admin/mailbox', ready: (p) => p.getByRole('article').first().waitFor() },
  { name: 'engagements list (admin)', who: 'admin', path: () => '/engagements', ready: (p) => p.getByRole('list', { name: 'Engagements' }).waitFor() },
  { name: 'engagement overview, phone width', who: 'consultant', width: 390, path: (f) => `/engagements/${f.engagementId}`, ready: (p) => p.getByRole('heading', { name: 'Studies', exact: true }).waitFor() },
  { name: 'study editor, phone width', who: 'consultant', width: 390, path: (f) => `/studies/${f.studyId}`, ready: (p) => p.locator('section.model-block table').first().waitFor(), shot: 'a11y-editor-phone' },
  { name: 'study reader, phone width', who: 'consultant', width: 390, path: (f) => `/studies/${f.studyId}/read`, ready: (p) => p.locator('table').first().waitFor() },
  { name: 'revision compare, phone width', who: 'partner', width: 390, path: (f) => `/revisions/${f.releasedRevisionId}/compare/${f.inReviewRevisionId}`, ready: (p) => p.getByRole('table').first().waitFor() },
  { name: 'audit trail, phone width', who: 'admin', width: 390, path: () => '/admin/audit', ready: (p) => p.getByRole('table').first().waitFor() },
  { name: 'assumption register, phone width', who: 'consultant', width: 390, path: (f) => `/engagements/${f.engagementId}/assumptions`, ready: (p) => p.getByRole('table').first().waitFor() },
  { name: 'dataset fit, phone width', who: 'consultant', width: 390, path: (f) => `/datasets/${f.datasetId}`, ready: (p) => p.locator('figure svg').first().waitFor() },
  { name: 'deliverables, phone width', who: 'client', width: 390, path: () => '/deliverables', ready: (p) => p.getByRole('table').first().waitFor() },
  { name: 'people, phone width', who: 'admin', width: 390, path: () => '/admin/users', ready: (p) => p.getByRole('table').first().waitFor() },
  { name: 'page not found', who: 'admin', path: () => '/no-such-page', ready: (p) => heading(p, 'Page not found') },
];

let browser: Browser;
let fixtures: A11yFixtures;
const pages = new Map<Who, Page>();

beforeAll(async () => {
  browser = await launchBrowser();
  // The app's CSP allows no inline script; bypassCSP lets the test inject axe-core, nothing else.
  const newPage = async () => (await browser.newContext({ viewport: { width: 1280, height: 900 }, locale: 'en-GB', bypassCSP: true })).newPage();
  for (const role of ['consultant', 'partner', 'client', 'admin'] as const) {
    const page = await newPage();
    await signIn(page, role);
    pages.set(role, page);
  }
  pages.set('anonymous', await newPage());
  const request = (role: DemoRole) => pages.get(role)!.request;
  fixtures = await makeA11yFixtures({ consultant: request('consultant'), partner: request('partner'), admin: request('admin') });
}, 120_000);
afterAll(async () => {
  await browser?.close();
});

describe('the checker itself', () => {
  it('reports a planted contrast failure and an unlabelled image, with their selectors', async () => {
    const page = pages.get('anonymous')!;
    await page.goto(`${demo.url}/sign-in`);
    await page.getByLabel('E-mail').waitFor();
    await page.evaluate(() => {
      const probe = document.createElement('div');
      probe.id = 'axe-probe';
      probe.innerHTML = '<p style="color:#c8c8c8;background:#fff">faint words</p><img src="/favicon.ico">';
      document.querySelector('main')?.append(probe);
    });
    const findings = await seriousViolations(page);
    expect(findings.map((f) => f.id).sort()).toEqual(['color-contrast', 'image-alt']);
    // One offending node each, named by a selector the report prints.
    expect(findings.map((f) => f.targets.length)).toEqual([1, 1]);
  });
});

describe('every screen passes axe-core (WCAG 2.1 AA) without serious or critical violations', () => {
  it.each(screens.map((s) => [s.name, s] as const))('%s', async (_name, screen) => {
    const page = pages.get(screen.who)!;
    await page.setViewportSize({ width: screen.width ?? 1280, height: 900 });
    await page.goto(`${demo.url}${screen.path(fixtures)}`);
    await screen.ready(page);
    await screen.act?.(page);
    if (screen.shot) await screenshot(page, screen.shot);
    const findings = await seriousViolations(page);
    expect(findings, describeFindings(screen.name, findings)).toEqual([]);
  });
});
