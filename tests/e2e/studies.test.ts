import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Locator, Page } from 'playwright-core';
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

const signedIn = (role: DemoRole): Promise<Page> => signedInPage(browser, role);

/** A results cell as printed: decimal-alignment padding (figure spaces) removed. */
async function resultFor(table: Locator, measure: string): Promise<string> {
  const row = table.getByRole('row').filter({ has: table.page().getByRole('rowheader', { name: measure, exact: true }) });
  return ((await row.getByRole('cell').last().textContent()) ?? '').replace(/[\u2007\s]/g, '');
}

/** Waits until the server holds the study with `text` in it (autosave is debounced). */
async function waitUntilSaved(page: Page, studyId: number, text: string): Promise<void> {
  await expect
    .poll(async () => JSON.stringify(await (await page.request.get(`${demo.url}/api/studies/${studyId}`)).json()), { timeout: 15_000 })
    .toContain(text);
}

// The drawing itself: vega-embed replaces the role and label its container is given, so the
// chart is found as the SVG inside the block's figure.
const chartOf = (block: Locator) => block.locator('figure svg').first();

const studyText = (page: Page) => page.getByRole('textbox', { name: 'Study text' });

describe('a consultant writing a study whose numbers follow the register', () => {
  const stamp = Date.now();
  const studyTitle = `Lobby desks at the permits office ${stamp}`;
  const assumptionName = `Lobby arrivals at noon ${stamp}`;
  const blockTitle = `Lobby desks at noon ${stamp}`;
  let engagementId = 0;
  let studyId = 0;

  it('starts a study from a template and lands in the editor', async () => {
    const page = await signedIn('consultant');
    await page.getByRole('list', { name: 'Engagements' }).getByRole('listitem').first().getByRole('link').click();
    await page.getByRole('heading', { name: 'Studies', exact: true }).waitFor();
    engagementId = Number(/\/engagements\/(\d+)/.exec(page.url())?.[1]);

    await page.getByRole('button', { name: 'New study' }).click();
    await page.getByRole('radio', { name: /Service-desk staffing/ }).check();
    await page.getByRole('button', { name: 'Create and open' }).click();
    await page.getByText('Enter a title').waitFor();
    await page.getByLabel('Title').fill(studyTitle);
    await screenshot(page, 'studies-new-study-form');
    await page.getByRole('button', { name: 'Create and open' }).click();
    await page.waitForURL(/\/studies\/\d+$/);
    studyId = Number(/\/studies\/(\d+)$/.exec(page.url())?.[1]);
    await studyText(page).waitFor();

    await page.goto(`${demo.url}/engagements/${engagementId}`);
    const row = page.getByRole('table', { name: 'Studies of this engagement' }).getByRole('row').filter({ hasText: studyTitle });
    await row.getByText('Draft').waitFor();
    expect(await row.getByRole('link', { name: `Read ${studyTitle}` }).getAttribute('href')).toBe(`/studies/${studyId}/read`);
    await page.context().close();
  });

  it('adds an assumption to the register and links a new M/M/c block with a chart to it', async () => {
    const page = await signedIn('consultant');
    await page.goto(`${demo.url}/engagements/${engagementId}/assumptions`);
    await page.getByRole('button', { name: 'New assumption' }).click();
    const dialog = page.getByRole('dialog', { name: 'New assumption' });
    await dialog.getByLabel('Name').fill(assumptionName);
    await dialog.getByLabel('Value').fill('120');
    await dialog.getByLabel('Unit').selectOption('per_hour');
    await dialog.getByLabel('Source', { exact: true }).selectOption('client');
    await dialog.getByLabel('Source detail').fill('Lobby head count, three sample weekdays');
    await dialog.getByRole('button', { name: 'Add to register' }).click();
    await page.getByRole('cell', { name: assumptionName, exact: true }).waitFor();

    await page.goto(`${demo.url}/studies/${studyId}`);
    await studyText(page).locator('p').first().click();
    await page.getByRole('button', { name: 'Insert model block' }).click();
    const settings = page.getByRole('group', { name: 'Block settings' });
    await settings.getByLabel('Block title').fill(blockTitle);
    await expect(settings.getByLabel('Calculation').inputValue()).resolves.toBe('M/M/c');
    // The inputs run λ, μ, c, …: the first link button is the arrival rate's.
    await settings.getByRole('button', { name: 'Link to assumption' }).first().click();
    const picker = settings.getByLabel('Assumption for Arrival rate λ');
    const option = await picker.locator('option', { hasText: assumptionName }).getAttribute('value');
    await picker.selectOption(option ?? '');
    await settings.getByText(`Linked: ${assumptionName}`).waitFor();
    await settings.getByLabel('Draw a chart over one input').check();
    await settings.getByRole('button', { name: 'Done' }).click();

    const block = page.getByRole('region', { name: `Model block: ${blockTitle}` });
    // λ = 120 per hour, μ = 15 per hour, c = 10: ρ = λ / (c μ) = 0.8.
    await expect.poll(() => resultFor(block.getByRole('table', { name: blockTitle }), 'Utilisation ρ')).toBe('80.0');
    await chartOf(block).waitFor();
    await waitUntilSaved(page, studyId, blockTitle);
    await screenshot(page, 'studies-linked-block');
    await page.context().close();
  });

  it('changes the assumption in the register, lists the moved numbers and the study shows them', async () => {
    const page = await signedIn('consultant');
    await page.goto(`${demo.url}/studies/${studyId}`);
    const block = page.getByRole('region', { name: `Model block: ${blockTitle}` });
    const chart = chartOf(block);
    await chart.waitFor();
    const chartBefore = await chart.innerHTML();

    await page.goto(`${demo.url}/engagements/${engagementId}/assumptions`);
    await page.getByRole('button', { name: `Edit ${assumptionName}` }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByLabel('Value').fill('135');
    await dialog.getByRole('button', { name: 'Save change' }).click();
    const panel = page.getByRole('region', { name: /numbers? moved/ });
    await panel.waitFor();
    await panel.getByText(studyTitle).waitFor();
    const moved = panel.getByRole('table', { name: `Numbers that moved in ${blockTitle}` });
    const rho = moved.getByRole('row').filter({ hasText: 'Utilisation ρ' });
    expect(await rho.getByRole('cell').allTextContents()).toEqual(expect.arrayContaining(['80.0', '90.0', '%']));
    await screenshot(page, 'studies-moved-numbers');

    // Back into the study through the panel (client-side navigation): the new numbers, not a cached copy.
    await panel.getByRole('link', { name: studyTitle }).click();
    await expect.poll(() => resultFor(block.getByRole('table', { name: blockTitle }), 'Utilisation ρ')).toBe('90.0');
    await chart.waitFor();
    await expect.poll(() => chart.innerHTML()).not.toBe(chartBefore);
    await screenshot(page, 'studies-block-after-change');
    await page.context().close();
  });

  it('refuses to delete the assumption while the block uses it, naming the block', async () => {
    const page = await signedIn('consultant');
    await page.goto(`${demo.url}/engagements/${engagementId}/assumptions`);
    await page.getByRole('button', { name: `Delete ${assumptionName}` }).click();
    await page.getByRole('button', { name: 'Delete', exact: true }).click();
    const refusal = page.getByRole('alert').filter({ hasText: 'was not deleted' });
    await refusal.getByText(`${studyTitle} — ${blockTitle}`).waitFor();
    await expect(page.getByRole('cell', { name: assumptionName, exact: true }).count()).resolves.toBe(1);
    await page.context().close();
  });

  it('tells the first writer about a newer save by someone else and keeps their text', async () => {
    const first = await signedIn('consultant');
    await first.goto(`${demo.url}/studies/${studyId}`);
    await studyText(first).waitFor();

    const second = await signedIn('partner');
    await second.goto(`${demo.url}/studies/${studyId}`);
    await studyText(second).locator('p').first().click();
    await second.keyboard.press('End');
    const theirs = ` Partner remark ${stamp}.`;
    await second.keyboard.type(theirs);
    await waitUntilSaved(second, studyId, theirs.trim());

    await studyText(first).locator('p').first().click();
    await first.keyboard.press('End');
    const mine = ` Consultant sentence ${stamp} that must survive.`;
    await first.keyboard.type(mine);
    await first.getByText('Someone else saved this study while you were writing').waitFor({ timeout: 15_000 });
    await expect(studyText(first).textContent()).resolves.toContain(mine.trim());
    await screenshot(first, 'studies-conflict');

    await first.getByRole('button', { name: 'Keep my text as a new copy' }).click();
    await first.waitForURL((url) => /\/studies\/\d+$/.test(url.pathname) && !url.pathname.endsWith(`/${studyId}`));
    await expect.poll(() => studyText(first).textContent()).toContain(mine.trim());
    await first.context().close();
    await second.context().close();
  });
});

describe('who sees studies on the engagement overview', () => {
  it('shows an administrator the studies to read but no way to start one', async () => {
    const page = await signedIn('admin');
    await page.getByRole('list', { name: 'Engagements' }).getByRole('listitem').first().getByRole('link').click();
    await page.getByRole('heading', { name: 'Studies', exact: true }).waitFor();
    await page.getByRole('link', { name: 'Assumption register' }).waitFor();
    expect(await page.getByRole('button', { name: 'New study' }).count()).toBe(0);
    await page.context().close();
  });

  it('keeps studies and the register from a client', async () => {
    const page = await signedIn('client');
    await page.getByRole('list', { name: 'Engagements' }).getByRole('listitem').first().getByRole('link').click();
    await page.getByRole('heading', { name: 'Deliverables', exact: true }).waitFor();
    expect(await page.getByRole('heading', { name: 'Studies', exact: true }).count()).toBe(0);
    const engagement = /\/engagements\/(\d+)/.exec(page.url())?.[1];
    await page.goto(`${demo.url}/engagements/${engagement}/assumptions`);
    await page.getByRole('heading', { name: 'Not allowed' }).waitFor();
    await page.context().close();
  });
});
