/**
 * A consultant writes a study with the keyboard alone: Tab into the text, a heading and a
 * paragraph, a model block inserted from the writing tools, its model chosen, inputs typed and
 * one linked to the register, an option added to compare, the results read. No mouse event is
 * sent: only page.keyboard, with focus checked at every step.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Locator, Page } from 'playwright-core';
import { launchBrowser } from './support/browser';
import { demo } from './support/demo';
import { expectVisibleFocus, isFocused, shiftTabTo, stopsWithoutVisibleFocus, tabTo } from './support/keyboard';
import { screenshot } from './support/screenshot';
import { signedInPage } from './support/sign-in';

let browser: Browser;
let page: Page;

beforeAll(async () => {
  browser = await launchBrowser();
  page = await signedInPage(browser, 'consultant');
});
afterAll(async () => {
  await browser?.close();
});

const write = { 'x-sojourn-csrf': '1' };

/** A results cell as printed: decimal-alignment padding (figure spaces) removed. */
async function cell(table: Locator, measure: string, column: number): Promise<string> {
  const row = table.getByRole('row').filter({ has: table.page().getByRole('rowheader', { name: measure, exact: true }) });
  return ((await row.getByRole('cell').nth(column).textContent()) ?? '').replace(/[\u2007\s]/g, '');
}

