/** A consultant uploads an event log, maps it, reads the fit and charts, makes assumptions and uses them in a block. */
import { writeFile, mkdtemp } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { eventLogCsv, DEMO_LOG_OPTIONS } from '../../fakes/demo-event-log';
import { CSRF_HEADER, CSRF_HEADER_VALUE } from '../../shared/api-error';
import { launchBrowser } from './support/browser';
import { demo } from './support/demo';
import { screenshot } from './support/screenshot';
import { signIn } from './support/sign-in';

let browser: Browser;
let page: Page;

beforeAll(async () => {
  browser = await launchBrowser();
  const context = await browser.newContext({ viewport: { width: 1280, height: 900 }, locale: 'en-GB', timezoneId: 'UTC' });
  page = await context.newPage();
});
afterAll(async () => {
  await browser?.close();
});

describe('datasets in the browser', () => {
  it('shows the seeded demo log fitted, with its charts', async () => {
    await signIn(page, 'consultant');
    await page.getByRole('link', { name: /Permit counter wait times/ }).first().click();
    await page.getByRole('link', { name: 'Open datasets →' }).click();
    await page.getByRole('link', { name: 'permit-counter-march.csv' }).click();
    await page.getByRole('heading', { name: 'Demand' }).waitFor();
    await page.locator('figure svg').first().waitFor();
    await screenshot(page, 'datasets-demo-fit');
  });

  it('uploads, maps, fits, makes assumptions and adds a staffing block to a study', async () => {
    const dir = await mkdtemp(path.join(tmpdir(), 'sojourn-e2e-'));
    const file = path.join(dir, 'intake-desk-log.csv');
    await writeFile(file, eventLogCsv({ ...DEMO_LOG_OPTIONS, seed: 99, days: 14, serviceMeanSeconds: 600 }));

    await page.goto(`${demo.url}/engagements`);
    await page.getByRole('link', { name: /Donor intake desk capacity/ }).first().click();
    const engagementId = Number(page.url().split('/').pop());
    await page.getByRole('link', { name: 'Open datasets →' }).click();
    await page.getByLabel('File').setInputFiles(file);
    await page.getByRole('button', { name: 'Upload' }).click();
    await page.getByRole('form', { name: 'Column mapping' }).waitFor();
    expect(await page.getByLabel('Arrival time').inputValue()).toBe('arrived_at');
    await page.getByLabel('Time zone').selectOption('UTC');
    await screenshot(page, 'datasets-mapping');
    await page.getByRole('button', { name: 'Save mapping and fit' }).click();

    await page.getByRole('heading', { name: 'Service time' }).waitFor({ timeout: 30_000 });
    await page.locator('figure svg').nth(2).waitFor();
    await expect(page.getByText(/Service times are clearly not exponential|doubtful|contradicts/).count()).resolves.toBeGreaterThan(0);
    await screenshot(page, 'datasets-fit');

    const name = page.getByRole('form', { name: 'Make assumptions' }).getByLabel('Name');
    await name.nth(2).fill('Intake service time');
    await page.getByRole('button', { name: /Add 4 to the register/ }).click();
    await page.getByText('4 assumptions added to the register').waitFor();

    // A draft study to receive the block (made through the API, as the studies screen would).
    const created = await page.request.post(`${demo.url}/api/engagements/${engagementId}/studies`, { headers: { [CSRF_HEADER]: CSRF_HEADER_VALUE }, data: { title: 'Intake desks by hour', templateKey: null } });
    expect(created.status()).toBe(201);
    await page.reload();
    const form = page.getByRole('form', { name: 'Add an interval staffing block' });
    await form.waitFor();
    await form.getByLabel('Draft study').selectOption({ label: 'Intake desks by hour' });
    await form.getByLabel('Demand of').selectOption({ label: 'Mondays' });
    const serviceSelect = form.getByLabel(/Service time or rate/);
    const optionLabel = await serviceSelect.locator('option', { hasText: 'Intake service time' }).textContent();
    await serviceSelect.selectOption({ label: optionLabel! });
    await screenshot(page, 'datasets-staffing-form');
    await form.getByRole('button', { name: 'Add the block to the study' }).click();
    await page.getByText('Staffing block added').waitFor();
    await page.getByRole('link', { name: 'Open the study to review it' }).click();
    await page.getByText('Staffing per hour, Mondays').first().waitFor({ timeout: 30_000 });
    await page.waitForTimeout(1000);
    await screenshot(page, 'datasets-block-in-study');
  });
});
