import { mkdir } from 'node:fs/promises';
import path from 'node:path';
import type { Page } from 'playwright-core';

const dir = path.resolve('test-artifacts/e2e');

/** Full-page screenshot for people to look at; test-artifacts/ is git-ignored. */
export async function screenshot(page: Page, name: string): Promise<void> {
  await mkdir(dir, { recursive: true });
  await page.screenshot({ path: path.join(dir, `${name}.png`), fullPage: true });
}
