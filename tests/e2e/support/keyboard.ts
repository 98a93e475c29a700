import type { Locator, Page } from 'playwright-core';

/** Whether the element is the document's focused element. */
export function isFocused(locator: Locator): Promise<boolean> {
  return locator.evaluate((el) => el === document.activeElement).catch(() => false);
}

/** What has focus, in words, for failure messages. */
export function describeFocus(page: Page): Promise<string> {
  return page.evaluate(() => {
    const el = document.activeElement;
    if (!el || el === document.body) return 'nothing (the page body)';
    const name = el.getAttribute('aria-label') ?? (el as HTMLInputElement).labels?.[0]?.textContent ?? el.textContent ?? '';
    return `<${el.tagName.toLowerCase()}> "${name.trim().slice(0, 80)}"`;
  });
}

async function pressUntil(page: Page, key: string, target: Locator, max: number): Promise<void> {
  const seen: string[] = [];
  for (let i = 0; i <= max; i++) {
    if (await isFocused(target)) return;
    if (i === max) break;
    await page.keyboard.press(key);
    seen.push(await describeFocus(page));
  }
  throw new Error(`${key} did not reach ${target.toString()} in ${max} presses; focus went:\n  ${seen.join('\n  ')}`);
}

/** Presses Tab until `target` has focus, failing (with the path focus took) after `max` presses. */
export const tabTo = (page: Page, target: Locator, max = 40) => pressUntil(page, 'Tab', target, max);

/** The same backwards, with Shift+Tab. */
export const shiftTabTo = (page: Page, target: Locator, max = 40) => pressUntil(page, 'Shift+Tab', target, max);

/** The focused element shows it: an outline or a ring (box-shadow), never neither. */
export async function expectVisibleFocus(page: Page): Promise<void> {
  const style = await page.evaluate(() => {
    const el = document.activeElement;
    if (!el || el === document.body) return null;
    const s = getComputedStyle(el);
    return { outline: s.outlineStyle !== 'none' && parseFloat(s.outlineWidth) > 0, ring: s.boxShadow !== 'none' };
  });
  if (!style || (!style.outline && !style.ring)) throw new Error(`No visible focus indicator on ${await describeFocus(page)}`);
}

/**
 * Tabs through the page from where focus is, up to `max` stops or until focus comes back to a
 * stop already seen, and returns the stops that showed no focus indicator.
 */
export async function stopsWithoutVisibleFocus(page: Page, max: number): Promise<{ stops: number; unseen: string[] }> {
  const unseen: string[] = [];
  const seen = new Set<string>();
  let stops = 0;
  for (; stops < max; stops++) {
    await page.keyboard.press('Tab');
    const here = await page.evaluate(() => {
      const el = document.activeElement;
      if (!el || el === document.body) return null;
      // A stable identity for "been here": the element's path in the document.
      const path: string[] = [];
      for (let n: Element | null = el; n && n !== document.body; n = n.parentElement) path.unshift(`${n.tagName}:${Array.prototype.indexOf.call(n.parentElement?.children ?? [], n)}`);
      return path.join('/');
    });
    if (here === null || seen.has(here)) break;
    seen.add(here);
    await expectVisibleFocus(page).catch((err: Error) => unseen.push(err.message));
  }
  return { stops, unseen };
}
