import { mkdtemp, readFile, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser } from './support/browser';
import { demo, type DemoRole } from './support/demo';
import { screenshot } from './support/screenshot';
import { signedInPage } from './support/sign-in';

let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

const signedIn = (role: DemoRole): Promise<Page> => signedInPage(browser, role, 1360);

const write = { 'x-sojourn-csrf': '1' };

describe('a study from submission to a deliverable the client verifies', () => {
  const stamp = Date.now();
  const studyTitle = `Counter staffing for the spring rush ${stamp}`;
  const comment = `Check the arrival rate against the March counts ${stamp}.`;
  let studyId = 0;
  let revisionId = 0;
  let pdfPath = '';

  it('lets the consultant submit the study as revision 1 from the editor', async () => {
    const page = await signedIn('consultant');
    const engagements = (await (await page.request.get(`${demo.url}/api/engagements`)).json()) as { engagements: { id: number; name: string }[] };
    const engagement = engagements.engagements.find((e) => e.name === 'Permit counter wait times');
    expect(engagement).toBeDefined();
    const templates = (await (await page.request.get(`${demo.url}/api/templates`)).json()) as { templates: { key: string }[] };
    const created = await page.request.post(`${demo.url}/api/engagements/${engagement?.id}/studies`, {
      headers: write,
      data: { title: studyTitle, templateKey: templates.templates[0]?.key ?? null },
    });
    expect(created.status()).toBe(201);
    studyId = ((await created.json()) as { study: { id: number } }).study.id;

    await page.goto(`${demo.url}/studies/${studyId}`);
    await page.getByRole('textbox', { name: 'Study text' }).waitFor();
    await page.getByRole('button', { name: 'Submit for review' }).click();
    const dialog = page.getByRole('dialog', { name: 'Submit as revision 1?' });
    await dialog.waitFor();
    await screenshot(page, 'review-submit-confirm');
    await dialog.getByRole('button', { name: 'Submit revision 1' }).click();
    await page.getByRole('dialog', { name: 'Revision 1 submitted' }).waitFor();
    await screenshot(page, 'review-submitted');
    await page.getByRole('button', { name: 'Close' }).click();
    // The draft stays editable; the study now shows its latest revision's state and offers no second submission.
    await page.getByText('In review', { exact: true }).first().waitFor();
    expect(await page.getByRole('button', { name: 'Submit for review' }).count()).toBe(0);

    await page.getByRole('link', { name: 'Revisions' }).click();
    const row = page.getByRole('table', { name: `Revisions of ${studyTitle}` }).getByRole('row').filter({ hasText: 'In review' });
    await row.waitFor();
    await screenshot(page, 'review-study-revisions');
    await page.context().close();
  });

  it('puts it in the partner review list; the partner comments on a block, signs off and releases', async () => {
    const page = await signedIn('partner');
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Waiting for review' }).click();
    await page.getByRole('heading', { name: 'Waiting for your review' }).waitFor();
    await screenshot(page, 'review-queue');
    await page.getByRole('link', { name: `Open revision 1 of ${studyTitle}` }).click();
    await page.waitForURL(/\/revisions\/\d+$/);
    revisionId = Number(/\/revisions\/(\d+)$/.exec(page.url())?.[1]);

    await page.getByRole('button', { name: /^Comment on model block/ }).first().click();
    const thread = page.getByRole('region', { name: /^Comments on model block/ }).first();
    await thread.getByRole('textbox').fill(comment);
    await thread.getByRole('button', { name: 'Add comment' }).click();
    await thread.getByText(comment).waitFor();
    await screenshot(page, 'review-block-comment');

    await page.getByRole('button', { name: 'Approve' }).click();
    await page.getByRole('button', { name: 'Sign off revision 1' }).click();
    const release = page.getByRole('region', { name: 'Release to the client' });
    await release.waitFor();
    await release.getByRole('button', { name: 'Release to the client' }).click();
    await page.getByText('Revision 1 is released').waitFor({ timeout: 60_000 });
    await screenshot(page, 'review-released');
    await page.context().close();
  });

  it('shows the client the deliverable, whose download is a PDF', async () => {
    const page = await signedIn('client');
    await page.getByRole('list', { name: 'Engagements' }).getByRole('listitem').first().getByRole('link').click();
    const table = page.getByRole('table', { name: 'Released reports of this engagement' });
    const row = table.getByRole('row').filter({ hasText: studyTitle });
    await row.waitFor();
    await screenshot(page, 'review-client-deliverables');

    // The button asks for a fresh short-lived link; the test follows that link itself.
    const linkAnswer = page.waitForResponse((r) => r.url().endsWith(`/api/revisions/${revisionId}/pdf`));
    await row.getByRole('button', { name: /^Download PDF/ }).click();
    const { url } = (await (await linkAnswer).json()) as { url: string };
    const pdf = Buffer.from(await (await fetch(new URL(url, demo.url))).arrayBuffer());
    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    pdfPath = path.join(await mkdtemp(path.join(tmpdir(), 'sojourn-e2e-')), 'deliverable.pdf');
    await writeFile(pdfPath, pdf);
    await page.context().close();
  });

  it('verifies the downloaded copy as a valid, unmodified deliverable', async () => {
    const page = await signedIn('client');
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Verify a copy' }).click();
    await page.getByLabel('PDF to check').setInputFiles(pdfPath);
    await page.getByRole('button', { name: 'Check this file' }).click();
    const verdict = page.locator('[data-verdict]');
    await verdict.waitFor({ timeout: 30_000 });
    expect(await verdict.getAttribute('data-verdict')).toBe('valid');
    await verdict.getByText(`revision 1 of ${studyTitle}`, { exact: false }).waitFor();
    await screenshot(page, 'review-verify-valid');

    // One changed byte and the same file is no longer trusted.
    const tampered = await readFile(pdfPath);
    tampered[Math.floor(tampered.length / 2)] ^= 0x01;
    await page.getByLabel('PDF to check').setInputFiles({ name: 'deliverable-edited.pdf', mimeType: 'application/pdf', buffer: tampered });
    await page.getByRole('button', { name: 'Check this file' }).click();
    await expect.poll(() => verdict.getAttribute('data-verdict'), { timeout: 30_000 }).not.toBe('valid');
    await screenshot(page, 'review-verify-modified');
    await page.context().close();
  });
});
