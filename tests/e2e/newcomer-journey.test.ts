/**
 * A newcomer's journey, only through the screens, one browser context per person: the
 * administrator sets up a new engagement and invites a consultant; the consultant accepts,
 * uploads an event log, turns its fit into assumptions and writes a study whose model block uses
 * them; the partner reviews, signs off and releases; the client downloads the signed PDF and
 * verifies it (and sees a one-byte-altered copy refused).
 *
 * Like every e2e suite it runs against the throwaway stack scripts/stack/test-stack.ts boots for
 * the run — fresh MariaDB, the committed migrations, the demo seed, the S3 and SMTP fakes, the
 * built web app and the real API server — the same path `npm start` takes on a fresh machine.
 * Screenshots of every step land in test-artifacts/e2e/newcomer-*.png.
 */
import { copyFile, mkdtemp, readFile, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Locator, Page } from 'playwright-core';
import { DEMO_LOG_OPTIONS, eventLogCsv } from '../../fakes/demo-event-log';
import { CSRF_HEADER, CSRF_HEADER_VALUE } from '../../shared/api-error';
import { launchBrowser } from './support/browser';
import { demo } from './support/demo';
import { captureDownload } from './support/download';
import { mailboxLink } from './support/mailbox-link';
import { pdfText } from './support/pdf-text';
import { screenshot } from './support/screenshot';
import { screenshotAround } from './support/screenshot-around';
import { signIn, signedInPage } from './support/sign-in';

let browser: Browser;
let work = '';

beforeAll(async () => {
  browser = await launchBrowser();
  work = await mkdtemp(path.join(tmpdir(), 'sojourn-newcomer-'));
});
afterAll(async () => {
  await browser?.close();
});

/** A person at their own desk: own cookies, nobody signed in yet. */
async function freshPage(): Promise<Page> {
  const context = await browser.newContext({ viewport: { width: 1360, height: 900 }, locale: 'en-GB' });
  return context.newPage();
}

const shot = (page: Page, step: string): Promise<void> => screenshot(page, `newcomer-${step}`);
/** For the study editor, many screens tall: the viewport around the step's subject. */
const shotAround = (locator: Locator, step: string): Promise<void> => screenshotAround(locator, `newcomer-${step}`);

/** From anywhere in the app, through the main navigation and the engagement's card. */
async function openEngagement(page: Page, name: string): Promise<void> {
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Engagements' }).click();
  await page.getByRole('list', { name: 'Engagements' }).getByRole('listitem').filter({ hasText: name }).getByRole('link').first().click();
  await page.getByRole('heading', { name, level: 1 }).waitFor();
}

/** Picks the option of a <select> whose text mentions `text` (option labels carry name, e-mail and role). */
async function chooseOption(page: Page, label: string, text: string): Promise<void> {
  const select = page.getByLabel(label, { exact: true });
  const option = await select.locator('option', { hasText: text }).first().textContent();
  await select.selectOption({ label: option ?? text });
}

