import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { launchBrowser } from './support/browser';
import { demo } from './support/demo';
import { screenshot } from './support/screenshot';
import { signIn } from './support/sign-in';

const ADMIN_AREAS = ['People', 'Engagement admin', 'Audit trail', 'Mailbox'];

let browser: Browser;
let context: BrowserContext;
let page: Page;

beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});
beforeEach(async () => {
  context = await browser.newContext({ viewport: { width: 1280, height: 860 }, locale: 'en-GB' });
  page = await context.newPage();
});
afterEach(async () => {
  await context?.close();
});

const navLinks = () => page.getByRole('navigation', { name: 'Main' }).getByRole('link').allTextContents();
const engagementCards = () => page.getByRole('list', { name: 'Engagements' }).getByRole('listitem');

describe('what each role sees after signing in', () => {
  it('shows an administrator every engagement and all administration areas', async () => {
    await signIn(page, 'admin');
    await page.waitForURL('**/engagements');
    expect(await navLinks()).toEqual(['Engagements', ...ADMIN_AREAS]);
    await engagementCards().first().waitFor();
    expect(await page.getByTestId('current-user-role').textContent()).toBe('Administrator');
    await screenshot(page, 'admin-engagements');

    await page.getByRole('link', { name: 'People' }).click();
    await page.getByRole('table', { name: 'People with an account' }).waitFor();
    for (const email of Object.values(demo.users)) {
      await expect(page.getByRole('cell', { name: email, exact: true }).count()).resolves.toBe(1);
    }
    await screenshot(page, 'admin-people');

    await page.getByRole('link', { name: 'Audit trail' }).click();
    await page.getByRole('table', { name: /Audit trail entries/ }).waitFor();
    await screenshot(page, 'admin-audit');
  });

  it('shows a partner their engagements and no administration links', async () => {
    await signIn(page, 'partner');
    await engagementCards().first().waitFor();
    expect(await navLinks()).toEqual(['Engagements', 'Waiting for review', 'Deliverables']);
    await screenshot(page, 'partner-engagements');
  });

  it('tells a consultant who opens the people page that it is not allowed', async () => {
    await signIn(page, 'consultant');
    expect(await navLinks()).toEqual(['Engagements']);
    await page.goto(`${demo.url}/admin/users`);
    await page.getByRole('heading', { name: 'Not allowed' }).waitFor();
    expect(await page.getByRole('table').count()).toBe(0);
    await screenshot(page, 'consultant-admin-users-refused');
  });

  it('shows a client exactly one engagement, its deliverables area and no administration links', async () => {
    await signIn(page, 'client');
    await engagementCards().first().waitFor();
    expect(await engagementCards().count()).toBe(1);
    expect(await navLinks()).toEqual(['Engagements', 'Deliverables', 'Verify a copy']);
    await screenshot(page, 'client-engagements');

    await engagementCards().first().getByRole('link').click();
    await page.getByRole('heading', { name: 'Deliverables' }).waitFor();
    expect(await page.getByRole('button', { name: 'Edit details' }).count()).toBe(0);
    await screenshot(page, 'client-engagement-overview');
  });
});

describe('signing in', () => {
  it('sends a signed-out visitor to sign in and back to the page they asked for', async () => {
    await page.goto(`${demo.url}/admin/audit`);
    await page.waitForURL(/\/sign-in\?next=/);
    await page.getByLabel('E-mail').fill(demo.users.admin);
    await page.getByLabel('Password').fill(demo.password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL('**/admin/audit');
    await page.getByRole('heading', { name: 'Audit trail', level: 1 }).waitFor();
  });

  it('refuses a wrong password with a message and stays on the sign-in page', async () => {
    await page.goto(`${demo.url}/sign-in`);
    await page.getByLabel('E-mail').fill(demo.users.consultant);
    await page.getByLabel('Password').fill('not-the-password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('alert').first().waitFor();
    expect(page.url()).toContain('/sign-in');
    await screenshot(page, 'sign-in-refused');
  });

  it('returns to the sign-in page after signing out', async () => {
    await signIn(page, 'partner');
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.waitForURL('**/sign-in');
    await page.goto(`${demo.url}/engagements`);
    await page.waitForURL('**/sign-in');
  });
});