describe('the study editor by keyboard alone', () => {
  const stamp = Date.now();
  const assumptionName = `Counter service rate ${stamp}`;
  const blockTitle = `Permit desk at noon ${stamp}`;
  let studyId = 0;

  it('writes a heading and text, inserts and sets up a model block, links an input and compares an option', async () => {
    const { engagements } = (await (await page.request.get(`${demo.url}/api/engagements`)).json()) as { engagements: { id: number; name: string }[] };
    const engagement = engagements.find((e) => e.name === 'Permit counter wait times')!;
    const assumption = await page.request.post(`${demo.url}/api/engagements/${engagement.id}/assumptions`, {
      headers: write,
      data: { name: assumptionName, value: 15, unit: 'per_hour', sourceKind: 'judgement', sourceDetail: 'Four minutes a permit, desk supervisor' },
    });
    expect(assumption.status()).toBe(201);
    const created = await page.request.post(`${demo.url}/api/engagements/${engagement.id}/studies`, { headers: write, data: { title: `Keyboard study ${stamp}`, templateKey: null } });
    expect(created.status()).toBe(201);
    studyId = ((await created.json()) as { study: { id: number } }).study.id;

    await page.goto(`${demo.url}/studies/${studyId}`);
    const text = page.getByRole('textbox', { name: 'Study text' });
    await text.waitFor();

    // Into the text from the top of the page.
    await tabTo(page, text);
    await expectVisibleFocus(page);
    await page.keyboard.type('# Staffing the permit counter');
    await page.keyboard.press('Enter');
    await page.keyboard.type('Arrivals peak at noon; the desk should answer most people within two minutes.');
    await page.keyboard.press('Enter');
    await text.getByRole('heading', { name: 'Staffing the permit counter', level: 1 }).waitFor();
    // The outline beside the text lists the new section.
    await page.getByRole('navigation', { name: 'Sections of this study' }).getByRole('button', { name: 'Staffing the permit counter' }).waitFor();

    // Back out of the text to the writing tools: the last tool inserts a model block.
    const insert = page.getByRole('button', { name: 'Insert model block' });
    await shiftTabTo(page, insert, 3);
    await expectVisibleFocus(page);
    // Within the tools the arrow keys move too, and wrap around.
    const tools = page.getByRole('toolbar', { name: 'Writing tools' });
    await page.keyboard.press('ArrowLeft');
    await expect.poll(() => isFocused(tools.getByRole('button', { name: 'Link', exact: true }))).toBe(true);
    await page.keyboard.press('Home');
    await expect.poll(() => isFocused(tools.getByRole('button', { name: 'Section', exact: true }))).toBe(true);
    await page.keyboard.press('ArrowLeft');
    await expect.poll(() => isFocused(insert)).toBe(true);
    await page.keyboard.press('Enter');
    const settings = page.getByRole('group', { name: 'Block settings' });
    await settings.waitFor();
    await expect.poll(() => isFocused(settings.getByLabel('Block title'))).toBe(true);
    await page.keyboard.type(blockTitle);

    // The calculation: move off M/M/c and back with the arrows, as someone browsing the list would.
    const model = settings.getByLabel('Calculation');
    await tabTo(page, model, 1);
    await page.keyboard.press('ArrowDown');
    await expect.poll(() => model.inputValue()).not.toBe('M/M/c');
    await page.keyboard.press('ArrowUp');
    await expect.poll(() => model.inputValue()).toBe('M/M/c');

    const arrivals = settings.getByLabel('Arrival rate λ', { exact: true });
    await tabTo(page, arrivals, 3);
    await page.keyboard.press('Control+A');
    await page.keyboard.type('120');

    // Link the service rate to the register: the arrows browse, Enter links.
    const linkService = settings.getByRole('button', { name: 'Link to assumption for Service rate μ per server' });
    await tabTo(page, linkService, 6);
    await expectVisibleFocus(page);
    await page.keyboard.press('Enter');
    const picker = settings.getByLabel('Assumption for Service rate μ per server');
    await expect.poll(() => isFocused(picker)).toBe(true);
    for (let i = 0; i < 60; i++) {
      if ((await picker.evaluate((el: HTMLSelectElement) => el.selectedOptions[0]?.textContent ?? '')).includes(assumptionName)) break;
      await page.keyboard.press('ArrowDown');
    }
    // Browsing did not link anything yet: the picker is still there.
    await expect(picker.count()).resolves.toBe(1);
    await page.keyboard.press('Enter');
    await settings.getByText(`Linked: ${assumptionName}`).waitFor();
    await expect.poll(() => isFocused(settings.getByRole('button', { name: 'Unlink for Service rate μ per server' }))).toBe(true);

    const servers = settings.getByLabel('Servers c', { exact: true });
    await tabTo(page, servers, 2);
    await page.keyboard.press('Control+A');
    await page.keyboard.type('10');

    // An option side by side: eleven servers instead of ten.
    const addOption = settings.getByRole('button', { name: 'Add an option' });
    await tabTo(page, addOption, 20);
    await page.keyboard.press('Enter');
    const optionServers = settings.getByLabel('Servers c, Option A');
    await shiftTabTo(page, optionServers, 12);
    await page.keyboard.type('11');

    // A chart over one input: a checkbox, ticked with Space.
    const chartBox = settings.getByLabel('Draw a chart over one input');
    await tabTo(page, chartBox, 30);
    await expectVisibleFocus(page);
    await page.keyboard.press('Space');
    await expect.poll(() => chartBox.isChecked()).toBe(true);
    await screenshot(page, 'keyboard-block-settings');

    // Escape closes the settings and puts focus back on the block's button.
    await page.keyboard.press('Escape');
    const block = page.getByRole('region', { name: `Model block: ${blockTitle}` });
    const edit = block.getByRole('button', { name: 'Edit block' });
    await expect.poll(() => isFocused(edit)).toBe(true);
    await expectVisibleFocus(page);

    // The results: λ = 120 per hour, μ = 15 per hour (linked): ρ = 120 / (10 · 15) = 0.8, and 120 / (11 · 15) ≈ 0.727 for the option.
    const results = block.getByRole('table', { name: blockTitle });
    await expect.poll(() => cell(results, 'Utilisation ρ', 1), { timeout: 15_000 }).toBe('80.0');
    await expect.poll(() => cell(results, 'Utilisation ρ', 2)).toBe('72.7');
    await block.locator('figure [role="graphics-document"][aria-label]').waitFor();
    await screenshot(page, 'keyboard-block-results');

    // Enter on the button opens the settings again; Escape closes them.
    await page.keyboard.press('Enter');
    await settings.waitFor();
    await page.keyboard.press('Escape');
    await expect.poll(() => isFocused(edit)).toBe(true);

    await expect
      .poll(async () => JSON.stringify(await (await page.request.get(`${demo.url}/api/studies/${studyId}`)).json()), { timeout: 15_000 })
      .toContain(blockTitle);
  });

  it('opens a block selected with the arrow keys by Enter', async () => {
    await page.goto(`${demo.url}/studies/${studyId}`);
    const text = page.getByRole('textbox', { name: 'Study text' });
    await text.waitFor();
    await tabTo(page, text);
    // From the start of the text, the arrow keys go down until the block itself is selected.
    await page.keyboard.press('Control+Home');
    const selectedBlock = page.locator(':is(.ProseMirror-selectednode section.model-block, section.model-block.ProseMirror-selectednode)');
    for (let i = 0; i < 8 && (await selectedBlock.count()) === 0; i++) await page.keyboard.press('ArrowDown');
    await selectedBlock.waitFor();
    await page.keyboard.press('Enter');
    const settings = page.getByRole('group', { name: 'Block settings' });
    await settings.waitFor();
    await expect.poll(() => isFocused(settings.getByLabel('Block title'))).toBe(true);
    await page.keyboard.press('Escape');
    await expect.poll(() => isFocused(page.getByRole('button', { name: 'Edit block' }))).toBe(true);
  });

  it('shows focus on every stop of the editor with the settings of a block open', async () => {
    await page.goto(`${demo.url}/studies/${studyId}`);
    await page.getByRole('textbox', { name: 'Study text' }).waitFor();
    const edit = page.getByRole('button', { name: 'Edit block' });
    await tabTo(page, edit, 60);
    await page.keyboard.press('Enter');
    await page.getByRole('group', { name: 'Block settings' }).waitFor();
    const { stops, unseen } = await stopsWithoutVisibleFocus(page, 120);
    expect(stops).toBeGreaterThan(20);
    expect(unseen, unseen.join('\n')).toEqual([]);
  });

  it('moves through a table with Tab and leaves the text with Escape, then Tab', async () => {
    await page.goto(`${demo.url}/studies/${studyId}`);
    const text = page.getByRole('textbox', { name: 'Study text' });
    await text.waitFor();
    await tabTo(page, text);
    await page.keyboard.press('Control+Home');
    await shiftTabTo(page, page.getByRole('toolbar', { name: 'Writing tools' }).getByRole('button', { name: 'Table' }), 4);
    await page.keyboard.press('Enter');
    await expect.poll(() => isFocused(text)).toBe(true);
    await page.keyboard.type('Desk');
    // Tab stays in the table (the next cell, a new row after the last): that is what it is for here.
    for (let i = 0; i < 10; i++) await page.keyboard.press('Tab');
    await page.keyboard.type('Noon');
    expect(await isFocused(text)).toBe(true);
    await text.getByRole('cell', { name: 'Noon', exact: true }).waitFor();
    // The way out is said to screen readers and works.
    const hint = await text.evaluate((el) => document.getElementById(el.getAttribute('aria-describedby') ?? '')?.textContent ?? '');
    expect(hint).toContain('Escape, then Tab');
    await page.keyboard.press('Escape');
    await page.keyboard.press('Tab');
    expect(await isFocused(text)).toBe(false);
    await expectVisibleFocus(page);
  });

  it('submits for review from a confirmation dialog that holds focus and gives it back', async () => {
    await page.goto(`${demo.url}/studies/${studyId}`);
    await page.getByRole('textbox', { name: 'Study text' }).waitFor();
    const submit = page.getByRole('button', { name: 'Submit for review' });
    await tabTo(page, submit, 10);
    await page.keyboard.press('Enter');
    const dialog = page.getByRole('dialog', { name: 'Submit as revision 1?' });
    await dialog.waitFor();
    expect(await dialog.evaluate((el) => el.contains(document.activeElement))).toBe(true);
    // Escape closes it and focus is back where the person was.
    await page.keyboard.press('Escape');
    await expect.poll(() => dialog.count()).toBe(0);
    await expect.poll(() => isFocused(submit)).toBe(true);
    // Again, this time confirming with the keyboard.
    await page.keyboard.press('Enter');
    await dialog.waitFor();
    await tabTo(page, dialog.getByRole('button', { name: 'Submit revision 1' }), 6);
    await page.keyboard.press('Enter');
    const done = page.getByRole('dialog', { name: 'Revision 1 submitted' });
    await done.waitFor();
    await expect.poll(() => isFocused(done.getByRole('button', { name: 'Close' }))).toBe(true);
    await page.keyboard.press('Enter');
    await expect.poll(() => done.count()).toBe(0);
  });

  it('lets the partner comment on the block of the submitted revision by keyboard', async () => {
    const partner = await signedInPage(browser, 'partner');
    const { revisions } = (await (await partner.request.get(`${demo.url}/api/studies/${studyId}/revisions`)).json()) as { revisions: { id: number }[] };
    await partner.goto(`${demo.url}/revisions/${revisions[0]!.id}`);
    const toggle = partner.getByRole('button', { name: `Comment on model block ${blockTitle}` });
    await toggle.waitFor();
    await tabTo(partner, toggle, 60);
    await expectVisibleFocus(partner);
    await partner.keyboard.press('Enter');
    const box = partner.getByLabel(`New comment on model block ${blockTitle}`);
    await expect.poll(() => isFocused(box)).toBe(true);
    const comment = `Check the noon arrivals against March ${stamp}.`;
    await partner.keyboard.type(comment);
    await tabTo(partner, partner.getByRole('region', { name: `Comments on model block ${blockTitle}` }).getByRole('button', { name: 'Add comment' }), 3);
    await partner.keyboard.press('Enter');
    await partner.getByRole('region', { name: `Comments on model block ${blockTitle}` }).getByText(comment).waitFor();
    await screenshot(partner, 'keyboard-block-comment');
    await partner.context().close();
  });
});