describe("a newcomer's journey from a new engagement to a verified deliverable", () => {
  const stamp = Date.now();
  const engagementName = `Ferry ticket hall staffing ${stamp}`;
  const clientName = 'Brackenfold Harbour Ferries';
  const consultant = { name: 'Tamsin Arkwright', email: `tamsin.${stamp}@sojourn.test`, password: 'low tide at the north quay' };
  const logName = `ticket-hall-log-${stamp}.csv`;
  const studyTitle = `Ticket hall windows for the summer timetable ${stamp}`;
  const blockTitle = 'Ticket windows in the busiest hour';
  const heading = 'What the ticket hall log shows';
  const paragraph = `Three weeks of ticket hall arrivals were fitted before this study was written (${stamp}).`;
  let invitation = '';
  let engagementId = 0;
  let pdfPath = '';

  // Suites that run after this one on the same stack expect the demo client in one engagement
  // only: take them off this one again, whether the journey got to the end or not.
  afterAll(async () => {
    if (!engagementId) return;
    const admin = await signedInPage(browser, 'admin');
    const members = (await (await admin.request.get(`${demo.url}/api/engagements/${engagementId}/members`)).json()) as { members: { userId: number; email: string }[] };
    const client = members.members.find((m) => m.email === demo.users.client);
    if (client) {
      const removed = await admin.request.delete(`${demo.url}/api/engagements/${engagementId}/members/${client.userId}`, { headers: { [CSRF_HEADER]: CSRF_HEADER_VALUE } });
      expect(removed.ok()).toBe(true);
    }
    await admin.context().close();
  });

  /** The new consultant at their own desk, signed in with the password they chose. */
  async function consultantSignsIn(): Promise<Page> {
    const page = await freshPage();
    await page.goto(`${demo.url}/sign-in`);
    await page.getByLabel('E-mail').fill(consultant.email);
    await page.getByLabel('Password').fill(consultant.password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('button', { name: 'Sign out' }).waitFor();
    return page;
  }

  it('1. the administrator creates the engagement, invites the consultant and adds the members', async () => {
    const admin = await freshPage();
    await signIn(admin, 'admin');
    await admin.getByRole('list', { name: 'Engagements' }).waitFor();
    await shot(admin, '01-admin-signed-in');

    await admin.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Engagement admin' }).click();
    await admin.getByRole('button', { name: 'New engagement' }).click();
    await admin.getByLabel('Engagement name').fill(engagementName);
    await admin.getByLabel('Client').fill(clientName);
    await admin.getByLabel('Description').fill('How many ticket windows the hall needs so that nine in ten travellers are served within five minutes.');
    await shot(admin, '02-new-engagement-form');
    await admin.getByRole('button', { name: 'Create engagement' }).click();
    await admin.getByRole('heading', { name: engagementName, level: 1 }).waitFor();
    engagementId = Number(/\/engagements\/(\d+)/.exec(admin.url())?.[1]);

    // The new consultant has no account yet: the members panel points to where people are invited.
    await admin.getByRole('link', { name: 'Invite them under People' }).click();
    await admin.getByRole('button', { name: 'Invite a person' }).click();
    await admin.getByLabel('E-mail').fill(consultant.email);
    await admin.getByLabel('Name', { exact: true }).fill(consultant.name);
    await admin.getByLabel('Role', { exact: true }).selectOption('consultant');
    await shot(admin, '03-invite-form');
    await admin.getByRole('button', { name: 'Send invitation', exact: true }).click();
    await admin.getByRole('cell', { name: consultant.email, exact: true }).waitFor();

    await admin.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Engagement admin' }).click();
    await admin.getByRole('table', { name: 'All engagements' }).getByRole('link', { name: engagementName }).click();
    for (const email of [demo.users.partner, demo.users.client, consultant.email]) {
      await chooseOption(admin, 'Person', email);
      await admin.getByRole('button', { name: 'Add to engagement' }).click();
      await admin.getByRole('table', { name: 'Members of this engagement' }).getByRole('cell', { name: email, exact: true }).waitFor();
    }
    await admin.getByRole('status').filter({ hasText: `${consultant.name} added.` }).waitFor();
    await shot(admin, '04-engagement-members');

    invitation = await mailboxLink(admin, consultant.email);
    await shot(admin, '05-mailbox-invitation');
    await admin.context().close();
  });

  it('2. the consultant follows the invitation, sets a password and opens the engagement', async () => {
    const page = await freshPage();
    await page.goto(invitation);
    await page.getByRole('heading', { name: 'Join Sojourn' }).waitFor();
    await page.getByLabel('Password', { exact: true }).fill(consultant.password);
    await page.getByLabel('Repeat the password').fill(consultant.password);
    await shot(page, '06-accept-invitation');
    await page.getByRole('button', { name: 'Accept and sign in' }).click();
    await page.getByTestId('current-user-name').filter({ hasText: consultant.name }).waitFor();
    const card = page.getByRole('list', { name: 'Engagements' }).getByRole('listitem').filter({ hasText: engagementName });
    await card.waitFor();
    await shot(page, '07-consultant-first-screen');
    await card.getByRole('link').first().click();
    await page.getByRole('heading', { name: engagementName, level: 1 }).waitFor();
    await page.getByText('No studies yet').waitFor();
    await page.getByRole('table', { name: 'Members of this engagement' }).waitFor();
    await shot(page, '08-consultant-engagement');
    await page.context().close();
  });

  it('3–4. the consultant uploads a log, makes assumptions from its fit and writes a study with a block that uses them', async () => {
    // Three weeks of an invented ticket hall: the demo log generator, seeded, about 3,000 rows.
    const csv = eventLogCsv({ ...DEMO_LOG_OPTIONS, seed: 4711, days: 21, serviceMeanSeconds: 270 });
    expect(csv.split('\n').length).toBeGreaterThan(2000);
    const file = path.join(work, logName);
    await writeFile(file, csv);

    const page = await consultantSignsIn();
    await openEngagement(page, engagementName);

    await page.getByRole('link', { name: 'Open datasets →' }).click();
    await page.getByLabel('File').setInputFiles(file);
    await page.getByRole('button', { name: 'Upload' }).click();
    await page.getByRole('form', { name: 'Column mapping' }).waitFor();
    expect(await page.getByLabel('Arrival time').inputValue()).toBe('arrived_at');
    await shot(page, '09-column-mapping');
    await page.getByRole('button', { name: 'Save mapping and fit' }).click();
    await page.getByRole('heading', { name: 'Service time' }).waitFor({ timeout: 60_000 });
    await shot(page, '10-fit');
    const make = page.getByRole('form', { name: 'Make assumptions' });
    await make.getByRole('button', { name: /^Add \d+ to the register$/ }).click();
    await page.getByText(/\d+ assumptions added to the register/).waitFor();
    await shot(page, '11-assumptions-added');

    await openEngagement(page, engagementName);
    await page.getByRole('button', { name: 'New study' }).click();
    await page.getByRole('radio', { name: /Service-desk staffing/ }).check();
    await page.getByLabel('Title').fill(studyTitle);
    await shot(page, '12-new-study');
    await page.getByRole('button', { name: 'Create and open' }).click();
    await page.waitForURL(/\/studies\/\d+$/);
    const text = page.getByRole('textbox', { name: 'Study text' });
    await text.waitFor();

    // A section of one's own at the end of the template's text, then a block below it.
    await text.locator('p').first().click();
    await page.keyboard.press('Control+End');
    await page.keyboard.press('Enter');
    await page.getByRole('toolbar', { name: 'Writing tools' }).getByRole('button', { name: 'Section', exact: true }).click();
    await page.keyboard.type(heading);
    await page.keyboard.press('Enter');
    await page.keyboard.type(paragraph);
    await text.getByRole('heading', { name: heading }).waitFor();
    await page.getByRole('button', { name: 'Insert model block' }).click();

    const settings = page.getByRole('group', { name: 'Block settings' });
    await settings.getByLabel('Block title').fill(blockTitle);
    const logStem = logName.replace(/\.csv$/, '');
    await settings.getByRole('button', { name: 'Link to assumption for Arrival rate λ' }).click();
    await chooseOption(page, 'Assumption for Arrival rate λ', `Arrival rate, busiest hour (${logStem})`);
    await settings.getByRole('button', { name: 'Link to assumption for Service rate μ per server' }).click();
    await chooseOption(page, 'Assumption for Service rate μ per server', `Service time, mean (${logStem})`);
    await settings.getByText(/^Linked: Service time, mean/).waitFor();
    await settings.getByLabel('Servers c').fill('3');
    await shotAround(settings, '13-block-settings');
    await settings.getByRole('button', { name: 'Done' }).click();

    // The browser previews at once; the server's figures replace the preview after the autosave.
    const block = page.getByRole('region', { name: `Model block: ${blockTitle}` });
    await block.getByRole('table', { name: blockTitle }).waitFor();
    await block.getByText('Preview — not yet confirmed by the server').waitFor({ state: 'detached', timeout: 30_000 });
    // λ ≈ 28 an hour at the busiest hour, a 4.4-minute mean service (μ ≈ 13.6 an hour), three windows.
    const rhoRow = block.getByRole('row').filter({ has: page.getByRole('rowheader', { name: 'Utilisation ρ', exact: true }) });
    const rho = Number(((await rhoRow.getByRole('cell').last().textContent()) ?? '').replace(/[\u2007\s]/g, ''));
    expect(rho).toBeGreaterThan(30);
    expect(rho).toBeLessThan(100);
    await page.getByRole('status').filter({ hasText: /^Saved/ }).waitFor({ timeout: 30_000 });
    await shotAround(block, '14-study-saved');
    await page.context().close();
  });

  it('5. the consultant submits; the partner finds it, reads it, signs off and releases it', async () => {
    const page = await consultantSignsIn();
    await openEngagement(page, engagementName);
    await page.getByRole('link', { name: `Write ${studyTitle}` }).click();
    await page.getByRole('textbox', { name: 'Study text' }).waitFor();
    await page.getByRole('button', { name: 'Submit for review' }).click();
    const confirm = page.getByRole('dialog', { name: 'Submit as revision 1?' });
    await confirm.waitFor();
    // The study keeps the template's guidance and placeholders: the author is told, not stopped.
    await confirm.getByRole('alert').filter({ hasText: 'Template text left in the study' }).getByText(/placeholders? still to fill in \(\[number\]/).waitFor();
    await shotAround(confirm, '15-submit-confirm');
    await confirm.getByRole('button', { name: 'Submit revision 1' }).click();
    const submitted = page.getByRole('dialog', { name: 'Revision 1 submitted' });
    await submitted.waitFor();
    await shotAround(submitted, '16-submitted');
    await page.context().close();

    const partner = await signedInPage(browser, 'partner', 1360);
    await partner.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Waiting for review' }).click();
    await partner.getByRole('heading', { name: 'Waiting for your review' }).waitFor();
    await shot(partner, '17-review-queue');
    await partner.getByRole('link', { name: `Open revision 1 of ${studyTitle}` }).click();
    await partner.getByRole('heading', { name: heading }).waitFor();
    await partner.getByText(paragraph).waitFor();
    await partner.getByRole('figure', { name: blockTitle }).getByRole('rowheader', { name: 'Utilisation ρ', exact: true }).waitFor();
    await shotAround(partner.getByRole('heading', { name: heading }), '18-partner-reads');
    await partner.getByRole('button', { name: 'Approve' }).click();
    await partner.getByRole('button', { name: 'Sign off revision 1' }).click();
    const release = partner.getByRole('region', { name: 'Release to the client' });
    await release.waitFor();
    await shotAround(release, '19-signed-off');
    await release.getByRole('button', { name: 'Release to the client' }).click();
    const released = partner.getByText('Revision 1 is released');
    await released.waitFor({ timeout: 60_000 });
    await shotAround(released, '20-released');
    await partner.context().close();
  });

  it('6. the client sees the deliverable and downloads a PDF naming the study and the engagement', async () => {
    const page = await signedInPage(browser, 'client', 1360);
    await openEngagement(page, engagementName);
    const row = page.getByRole('table', { name: 'Released reports of this engagement' }).getByRole('row').filter({ hasText: studyTitle });
    await row.waitFor();
    await shot(page, '21-client-deliverables');

    const download = await captureDownload(page, () => row.getByRole('button', { name: `Download PDF of ${studyTitle}, revision 1` }).click());
    pdfPath = path.join(work, 'deliverable.pdf');
    await download.saveAs(pdfPath);
    const bytes = await readFile(pdfPath);
    expect(bytes.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    const text = await pdfText(pdfPath);
    expect(text).toContain(studyTitle);
    expect(text).toContain(engagementName);
    expect(text).toContain(heading);
    await shot(page, '22-client-downloaded');
    await page.context().close();
  });

  it('7. the client verifies the downloaded copy, and a one-byte-altered copy is refused', async () => {
    const page = await signedInPage(browser, 'client', 1360);
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Verify a copy' }).click();
    await page.getByLabel('PDF to check').setInputFiles(pdfPath);
    await page.getByRole('button', { name: 'Check this file' }).click();
    const verdict = page.getByRole('status').filter({ has: page.getByRole('heading', { name: 'Valid: an unmodified deliverable' }) });
    await verdict.waitFor({ timeout: 30_000 });
    await verdict.getByText(`revision 1 of ${studyTitle}`).waitFor();
    await verdict.getByText(/signed off by Rafael Okonjo/).waitFor();
    await shot(page, '23-verify-valid');

    const altered = path.join(work, 'deliverable-altered.pdf');
    await copyFile(pdfPath, altered);
    const bytes = await readFile(altered);
    bytes[Math.floor(bytes.length / 2)] ^= 0x01;
    await writeFile(altered, bytes);
    await page.getByLabel('PDF to check').setInputFiles(altered);
    await page.getByRole('button', { name: 'Check this file' }).click();
    await page.getByRole('heading', { name: 'Modified, or not signed by this firm' }).waitFor({ timeout: 30_000 });
    expect(await page.getByRole('heading', { name: 'Valid: an unmodified deliverable' }).count()).toBe(0);
    await shot(page, '24-verify-altered');
    await page.context().close();
  });
});
