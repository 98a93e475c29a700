import type { Page } from 'playwright-core';
import { demo } from './demo';

/**
 * Opens the admin mailbox in `page` (signed in as an administrator) and returns the first
 * link of the newest message to `to`, waiting for it to arrive.
 */
export async function mailboxLink(page: Page, to: string): Promise<string> {
  await page.goto(`${demo.url}/admin/mailbox`);
  const message = page.getByRole('article').filter({ hasText: to }).first();
  for (let attempt = 0; attempt < 10; attempt++) {
    if ((await message.count()) > 0) break;
    await page.getByRole('button', { name: 'Check for new mail' }).click();
    await page.waitForTimeout(500);
  }
  const href = await message.getByRole('link').first().getAttribute('href');
  if (!href) throw new Error(`No link in the message to ${to}`);
  // The link carries the app's public address; follow its path on the address under test.
  const url = new URL(href);
  return `${demo.url}${url.pathname}${url.search}`;
}
