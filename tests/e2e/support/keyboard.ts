import type { Locator, Page } from 'playwright-core';

/** Whether the element is the document's focused element. */
export function isFocused(locator: Locator): Promise<boolean> {
  return locator.evaluate((el) => el === document.activeElement).catch(() => false);
}

/** What has focus, in words, for failure messages. */
function describeFocus(page: Page): Promise<string> {
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
