import { mkdir } from 'node:fs/promises';
import path from 'node:path';
import type { Locator } from 'playwright-core';

const dir = path.resolve('test-artifacts/e2e');

/**
 * A viewport screenshot with `locator` scrolled into view: for long pages such as a study in the
 * editor, where a full-page picture is many screens tall and the step's subject hard to find.
 */
export async function screenshotAround(locator: Locator, name: string): Promise<void> {
  await mkdir(dir, { recursive: true });
  await locator.scrollIntoViewIfNeeded();
  await locator.page().screenshot({ path: path.join(dir, `${name}.png`) });
}
