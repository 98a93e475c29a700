import type { Browser, Page } from 'playwright-core';
import { demo, type DemoRole } from './demo';

/** Signs in through the form, as a person would, and waits for the signed-in chrome. */
export async function signIn(page: Page, role: DemoRole, path = '/sign-in'): Promise<void> {
  await page.goto(`${demo.url}${path}`);
  await page.getByLabel('E-mail').fill(demo.users[role]);
  await page.getByLabel('Password').fill(demo.password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('button', { name: 'Sign out' }).waitFor();
}

/** A fresh browser context (own cookies) signed in as the role: one person at one desk. */
export async function signedInPage(browser: Browser, role: DemoRole, width = 1280): Promise<Page> {
  const context = await browser.newContext({ viewport: { width, height: 900 }, locale: 'en-GB' });
  const page = await context.newPage();
  await signIn(page, role);
  return page;
}
